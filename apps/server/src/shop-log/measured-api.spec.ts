import { beforeEach, describe, expect, it } from 'vitest';
import { MEASURED_TABLE_MAX_BYTES } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { member, upload, xsrfOf, type Member } from '../community/community-testing';

const drivers = await availableDrivers();
const PATH = '/api/rosettes/measured/preview';
const table = ['angle,radius', ...Array.from({ length: 12 }, (_, i) => `${i * 30},${50 + (i % 2) * 0.75}`)].join('\n');

describe.each(drivers)('measured rosette preview on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  const sendText = async (c: Client, body: string, type = 'text/csv') => {
    const token = await xsrfOf(c);
    return c.agent.post(PATH).set('X-XSRF-TOKEN', token).set('Content-Type', type).send(body);
  };

  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await member(database, server, 'maren');
  });

  it('previews a CSV body or an uploaded file, naming bad rows', async () => {
    const res = await sendText(maren.client, table);
    expect(res.status).toBe(200);
    expect(res.body.errors).toEqual([]);
    expect(res.body.points.slice(0, 2)).toEqual([[0, 50], [30, 50.75]]);
    const file = await upload(maren.client, PATH, { field: 'table', data: Buffer.from(`${table}\n370,50`), name: 'rosette-7.csv' }, {});
    expect(file.body.errors).toEqual([{ line: 14, message: 'angle 370° is outside 0° to below 360°' }]);
    const plain = await sendText(maren.client, '0 50\n10 x', 'text/plain');
    expect(plain.body.errors).toEqual([{ line: 2, message: 'radius "x" is not a number' }, { line: null, message: 'needs at least 8 good readings; found 1' }]);
  });

  it('refuses visitors, a missing table and an oversize one', async () => {
    expect((await sendText(new Client(server.app), table)).status).toBe(401);
    const none = await maren.client.post(PATH, { table });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.table).toBe('is required');
    expect((await sendText(maren.client, 'x'.repeat(MEASURED_TABLE_MAX_BYTES + 1))).status).toBe(413);
  });
});
