/** A number written with at most `decimals` places, no trailing zeros, never `-0` or an exponent. */
export function fixed(value: number, decimals: number): string {
  let text = value.toFixed(decimals);
  if (text.includes('.')) text = text.replace(/0+$/, '').replace(/\.$/, '');
  return text === '-0' ? '0' : text;
}
