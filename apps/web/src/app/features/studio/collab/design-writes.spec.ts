import { EXAMPLE_DESIGN, parseDesign } from '@barwright/contracts';
import { readDesign, writeDesign } from '@barwright/contracts/design-doc';
import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { convertDesignUnits } from '../units/field-units';
import { addLayer, removeLayer, writeChangedLeaves } from './design-writes';

const ORIGIN = { me: true };
const docWith = () => {
  const doc = new Y.Doc();
  writeDesign(doc, EXAMPLE_DESIGN);
  return doc;
};

describe('layer edits', () => {
  it('adds and removes layers, never the last one', () => {
    const doc = docWith();
    expect(addLayer(doc, { lobes: 3, amplitude: 0.2, phase: 0, wave: { shape: 'sine' } }, ORIGIN)).toBe(true);
    expect((readDesign(doc) as any).rosette.layers).toHaveLength(2);
    expect(removeLayer(doc, 0, ORIGIN)).toBe(true);
    expect((readDesign(doc) as any).rosette.layers[0].lobes).toBe(3);
    expect(removeLayer(doc, 0, ORIGIN)).toBe(false);
  });

  it('is one undo step per edit for an undo manager tracking our origin', () => {
    const doc = docWith();
    const undo = new Y.UndoManager(doc.getMap('design'), { trackedOrigins: new Set([ORIGIN]) });
    addLayer(doc, { lobes: 3, amplitude: 0.2, phase: 0, wave: { shape: 'sine' } }, ORIGIN);
    undo.undo();
    expect((readDesign(doc) as any).rosette.layers).toHaveLength(1);
  });
});

describe('writeChangedLeaves', () => {
  it('switches a design to inches field by field and keeps it valid', () => {
    const doc = docWith();
    const inch = convertDesignUnits(EXAMPLE_DESIGN, 'in');
    const layersBefore = doc.getMap('design').get('rosette');
    writeChangedLeaves(doc, readDesign(doc), inch, ORIGIN);
    expect(readDesign(doc)).toEqual(inch);
    expect(parseDesign(readDesign(doc)).ok).toBe(true);
    expect(doc.getMap('design').get('rosette')).toBe(layersBefore); // the structure stays
  });

  it('keeps a concurrent edit of a field it did not change', () => {
    const a = docWith();
    const b = new Y.Doc();
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    writeChangedLeaves(a, readDesign(a), convertDesignUnits(EXAMPLE_DESIGN, 'in'), ORIGIN);
    ((b.getMap('design').get('study') as Y.Map<unknown>)).set('lines', 60);
    Y.applyUpdate(a, Y.encodeStateAsUpdate(b));
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    expect((readDesign(a) as any).study.lines).toBe(60);
    expect(readDesign(a)).toEqual(readDesign(b));
  });
});
