import { MM_PER_INCH, type Units } from '@barwright/contracts';

/** Decimal places that keep a printed length meaningful: 0.1 µm in mm, 0.00001 in in inches. */
export const LENGTH_DECIMALS: Readonly<Record<Units, number>> = { mm: 4, in: 5 };

/** A length in mm as a bare number in the design's units, rounded for printing (no unit). */
export function lengthFigure(mm: number, units: Units): number {
  const value = units === 'in' ? mm / MM_PER_INCH : mm;
  const rounded = +value.toFixed(LENGTH_DECIMALS[units]);
  // A tiny but real amount (a warning's 0.1 µm is 0.000004 in) keeps two significant figures, not 0.
  return rounded === 0 && value !== 0 ? +value.toPrecision(2) : rounded + 0;
}

/** A length given in mm, written in the design's units for messages and labels: `0.0762 mm`, `0.003 in`. */
export function formatLength(mm: number, units: Units): string {
  return `${lengthFigure(mm, units)} ${units}`;
}

/** A range of lengths given in mm, written in the design's units with one unit: `1.25–3.5 mm`. */
export function formatLengthRange(fromMm: number, toMm: number, units: Units): string {
  return `${lengthFigure(fromMm, units)}–${lengthFigure(toMm, units)} ${units}`;
}
