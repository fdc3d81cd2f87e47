import { DESIGN_PRESET_FILES, type Design, type RackRosette } from '@barwright/contracts';
import { convertDesignUnits } from '../../studio/units/field-units';

/**
 * The design file a new design starts from (pure): the blank preset in the rosette's units with the
 * rack rosette in place of its own. The server checks it as any other design file.
 */
export function designFromRosette(rosette: Pick<RackRosette, 'units' | 'rosette'>): Design {
  const start = convertDesignUnits(structuredClone(DESIGN_PRESET_FILES.blank), rosette.units);
  return { ...start, rosette: structuredClone(rosette.rosette) };
}
