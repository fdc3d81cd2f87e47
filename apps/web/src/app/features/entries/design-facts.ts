import { formatNumber, type Design } from '@barwright/contracts';
import { roundLength } from '@barwright/engine/length-format';
import { MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES } from '../../shared/entry-facts/entry-facts';

/** One line of a design's set-up as the design page lists it, units beside the number. */
export interface SetUpFact {
  label: string;
  value: string;
}

/** The set-up of a bar design in the trade's words, lengths in the file's own units (pure). */
export function setUpFacts(d: Design): SetUpFact[] {
  // Lengths through the one length formatter: the file's value (already in its units) rounded for reading.
  const len = (v: number) => `${roundLength(v, d.units)} ${d.units}`;
  const layers = d.rosette.layers;
  const rosette = layers.map((l) => `${l.lobes} lobes, ${WAVE_NAMES[l.wave.shape]}, ${len(l.amplitude)} peak to valley`).join(' + ');
  return [
    { label: layers.length > 1 ? `Rosette (${layers.length} layers)` : 'Rosette', value: rosette },
    { label: 'Rosette base radius', value: len(d.rosette.baseRadius) },
    { label: 'Rubber', value: d.rubber.shape === 'round' ? `round, ${len(d.rubber.radius)} radius` : `flat, ${len(d.rubber.width)} wide` },
    { label: 'Travel per revolution', value: len(d.motion.travelPerRev) },
    { label: 'Lever ratio', value: formatNumber(d.motion.leverRatio) },
    { label: 'End mill', value: `${len(d.cutter.diameter)} diameter, ${d.cutter.flutes} ${d.cutter.flutes === 1 ? 'flute' : 'flutes'}` },
    { label: 'Bar', value: `${len(d.bar.length)} × ${len(d.bar.thickness)}, ${MATERIAL_NAMES[d.bar.material]}` },
    { label: 'Follower radius', value: len(d.follower.radius) },
    { label: 'Line study', value: `${d.study.lines} lines at ${len(d.study.lineSpacing)}` },
    { label: 'Phase schedule', value: SCHEDULE_NAMES[d.study.schedule.kind] },
    { label: 'V-cutter', value: `${formatNumber(d.study.vAngle)}° included, ${len(d.study.depth)} deep` },
  ];
}
