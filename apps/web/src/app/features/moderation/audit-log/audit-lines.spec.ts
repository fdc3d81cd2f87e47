import { describe, expect, it } from 'vitest';
import type { AuditEntry } from '@barwright/contracts';
import { auditLink, auditSentence, itemTitle } from './audit-lines';

const entry = (over: Partial<AuditEntry>): AuditEntry => ({
  id: 'a', at: '2026-03-01T10:00:00.000Z', actor: { id: 't', displayName: 'Tobias' }, action: 'item.hide',
  target: { kind: 'comment', id: 'c', label: 'comment on “Sine 24”' }, subject: { id: 'i', displayName: 'Ilse' }, reason: 'Advertising', details: { entryId: 'e' }, ...over,
});

describe('audit log lines', () => {
  it('read as sentences', () => {
    expect(auditSentence(entry({}))).toBe('Tobias hid comment on “Sine 24” (by Ilse)');
    expect(auditSentence(entry({ action: 'report.dismiss', details: { reports: 2 } }))).toBe('Tobias dismissed 2 reports on comment on “Sine 24” (by Ilse)');
    expect(auditSentence(entry({ action: 'user.role', actor: { id: null, displayName: 'command line' }, target: { kind: 'user', id: 'm', label: 'Maren' }, details: { from: null, to: 'admin' } }))).toBe(
      'command line changed the role of Maren: new account → admin',
    );
    expect(auditSentence(entry({ action: 'showcase.reorder', target: { kind: 'showcase', id: null, label: 'the showcase' } }))).toBe('Tobias reordered the showcase');
    expect(auditSentence(entry({ action: 'showcase.reorder', target: { kind: 'entry', id: 'e', label: 'Sine 24' }, details: { moves: [{ entryId: 'e', title: 'Sine 24', from: 3, to: 1 }] } }))).toBe(
      'Tobias moved “Sine 24” from place 3 to 1 in the showcase',
    );
    expect(
      auditSentence(entry({ action: 'showcase.reorder', details: { moves: [{ entryId: 'a', title: 'A', from: 2, to: 1 }, { entryId: 'b', title: 'B', from: 1, to: 2 }] } })),
    ).toBe('Tobias reordered the showcase: “A” 2 → 1, “B” 1 → 2');
    expect(auditSentence(entry({ action: 'user.role', target: { kind: 'user', id: 'm', label: 'Maren' }, details: { from: 'admin', to: 'member', undo: true } }))).toBe(
      'Tobias undid the role change of Maren: admin → member',
    );
    expect(auditSentence(entry({ action: 'showcase.feature', target: { kind: 'entry', id: 'e', label: 'Sine 24' }, subject: null }))).toBe('Tobias featured “Sine 24”');
    expect(auditSentence(entry({ action: 'showcase.unfeature', target: { kind: 'entry', id: 'e', label: 'Sine 24' }, subject: null }))).toBe('Tobias took “Sine 24” out of the showcase');
  });

  it('link to the entry the line is about', () => {
    expect(auditLink(entry({}))).toBe('/entries/e');
    expect(auditLink(entry({ target: { kind: 'entry', id: 'x', label: '' } }))).toBe('/entries/x');
    expect(auditLink(entry({ target: { kind: 'user', id: 'u', label: '' } }))).toBeNull();
  });

  it('name the item a filter is about by its title', () => {
    expect(itemTitle({ kind: 'entry', label: 'Sine 24' })).toBe('the bar “Sine 24”');
    expect(itemTitle({ kind: 'comment', label: 'comment on “Sine 24”' })).toBe('comment on “Sine 24”');
    expect(itemTitle({ kind: 'user', label: 'Maren' })).toBe('the account of Maren');
  });
});
