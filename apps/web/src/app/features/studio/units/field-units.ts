import { MM_PER_INCH, type Design, type Units } from '@barwright/contracts';
import { fromMm, roundLength } from '@barwright/engine';
import type { FieldKind } from '../fields/field-catalogue';

/** The unit written after a value of this kind in a design kept in `units`. */
export function unitSuffix(kind: FieldKind, units: Units): string {
  switch (kind) {
    case 'length':
      return units;
    case 'speed':
      return `${units}/min`;
    case 'surfaceSpeed':
      return 'm/min';
    case 'angle':
      return '°';
    case 'lobeFraction':
      return 'of a lobe';
    case 'periodFraction':
      return 'of a period';
    case 'lines':
      return 'lines';
    default:
      return '';
  }
}

/** Rounding noise we remove: a few units in the last place of a double (2^-52 relative). */
const NOISE = 4 * Number.EPSILON;

/**
 * Drops the binary noise an exact ×25.4 or ÷25.4 leaves behind (4.7625 / 25.4 = 0.18750000000000003):
 * the shortest decimal within a few units in the last place. A value with real digits to the end
 * (50 / 25.4) is kept whole, so converting there and back comes home unchanged.
 */
export function cleanNumber(value: number): number {
  if (!Number.isFinite(value) || value === 0) return value;
  for (let digits = 1; digits <= 17; digits++) {
    const short = Number(value.toPrecision(digits));
    if (Math.abs(short - value) <= NOISE * Math.abs(value)) return short;
  }
  return value;
}

/** A slider range stated in mm, in the design's units (lengths and speeds only). */
export function rangeInUnits(kind: FieldKind, rangeMm: readonly [number, number], units: Units): [number, number] {
  const scaled = (kind === 'length' || kind === 'speed') && units === 'in';
  return scaled ? [cleanNumber(rangeMm[0] / MM_PER_INCH), cleanNumber(rangeMm[1] / MM_PER_INCH)] : [rangeMm[0], rangeMm[1]];
}

/** A slider step near a thousandth of the range, rounded to 1, 2 or 5 × a power of ten. */
export function sliderStep(min: number, max: number, integer: boolean): number {
  if (integer) return 1;
  const raw = Math.abs(max - min) / 1000 || 0.001;
  const power = 10 ** Math.floor(Math.log10(raw));
  const nice = [1, 2, 5, 10].find((m) => m * power >= raw) ?? 10;
  return cleanNumber(nice * power);
}

/** The whole design in other units: every length converted exactly (inch = 25.4 mm), then cleaned of float noise. */
export function convertDesignUnits(design: Design, units: Units): Design {
  if (design.units === units) return design;
  return cleanNumbers(fromMm(design, units));
}

function cleanNumbers<T>(value: T): T {
  if (typeof value === 'number') return cleanNumber(value) as T;
  if (Array.isArray(value)) return value.map((v) => cleanNumbers(v)) as T;
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, cleanNumbers(v)])) as T;
  }
  return value;
}

/**
 * A value rounded for reading or for an entry box, without trailing zeros. Lengths go through the
 * engine's one length formatter (0.01 mm, 0.001 in, a decimal more below 1 mm); speeds to 0.1 mm/min
 * or 0.01 in/min (finer than a slide is set); other figures to six decimals. The stored value keeps
 * every digit: only what is shown is rounded.
 */
export function displayNumber(kind: FieldKind, value: number, units: Units): string {
  return String(roundFor(kind, value, units));
}

/**
 * The number shown for a stored value (see displayNumber). `entry`: for an entry box or a comparison
 * of two values, finer (the engine's ENTRY_DECIMALS), so a value typed exactly (3/16 in, 0.1875) is shown as typed.
 */
export function roundFor(kind: FieldKind, value: number, units: Units, entry = false): number {
  if (!Number.isFinite(value)) return value;
  if (kind === 'length') return roundLength(value, units, entry);
  if (kind === 'speed') return +value.toFixed((units === 'in' ? 2 : 1) + (entry ? 1 : 0)) + 0;
  return +value.toFixed(6) + 0;
}

/** A value with its unit, for comparisons and messages: `4.7625 mm`, `120°`, `0.5 of a lobe`. */
export function formatValue(kind: FieldKind, value: number, units: Units): string {
  const suffix = unitSuffix(kind, units);
  const shown = String(roundFor(kind, value, units, true));
  if (!suffix) return shown;
  return suffix === '°' ? `${shown}°` : `${shown} ${suffix}`;
}
