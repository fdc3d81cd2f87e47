import { MM_PER_INCH, type Units } from '@barwright/contracts';

/** Decimal places that keep a printed length meaningful: 0.1 µm in mm, 0.00001 in in inches. */
export const LENGTH_DECIMALS: Readonly<Record<Units, number>> = { mm: 4, in: 5 };

/** A length given in mm, written in the design's units for messages and labels: `0.0762 mm`, `0.003 in`. */
export function formatLength(mm: number, units: Units): string {
  const value = units === 'in' ? mm / MM_PER_INCH : mm;
  return `${+value.toFixed(LENGTH_DECIMALS[units])} ${units}`;
}
