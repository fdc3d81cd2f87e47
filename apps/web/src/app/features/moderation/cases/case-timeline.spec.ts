import { describe, expect, it } from 'vitest';
import type { CaseReport, ModerationCase } from '@barwright/contracts';
import { caseTimeline, itemName, itemPhrase, reportsSummary } from './case-timeline';

const report = (over: Partial<CaseReport>): CaseReport => ({
  id: 'r', reason: 'spam', details: '', status: 'open', createdAt: '2026-03-01T10:00:00.000Z', resolvedAt: null,
  reporter: { id: 'u1', displayName: 'Rita', reportsFiled: 1, reportsUpheld: 0 }, ...over,
});

describe('the history of a case', () => {
  it('merges earlier reports and decisions, newest first, in words', () => {
    const lines = caseTimeline({
      earlierReports: [report({ status: 'dismissed', createdAt: '2026-03-01T10:00:00.000Z', details: 'Looks like an advert' })],
      actions: [
        { id: 'a1', at: '2026-03-02T09:00:00.000Z', actor: { id: 'm', displayName: 'Tobias' }, action: 'report.dismiss', target: { kind: 'comment', id: 'c', label: '' }, subject: null, reason: 'A club supplier', details: {} },
        { id: 'a2', at: '2026-03-03T09:00:00.000Z', actor: { id: 'm', displayName: 'Tobias' }, action: 'item.hide', target: { kind: 'comment', id: 'c', label: '' }, subject: null, reason: 'Advertising', details: {} },
      ],
    });
    expect(lines.map((l) => [l.text, l.words])).toEqual([
      ['Tobias hid it', 'Advertising'],
      ['Tobias dismissed the reports', 'A club supplier'],
      ['Rita reported it: Spam (dismissed)', 'Looks like an advert'],
    ]);
  });

  it('sums up the open reports and names the item', () => {
    expect(reportsSummary({ openReports: [] })).toBe('No open reports');
    expect(reportsSummary({ openReports: [report({})] })).toBe('1 open report');
    expect(reportsSummary({ openReports: [report({}), report({ reporter: { id: 'u2', displayName: 'Sam', reportsFiled: 3, reportsUpheld: 1 } })] })).toBe('2 open reports by 2 members');
    const item = { entryTitle: 'Sine 24' } as ModerationCase['item'];
    expect(itemName({ item: { ...item, target: { kind: 'comment', id: 'c' } } })).toBe('Comment on “Sine 24”');
    expect(itemName({ item: { ...item, target: { kind: 'entry', id: 'e' } } })).toBe('Bar “Sine 24”');
    expect(itemPhrase({ item: { ...item, target: { kind: 'photo', id: 'p' } } })).toBe('the photo on “Sine 24”');
  });
});
