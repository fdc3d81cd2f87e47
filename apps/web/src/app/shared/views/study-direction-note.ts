import type { StudyDirection } from '@barwright/contracts';

/** The line study caption's sentence on which way the engraved lines run against the bar (the engine's Y_j(x)). */
export function studyDirectionNote(direction: StudyDirection | undefined): string {
  return direction === 'as-bar'
    ? 'Each line runs the same way as the bar, Y = j·p + F(x + Δ), for a machine that runs the other way'
    : 'Each line is the mirror of the bar, Y = j·p + F(Δ − x), as the work moves against the bar';
}
