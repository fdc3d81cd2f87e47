/// <reference lib="webworker" />
import type { Design } from '@barwright/contracts';
import { computeLineStudyXY, invertedProfile, toMm } from '@barwright/engine';
import { studyData } from '../../studio/compute/design-views';
import type { StudyData } from '../../../shared/views/view-data';

/*
 * What the opposite blank engraves, off the page's thread: turned over to run on the straight-line
 * machine, the blank above the cutter is the inverted companion, so its line study is that profile's.
 */
addEventListener('message', (event: MessageEvent<Design>) => {
  try {
    const design = event.data;
    const mm = toMm(design);
    const study: StudyData = { ...studyData(computeLineStudyXY(design, invertedProfile(design))), depth: mm.study.depth, vAngle: mm.study.vAngle };
    self.postMessage({ study }, { transfer: study.lines.map((l) => l.buffer as ArrayBuffer) });
  } catch (error) {
    self.postMessage({ error: error instanceof Error ? error.message : String(error) });
  }
});
