import { MM_PER_INCH, type Units } from '@barwright/contracts';

/*
 * The one writer of lengths for people: every screen, message, caption and printed page goes through it.
 * Lengths are kept exact (mm inside, an inch file's values as converted, 50 / 25.4 and all); only what
 * is shown or put into an entry box is rounded, here.
 *
 * Reading precision, as a shop reads a rule, a micrometer or a dial: 0.01 mm and 0.001 in. Below 1 mm
 * (0.04 in) the small amounts are what matter (a 0.076 mm step-over, a 0.012 mm loss, a 0.0008 in chip
 * load), so they get one more decimal: 0.001 mm, 0.0001 in. A real amount that would still round to 0
 * keeps two significant figures rather than read as nothing.
 */

/** Decimals of an ordinary length, and of a small one (under 1 mm or 0.04 in). */
export const LENGTH_DECIMALS: Readonly<Record<Units, { usual: number; small: number }>> = {
  mm: { usual: 2, small: 3 },
  in: { usual: 3, small: 4 },
};
/**
 * Decimals of an entry box (and of two values compared): 0.1 µm and 0.0001 in, so a value typed
 * exactly comes back as typed (3/16 in is 4.7625 mm and 0.1875 in; a step-over of 0.0762 mm).
 */
export const ENTRY_DECIMALS: Readonly<Record<Units, { usual: number; small: number }>> = {
  mm: { usual: 4, small: 4 },
  in: { usual: 4, small: 5 },
};
/** Below this (in the units' own terms) a length is small: 1 mm, and 0.04 in (just over 1 mm). */
const SMALL: Readonly<Record<Units, number>> = { mm: 1, in: 0.04 };
/** Finest fraction of an inch a stock size is named in (common practice for drill, mill and bar stock). */
export const STOCK_FRACTION = 64;

export interface LengthStyle {
  /** Also name the nearest 1/64 in when the length is one (stock sizes: `0.313 in (5/16)`). Inches only. */
  fraction?: boolean;
}

/**
 * A value already in `units` rounded for reading (no conversion): 1.96850393700… in reads 1.969.
 * `entry` rounds to ENTRY_DECIMALS instead, for entry boxes and for comparing two values: 1.9685 in.
 */
export function roundLength(value: number, units: Units, entry = false): number {
  if (!Number.isFinite(value)) return value;
  const table = entry ? ENTRY_DECIMALS : LENGTH_DECIMALS;
  const decimals = Math.abs(value) < SMALL[units] ? table[units].small : table[units].usual;
  const rounded = +value.toFixed(decimals);
  // A tiny but real amount (a warning's 0.1 µm is 0.000004 in) keeps two significant figures, not 0.
  return rounded === 0 && value !== 0 ? +value.toPrecision(2) : rounded + 0;
}

/** A length in mm as a bare number in `units`, rounded for reading (no unit). */
export function lengthFigure(mm: number, units: Units): number {
  return roundLength(units === 'in' ? mm / MM_PER_INCH : mm, units);
}

/** A length given in mm, written in `units` with its unit: `0.076 mm`, `0.003 in`, `0.313 in (5/16)`. */
export function formatLength(mm: number, units: Units, style: LengthStyle = {}): string {
  const text = `${lengthFigure(mm, units)} ${units}`;
  const fraction = style.fraction && units === 'in' ? stockFraction(mm / MM_PER_INCH) : null;
  return fraction ? `${text} (${fraction})` : text;
}

/** A range of lengths given in mm, in `units` with one unit: `1.25–3.5 mm`. */
export function formatLengthRange(fromMm: number, toMm: number, units: Units): string {
  return `${lengthFigure(fromMm, units)}–${lengthFigure(toMm, units)} ${units}`;
}

/**
 * The inches as a stock fraction to 1/64 (`5/16`, `1 1/4`), reduced, or null when the length is not
 * within 0.0005 in of one (so 0.3 in is not called 19/64).
 */
export function stockFraction(inches: number): string | null {
  if (!Number.isFinite(inches) || inches <= 0) return null;
  const sixtyFourths = Math.round(inches * STOCK_FRACTION);
  if (sixtyFourths === 0 || Math.abs(sixtyFourths / STOCK_FRACTION - inches) > 0.0005) return null;
  const whole = Math.floor(sixtyFourths / STOCK_FRACTION);
  let num = sixtyFourths % STOCK_FRACTION;
  let den = STOCK_FRACTION;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${whole}`;
  return whole > 0 ? `${whole} ${num}/${den}` : `${num}/${den}`;
}
