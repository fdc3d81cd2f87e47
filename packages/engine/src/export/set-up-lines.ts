import type { Design, PhaseSchedule, Wave } from '@barwright/contracts';
import { formatLength } from '../length-format';
import { toMm } from '../units';

/** One line of the set-up block: what to set, and to what, lengths in the file's units. */
export interface SetUpLine {
  label: string;
  value: string;
}

const WAVES: Readonly<Record<Wave['shape'], string>> = {
  sine: 'sine',
  pointed: 'pointed',
  scallop: 'scalloped',
  flat: 'flat-topped',
  eccentric: 'eccentric circle',
  fourier: 'Fourier series',
  measured: 'measured',
};

const SCHEDULES: Readonly<Record<PhaseSchedule['kind'], string>> = {
  none: 'plain lines',
  alternate: 'barleycorn',
  ramp: 'basket weave',
  sine: 'moiré',
  twist: 'twist',
  list: 'a list of phases',
};

/** The machine set-up of a design as the printed template lists it: rosette, rubber, travel, lever, cutter, follower, material. */
export function setUpLines(design: Design, materialName: string): SetUpLine[] {
  const mm = toMm(design);
  const len = (v: number) => formatLength(v, design.units);
  const rosette = mm.rosette.layers.map((l) => `${l.lobes} lobes, ${WAVES[l.wave.shape]}, ${len(l.amplitude)} peak to valley`).join(' + ');
  const pivot = mm.motion.pivot?.kind === 'rocking' ? `, rocking about an axis ${len(mm.motion.pivot.distance)} from the centre line` : '';
  const offset = mm.cutter.offset ? `, ${len(mm.cutter.offset)} off the centre line` : '';
  return [
    { label: 'Rosette', value: `${rosette}; base radius ${len(mm.rosette.baseRadius)}` },
    { label: 'Rubber', value: mm.rubber.shape === 'round' ? `round, ${len(mm.rubber.radius)} radius` : `flat, ${len(mm.rubber.width)} wide` },
    { label: 'Travel', value: `${len(mm.motion.travelPerRev)} per revolution of the rosette` },
    { label: 'Lever', value: `ratio ${+mm.motion.leverRatio.toFixed(4)} (cutter movement per rubber movement)${pivot}` },
    { label: 'Cutter', value: `end mill ${len(mm.cutter.diameter)} diameter, ${mm.cutter.flutes} ${mm.cutter.flutes === 1 ? 'flute' : 'flutes'}${offset}` },
    { label: 'Follower', value: `${len(mm.follower.radius)} radius` },
    { label: 'Material', value: `${materialName}, bar ${len(mm.bar.length)} x ${len(mm.bar.thickness)}` },
    { label: 'Line study', value: `${mm.study.lines} lines at ${len(mm.study.lineSpacing)}, ${SCHEDULES[mm.study.schedule.kind]}, ${+mm.study.vAngle.toFixed(2)}° V-cutter ${len(mm.study.depth)} deep` },
  ];
}
