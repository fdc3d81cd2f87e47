import fs from 'node:fs';
import path from 'node:path';
import { beforeEach, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import type { AuditEntry } from '@barwright/contracts';
import { auditLog } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, type Member } from '../community/community-testing';
import { commentOn, itemPath, person, report } from '../moderation/moderation-testing';
import { recordAudit } from './audit-log';

const drivers = await availableDrivers();
const SERVER_SRC = path.join(import.meta.dirname, '..');

/** Every server source file (specs left out), as text. */
function serverSources(): { file: string; text: string }[] {
  return (fs.readdirSync(SERVER_SRC, { recursive: true, encoding: 'utf8' }) as string[])
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.spec.ts'))
    .map((file) => ({ file, text: fs.readFileSync(path.join(SERVER_SRC, file), 'utf8') }));
}

describe.each(drivers)('the audit log on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let ilse: Member;
  let tobias: Member;
  let odile: Member;
  let entryId: string;
  let comment: string;
  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    tobias = await person(database, server, 'tobias', 'moderator');
    odile = await person(database, server, 'odile', 'admin');
    entryId = (await publishedBar(maren, 'Sine 24')).entryId;
    comment = await commentOn(ilse, entryId, 'Cheap rosettes at example.test');
    await report(maren, 'comment', comment, 'spam');
  });

  const audit = async (m: Member, query = '') => (await m.client.get(`/api/moderation/audit${query}`)).body as { items: AuditEntry[]; total: number };

  it('records who did what to which item, why and when, for moderation and role actions alike', async () => {
    const before = Date.now();
    await tobias.client.post(`${itemPath('comment', comment)}/hide`, { reason: 'Advertising.' });
    await odile.client.patch(`/api/admin/users/${ilse.id}`, { role: 'moderator' });
    await odile.client.patch(`/api/admin/users/${ilse.id}`, { role: 'moderator' }); // no change: no line
    await odile.client.patch(`/api/admin/users/${ilse.id}`, { role: 'member', suspended: true });
    await odile.client.patch(`/api/admin/users/${ilse.id}`, { suspended: false });
    const { items, total } = await audit(tobias);
    expect(total).toBe(5);
    expect(items.map((e) => e.action)).toEqual(['user.unsuspend', 'user.suspend', 'user.role', 'user.role', 'item.hide']);
    expect(items[2]).toMatchObject({ actor: { id: odile.id, displayName: 'odile' }, target: { kind: 'user', id: ilse.id, label: 'ilse' }, details: { from: 'moderator', to: 'member' } });
    expect(items[4]).toMatchObject({ actor: { id: tobias.id }, target: { kind: 'comment', id: comment }, subject: { id: ilse.id }, reason: 'Advertising.', details: { entryId, reports: 1, excerpt: 'Cheap rosettes at example.test' } });
    for (const e of items) expect(Date.parse(e.at)).toBeGreaterThanOrEqual(before - 1000);
  });

  it('filters by action, actor, kind, item and an inclusive date range, in pages', async () => {
    await tobias.client.post(`${itemPath('comment', comment)}/hide`, { reason: 'Advertising.' });
    await tobias.client.post(`${itemPath('comment', comment)}/restore`, {});
    await tobias.client.post('/api/moderation/showcase', { entryId, note: 'Clean lines' });
    await odile.client.patch(`/api/admin/users/${ilse.id}`, { role: 'moderator' });
    await recordAudit(database.db, { actor: null, action: 'user.role', target: { kind: 'user', id: maren.id, label: 'maren' }, details: { from: 'member', to: 'admin' } });
    await database.db.execute(sql`ALTER TABLE audit_log DISABLE TRIGGER audit_log_append_only`); // only to date a line in the past, for the range filter
    await database.db.update(auditLog).set({ at: new Date('2026-01-15T12:00:00Z') }).where(sql`${auditLog.action} = 'showcase.feature'`);
    await database.db.execute(sql`ALTER TABLE audit_log ENABLE TRIGGER audit_log_append_only`);

    expect((await audit(tobias, '?action=item.restore')).items.map((e) => e.target.id)).toEqual([comment]);
    expect((await audit(tobias, `?actor=${odile.id}`)).items.map((e) => e.action)).toEqual(['user.role']);
    expect((await audit(tobias, '?kind=user')).total).toBe(2);
    expect((await audit(tobias, `?item=${comment}`)).items.map((e) => e.action)).toEqual(['item.restore', 'item.hide']);
    expect((await audit(tobias, `?item=${entryId}`)).items.map((e) => e.action)).toEqual(['showcase.feature']);
    // Filtered by item, the page names the item by its title, so nobody reads a raw id.
    expect((await tobias.client.get(`/api/moderation/audit?item=${entryId}`)).body.item).toEqual({ id: entryId, kind: 'entry', label: 'Sine 24' });
    expect((await tobias.client.get(`/api/moderation/audit?item=${comment}`)).body.item).toMatchObject({ kind: 'comment', label: 'comment on “Sine 24”' });
    expect((await tobias.client.get('/api/moderation/audit?item=00000000-0000-4000-8000-000000000000')).body.item).toBeNull();
    expect((await tobias.client.get('/api/moderation/audit')).body).not.toHaveProperty('item');
    expect((await audit(tobias, '?from=2026-01-15&to=2026-01-15')).items.map((e) => e.action)).toEqual(['showcase.feature']);
    expect((await audit(tobias, '?to=2026-01-14')).total).toBe(0);
    expect((await audit(tobias, '?from=2026-01-16')).total).toBe(4);
    expect((await audit(tobias, '?from=2026-01-15T12:00:00Z&to=2026-01-15T12:00:00Z')).total).toBe(1);
    const page2 = await audit(tobias, '?pageSize=2&page=2');
    expect(page2).toMatchObject({ total: 5, page: 2, pageSize: 2 });
    expect(page2.items).toHaveLength(2);
    const cli = (await audit(tobias, `?item=${maren.id}`)).items[0];
    expect(cli.actor).toEqual({ id: null, displayName: 'command line' });
    expect((await tobias.client.get('/api/moderation/audit/actors')).body).toEqual([
      { id: odile.id, displayName: 'odile' },
      { id: tobias.id, displayName: 'tobias' },
    ]);
    const bad = await tobias.client.get('/api/moderation/audit?action=delete&from=yesterday&to=2026-01-01');
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['action', 'from']);
    expect((await tobias.client.get('/api/moderation/audit?from=2026-02-01&to=2026-01-01')).body.error.fields.to).toMatch(/before from/);
  });

  it('is append-only: no route changes or removes a line, no server code writes anything but inserts, and the database refuses both', async () => {
    await tobias.client.post(`${itemPath('comment', comment)}/hide`, { reason: 'Advertising.' });
    const [line] = (await audit(odile)).items;
    for (const method of ['put', 'patch', 'delete'] as const) {
      for (const route of ['/api/moderation/audit', `/api/moderation/audit/${line.id}`]) {
        const res = await odile.client.send(method, route, { reason: 'rewritten' });
        expect(res.status, `${method} ${route}`).toBe(404);
      }
    }
    expect((await odile.client.post('/api/moderation/audit', { action: 'item.hide' })).status).toBe(404);
    expect((await audit(odile)).items).toEqual([line]);

    // The only statements on the table anywhere in the server: the insert of audit-log.ts and the reads.
    const touching = serverSources().filter(({ text }) => /\bauditLog\b/.test(text));
    for (const { file, text } of touching) {
      expect(text, file).not.toMatch(/\.(update|delete)\(\s*auditLog\b/);
      expect(text, file).not.toMatch(/(UPDATE|DELETE FROM)\s+"?audit_log/i);
    }
    expect(touching.filter(({ text }) => /\.insert\(\s*auditLog\b/.test(text)).map(({ file }) => file)).toEqual([path.join('audit', 'audit-log.ts')]);

    await expect(database.db.update(auditLog).set({ reason: 'rewritten' })).rejects.toThrow();
    await expect(database.db.delete(auditLog)).rejects.toThrow();
    expect((await audit(odile)).items).toEqual([line]);
  });
});
