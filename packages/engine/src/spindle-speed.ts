import { MM_PER_INCH } from '@barwright/contracts';

/**
 * Spindle speed from surface speed (machining handbook formula):
 * RPM = 1000·Vc / (π·D) with Vc in m/min and D in mm,
 * or RPM = 12·SFM / (π·D) with SFM in ft/min and D in inches.
 */
export function spindleRpm(surfaceSpeedMPerMin: number, diameterMm: number): number {
  return (1000 * surfaceSpeedMPerMin) / (Math.PI * diameterMm);
}

/** The inch form: SFM in feet per minute, diameter in inches. */
export function spindleRpmFromSfm(sfm: number, diameterIn: number): number {
  return (12 * sfm) / (Math.PI * diameterIn);
}

/** Feet per minute to metres per minute (1 ft = 12 in = 0.3048 m exactly). */
export function sfmToMPerMin(sfm: number): number {
  return (sfm * 12 * MM_PER_INCH) / 1000;
}

/** Feed rate, length per minute: rpm × flutes × chip load per tooth (chip load in that length unit). */
export function feedPerMinute(rpm: number, flutes: number, chipLoad: number): number {
  return rpm * flutes * chipLoad;
}
