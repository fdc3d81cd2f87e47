import { describe, expect, it } from 'vitest';
import type { AuditEntry } from '@barwright/contracts';
import { auditLink, auditSentence } from './audit-lines';

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
    expect(auditSentence(entry({ action: 'showcase.feature', target: { kind: 'entry', id: 'e', label: 'Sine 24' }, subject: null }))).toBe('Tobias featured Sine 24');
  });

  it('link to the entry the line is about', () => {
    expect(auditLink(entry({}))).toBe('/entries/e');
    expect(auditLink(entry({ target: { kind: 'entry', id: 'x', label: '' } }))).toBe('/entries/x');
    expect(auditLink(entry({ target: { kind: 'user', id: 'u', label: '' } }))).toBeNull();
  });
});
