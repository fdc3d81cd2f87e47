import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeDesignViews } from '../../features/studio/compute/design-views';
import { studyDrawing, windowRange } from './study-drawing';

const { study } = computeDesignViews(EXAMPLE_DESIGN, 'preview');

describe('studyDrawing', () => {
  it('takes a window about the middle of the bar, or the whole bar', () => {
    expect(windowRange(study, 40)).toEqual([55, 95]);
    expect(windowRange(study, 'whole')).toEqual([0, 150]);
    expect(windowRange({ length: 10 }, 15)).toEqual([0, 10]);
  });

  it('draws every line at true scale with the groove’s width as its stroke', () => {
    const d = studyDrawing(study, 40);
    expect(d.lines).toHaveLength(40);
    expect(d.height / d.width).toBeCloseTo((d.high - d.low) / 40, 5);
    expect(d.stroke).toBeCloseTo(study.width * (1000 / 40), 5); // 0.3464 mm, wider than a hairline here
  });

  it('never draws thinner than a hairline', () => {
    expect(studyDrawing({ ...study, width: 0 }, 'whole').stroke).toBeCloseTo(1000 / 700);
  });
});
