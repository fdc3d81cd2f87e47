import type { Design } from '@barwright/contracts';
import { computeLineStudyXY, computeProfile } from '@barwright/engine';
import { studyDrawing, type StudyDrawing } from '../views/study-drawing';
import type { StudyData } from '../views/view-data';

/** Samples per period on the bar: enough for a picture a few centimetres wide, a fraction of the studio's work. */
const SAMPLES_PER_PERIOD = 60;
/** Periods shown: enough for the phase schedule to read as a pattern. */
const PERIODS_SHOWN = 4;
/** The widest stroke drawn, as a fraction of the drawing's width. */
const FINEST_STROKE = 1 / 200;
/** Lines drawn at most, from the first: a small picture shows the pattern, not every line. */
const LINES_SHOWN = 24;

/**
 * A small flat line study of a design: a few periods from the middle of the bar, computed by the
 * engine on a coarse grid. Null when the design cannot be computed (a file that is not valid) (pure).
 */
export function designSketchDrawing(design: Design): StudyDrawing | null {
  try {
    const perMm = design.units === 'in' ? 25.4 : 1;
    const lobes = Math.max(1, ...design.rosette.layers.map((l) => l.lobes));
    const periodMm = (design.motion.travelPerRev * perMm) / lobes;
    if (!(Number.isFinite(periodMm) && periodMm > 0)) return null; // no grid to sample on
    const lines = Math.min(design.study.lines, LINES_SHOWN);
    const small: Design = { ...design, study: { ...design.study, lines } };
    const profile = computeProfile(small, { step: periodMm / SAMPLES_PER_PERIOD });
    const study = computeLineStudyXY(small, profile);
    const data: StudyData = {
      spacing: study.spacing,
      width: study.width,
      length: study.length,
      depth: design.study.depth * perMm,
      vAngle: design.study.vAngle,
      lines: study.lines.map((line) => line.xy),
    };
    const drawing = studyDrawing(data, PERIODS_SHOWN * profile.period);
    // At a few centimetres across, true-width grooves run together: a fine ink line shows the pattern.
    return { ...drawing, stroke: Math.min(drawing.stroke, drawing.width * FINEST_STROKE) };
  } catch {
    return null;
  }
}
