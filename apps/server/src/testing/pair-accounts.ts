import pg from 'pg';
import * as Y from 'yjs';
import { HttpSession } from './server-process';

const PASSWORD = 'quiet-walnut-crosscut-49';

/** An account made through `baseUrl` (sign-up, then signed in), with its session; `role` is set in the database. */
export async function signedUpAccount(baseUrl: string, pool: pg.Pool, name: string, role: 'member' | 'moderator' | 'admin' = 'member') {
  const email = `${name.toLowerCase()}-${Math.random().toString(36).slice(2, 8)}@example.test`;
  const http = new HttpSession(baseUrl);
  const up = await http.request('POST', '/api/auth/sign-up', { email, password: PASSWORD, displayName: name });
  if (up.status !== 201) throw new Error(`sign-up answered ${up.status}: ${JSON.stringify(up.body)}`);
  await pool.query(`update users set role = $1, email_verified_at = now() where email = $2`, [role, email]);
  const signIn = await http.request('POST', '/api/auth/sign-in', { email, password: PASSWORD });
  if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
  const { rows } = await pool.query<{ id: string }>('select id from users where email = $1', [email]);
  return { id: rows[0].id, email, password: PASSWORD, http, cookie: () => http.cookieHeader };
}

/** A new session of the same account against another base URL (the cookie is valid on every instance). */
export function sameSessionAt(baseUrl: string, http: HttpSession): HttpSession {
  const other = new HttpSession(baseUrl);
  (other as unknown as { cookies: Map<string, string> }).cookies = (http as unknown as { cookies: Map<string, string> }).cookies;
  return other;
}

/** The stored state of a design, read straight from its rows as a new server would load it. */
export async function storedDoc(pool: pg.Pool, designId: string): Promise<Y.Doc> {
  const { rows } = await pool.query<{ update: Buffer }>('select update from design_updates where design_id = $1 order by seq', [designId]);
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Y.mergeUpdates(rows.map((r) => new Uint8Array(r.update))));
  return doc;
}

export async function storedRowCount(pool: pg.Pool, designId: string): Promise<number> {
  const { rows } = await pool.query<{ n: string }>('select count(*) as n from design_updates where design_id = $1', [designId]);
  return Number(rows[0].n);
}
