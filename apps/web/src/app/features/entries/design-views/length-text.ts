import type { Units } from '@barwright/contracts';
import { displayNumber } from '../../studio/units/field-units';

/** A length given in mm, in the design's own units with the unit beside it: "0.45 mm", "0.0177 in". */
export function lengthText(mm: number, units: Units): string {
  return `${displayNumber('length', units === 'in' ? mm / 25.4 : mm, units)} ${units}`;
}
