import { TestBed } from '@angular/core/testing';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { writeDesign } from '@barwright/contracts/design-doc';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { CollabSession } from './collab-session';

/*
 * The session's design listener (`onValidDesign`), which starts the studio's compute worker on each
 * keystroke. No socket is opened: a remote update is written into the document with no origin, as
 * y-websocket applies one, and a local edit goes through the session's own writes.
 */
function session(): CollabSession {
  TestBed.configureTestingModule({ providers: [CollabSession] });
  const s = TestBed.inject(CollabSession);
  s.setWritable(true);
  return s;
}

const lobesOf = (d: Design) => d.rosette.layers[0].lobes;

describe('the collab session telling listeners of each valid design', () => {
  afterEach(() => TestBed.resetTestingModule());

  it('tells a new listener the current design at once, and nothing while the document holds none', () => {
    const s = session();
    const early = vi.fn();
    s.onValidDesign(early);
    expect(early).not.toHaveBeenCalled();
    writeDesign(s.doc, EXAMPLE_DESIGN);
    expect(early).toHaveBeenCalledTimes(1);
    const late = vi.fn();
    s.onValidDesign(late);
    expect(late).toHaveBeenCalledTimes(1);
    expect(late.mock.calls[0][0]).toEqual(EXAMPLE_DESIGN);
    expect(early).toHaveBeenCalledTimes(1); // a listener joining does not repeat the design to the others
  });

  it('tells each local edit in the edit’s own task, skips invalid values and tells the next valid one once', () => {
    const s = session();
    writeDesign(s.doc, EXAMPLE_DESIGN);
    const heard: Design[] = [];
    s.onValidDesign((d) => heard.push(d));
    s.setField(['rosette', 'layers', 0, 'lobes'], 9);
    expect(heard.map(lobesOf)).toEqual([lobesOf(EXAMPLE_DESIGN), 9]);
    s.setField(['rosette', 'layers', 0, 'lobes'], -3); // invalid: the views keep the last valid design
    s.setField(['rosette', 'layers', 0, 'lobes'], 'many');
    expect(heard).toHaveLength(2);
    expect(s.fieldErrors().size).toBeGreaterThan(0);
    s.setField(['rosette', 'layers', 0, 'lobes'], 11);
    expect(heard.map(lobesOf)).toEqual([lobesOf(EXAMPLE_DESIGN), 9, 11]);
  });

  it('tells a remote update, and stops telling a listener that unsubscribed', () => {
    const s = session();
    writeDesign(s.doc, EXAMPLE_DESIGN);
    const kept = vi.fn();
    const dropped = vi.fn();
    s.onValidDesign(kept);
    const stop = s.onValidDesign(dropped);
    stop();
    writeDesign(s.doc, { ...EXAMPLE_DESIGN, motion: { ...EXAMPLE_DESIGN.motion, travelPerRev: 80 } });
    expect(kept).toHaveBeenCalledTimes(2);
    expect(kept.mock.calls[1][0].motion.travelPerRev).toBe(80);
    expect(dropped).toHaveBeenCalledTimes(1); // only the design it was told when it joined
  });

  it('leaves every listener on the newest design when one writes to the document while it is told', () => {
    const s = session();
    writeDesign(s.doc, EXAMPLE_DESIGN);
    const first: number[] = [];
    const second: number[] = [];
    s.onValidDesign((d) => {
      first.push(lobesOf(d));
      if (lobesOf(d) === 9) s.setField(['rosette', 'layers', 0, 'lobes'], 10);
    });
    s.onValidDesign((d) => second.push(lobesOf(d)));
    s.setField(['rosette', 'layers', 0, 'lobes'], 9);
    expect(first.at(-1)).toBe(10);
    expect(second.at(-1)).toBe(10);
  });

  it('keeps the document and the other listeners going when one listener throws', () => {
    const s = session();
    writeDesign(s.doc, EXAMPLE_DESIGN);
    const error = vi.spyOn(console, 'error').mockImplementation(() => {});
    s.onValidDesign(() => {
      throw new Error('a broken view');
    });
    const after = vi.fn();
    s.onValidDesign(after);
    s.setField(['rosette', 'layers', 0, 'lobes'], 7);
    expect(after).toHaveBeenCalledTimes(2);
    expect(lobesOf(s.design() as unknown as Design)).toBe(7);
    expect(error).toHaveBeenCalled();
    error.mockRestore();
  });
});
