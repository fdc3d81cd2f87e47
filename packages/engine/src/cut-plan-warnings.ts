import type { MaterialPreset } from './materials';
import type { EngineWarning } from './types';

/** What the warning checks need; lengths in mm, speeds in mm/min. */
export interface CutCheckInput {
  preset: MaterialPreset;
  stepOver: number;
  passes: number;
  rpm: number;
  flutes: number;
  /** Chip load per tooth the material wants, mm. */
  chipLoad: number;
  travelSpeed: number;
  /** Steepest slope |dy/dx| of the cutter path; the feed along the path is travel·√(1 + slope²). */
  maxSlope: number;
  leverRatio: number;
  /** The cutter's offset from the spindle centre line (mm) and its effect in words (`placementText`), if set. */
  cutterOffset?: number;
  placement?: string;
  cutterDiameter: number;
  barThickness: number;
  /** Formats a length in mm in the design's units, for messages. */
  show: (mm: number) => string;
}

/** A chip thinner than this fraction of the wanted chip load rubs instead of cutting (common practice, from memory). */
export const RUBBING_FRACTION = 0.5;
/** A chip heavier than this multiple of the wanted chip load risks breaking a small cutter (from memory). */
export const OVERLOAD_FACTOR = 2;
/** Spindles on small cutting frames rarely exceed this, rpm (from memory). */
export const HIGH_RPM = 30000;
/** A bar thicker than this many cutter diameters calls for a long-reach cutter that deflects (common practice). */
export const LONG_REACH_DIAMETERS = 3;

type Check = (c: CutCheckInput) => EngineWarning | undefined;

const passTooDeep: Check = (c) => {
  const max = c.preset.maxStepOver;
  if (max === undefined || c.stepOver <= max * (1 + 1e-9)) return undefined;
  return {
    code: 'pass-too-deep',
    message: `step-over ${c.show(c.stepOver)} is deeper than the ${c.show(max)} per pass that ${c.preset.name} takes; use at most ${c.show(max)}.`,
    amount: c.stepOver - max,
  };
};

const rubbing: Check = (c) => {
  const chip = c.travelSpeed / (c.rpm * c.flutes);
  if (chip >= RUBBING_FRACTION * c.chipLoad) return undefined;
  const rpm = c.travelSpeed / (c.flutes * c.chipLoad);
  return {
    code: 'rubbing',
    message: `at this travel each tooth takes ${c.show(chip)}, under half the ${c.show(c.chipLoad)} it needs, so the cutter rubs; slow the spindle to about ${Math.round(rpm)} rpm or travel faster.`,
    amount: c.chipLoad - chip,
  };
};

const overload: Check = (c) => {
  const chip = (c.travelSpeed * Math.hypot(1, c.maxSlope)) / (c.rpm * c.flutes);
  if (chip <= OVERLOAD_FACTOR * c.chipLoad) return undefined;
  const travel = (OVERLOAD_FACTOR * c.chipLoad * c.rpm * c.flutes) / Math.hypot(1, c.maxSlope);
  return {
    code: 'other',
    message: `on the steepest flanks each tooth takes ${c.show(chip)}, more than twice the ${c.show(c.chipLoad)} it should; slow the travel to ${c.show(travel)}/min or less.`,
    amount: chip - c.chipLoad,
  };
};

const offCentre: Check = (c) => {
  if (Math.abs(c.leverRatio - 1) < 1e-9) return undefined;
  return {
    code: 'cutter-off-centre',
    message: `a lever ratio of ${c.leverRatio} sets the cutter at a different distance from the rocking pivot than the rubber, so it rides off the spindle centre line on an arc; the lobes tilt slightly, so check the pattern with a trial cut.`,
  };
};

const offsetSet: Check = (c) => {
  if (!c.cutterOffset || !c.placement) return undefined;
  return {
    code: 'cutter-off-centre',
    message: `the cutter is set ${c.placement}; the rule is to keep it on the spindle centre line, so set 0 unless the offset is meant.`,
    amount: Math.abs(c.cutterOffset),
  };
};

const tooManyPasses: Check = (c) => {
  const max = c.preset.maxStepOver;
  if (max === undefined || c.passes <= 2 || c.stepOver * 4 > max) return undefined;
  return {
    code: 'other',
    message: `step-over ${c.show(c.stepOver)} is far below the ${c.show(max)} per pass that ${c.preset.name} takes; ${c.passes} passes where fewer would do.`,
  };
};

const highRpm: Check = (c) =>
  c.rpm <= HIGH_RPM
    ? undefined
    : {
        code: 'other',
        message: `${Math.round(c.rpm)} rpm is beyond most small spindles; run at your spindle's top speed and slow the travel in proportion to keep the chip load.`,
      };

const longReach: Check = (c) =>
  c.barThickness <= LONG_REACH_DIAMETERS * c.cutterDiameter
    ? undefined
    : {
        code: 'other',
        message: `the bar (${c.show(c.barThickness)} thick) is more than ${LONG_REACH_DIAMETERS} cutter diameters; a long-reach cutter deflects, so take lighter passes and a final spring pass.`,
      };

const CHECKS: readonly Check[] = [passTooDeep, rubbing, overload, offCentre, offsetSet, tooManyPasses, highRpm, longReach];

/** The cut plan's warnings, in a fixed order. */
export function cutPlanWarnings(input: CutCheckInput): EngineWarning[] {
  return CHECKS.map((check) => check(input)).filter((w): w is EngineWarning => w !== undefined);
}
