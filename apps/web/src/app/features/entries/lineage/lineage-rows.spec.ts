import { describe, expect, it } from 'vitest';
import type { Lineage, LineageNode, LineageTreeNode } from '@barwright/contracts';
import { lineageRows, relativesCount } from './lineage-rows';

const node = (id: string): LineageNode => ({ id, available: true, title: id, author: { id: 'u', displayName: 'U' }, publishedAt: '2026-01-01T00:00:00Z', thumbnailUrl: `/t/${id}`, remixCount: 0 });
const tree = (id: string, children: LineageTreeNode[] = []): LineageTreeNode => ({ ...node(id), children });

describe('lineageRows', () => {
  it('puts the chain above the entry and its remixes below, indented by depth', () => {
    const lineage: Lineage = {
      entry: node('c'),
      rootEntryId: 'a',
      ancestors: [node('a'), node('b')],
      siblings: [node('s')],
      descendants: [tree('d', [tree('e')]), tree('f')],
    };
    expect(lineageRows(lineage).map((r) => `${r.role}:${r.node.id}@${r.depth}`)).toEqual([
      'ancestor:a@0', 'ancestor:b@1', 'self:c@2', 'descendant:d@3', 'descendant:e@4', 'descendant:f@3',
    ]);
    expect(relativesCount(lineage)).toBe(6);
  });

  it('keeps an unavailable entry in its place', () => {
    const lineage: Lineage = { entry: node('b'), rootEntryId: 'a', ancestors: [{ id: 'a', available: false }], siblings: [], descendants: [] };
    expect(lineageRows(lineage)[0]).toEqual({ node: { id: 'a', available: false }, depth: 0, role: 'ancestor' });
  });

  it('shows an original alone until it is remixed', () => {
    const lineage: Lineage = { entry: node('a'), rootEntryId: 'a', ancestors: [], siblings: [], descendants: [] };
    expect(lineageRows(lineage)).toHaveLength(1);
    expect(relativesCount(lineage)).toBe(0);
  });
});
