import { describe, expect, it } from 'vitest';
import { platesDue, type PlateInputs } from './plates-due';

const inputs = (over: Partial<PlateInputs> = {}): PlateInputs => ({ study: {}, frame: {}, theme: 0, ...over });

describe('platesDue', () => {
  it('draws a plate on the screen that has not drawn this study', () => {
    const now = inputs();
    expect(platesDue(now, false, { visible: true, sent: null }, { visible: true, sent: null })).toEqual({ flat: true, lit: true });
  });

  it('leaves a plate off the screen alone, and draws it once it comes into view', () => {
    const now = inputs();
    const before = inputs();
    expect(platesDue(now, false, { visible: false, sent: before }, { visible: false, sent: before })).toEqual({ flat: false, lit: false });
    expect(platesDue(now, false, { visible: true, sent: before }, { visible: false, sent: before })).toEqual({ flat: true, lit: false });
  });

  it('does not draw again what a plate shows (scrolling out and back)', () => {
    const now = inputs();
    expect(platesDue(now, false, { visible: true, sent: now }, { visible: true, sent: { ...now } })).toEqual({ flat: false, lit: false });
  });

  it('draws again for a new frame (the plate resized) or new colours, with the same study', () => {
    const study = {};
    const sent = inputs({ study });
    expect(platesDue(inputs({ study, frame: {} }), false, { visible: true, sent }, { visible: true, sent })).toEqual({ flat: true, lit: true });
    expect(platesDue({ ...sent, theme: 1 }, false, { visible: true, sent }, { visible: true, sent })).toEqual({ flat: true, lit: true });
  });

  it('gives a draft to the flat plate only; the lit one waits for the final study', () => {
    const now = inputs();
    expect(platesDue(now, true, { visible: true, sent: null }, { visible: true, sent: null })).toEqual({ flat: true, lit: false });
    // The draft made final (its full computation failed): the lit plate draws it then, the flat one has it.
    expect(platesDue(now, false, { visible: true, sent: now }, { visible: true, sent: null })).toEqual({ flat: false, lit: true });
  });
});
