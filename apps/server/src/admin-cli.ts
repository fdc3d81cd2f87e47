import { parseArgs } from 'node:util';
import { eq } from 'drizzle-orm';
import { emailSchema, passwordSchema } from '@barwright/contracts';
import { users } from '../../../db/schema';
import { loadConfig } from './config';
import { openConfiguredDatabase } from './runtime';
import { hashPassword, passwordWeakness } from './auth/passwords';
import { revokeTokens } from './auth/account-tokens';
import { findUserByEmail, insertUser } from './auth/users';
import { recordAudit } from './audit/audit-log';

const USAGE = `Usage: npm run admin -- create --email E --password P [--name N] [--data-dir D]

Creates an admin account, or promotes an existing account to admin (its password is then set to P).
Run it while the server is stopped: the embedded database allows one process at a time.
With DATABASE_URL set, it works on that PostgreSQL server instead.`;

function fail(message: string): never {
  console.error(message);
  process.exit(2);
}

async function main() {
  const { values, positionals } = parseArgs({
    allowPositionals: true,
    options: { email: { type: 'string' }, password: { type: 'string' }, name: { type: 'string' }, 'data-dir': { type: 'string' }, help: { type: 'boolean' } },
  });
  if (values.help) return console.log(USAGE);
  if (positionals[0] !== 'create') fail(USAGE);
  const email = emailSchema.safeParse(values.email);
  if (!email.success) fail(`--email ${email.error.issues[0].message}`);
  const password = passwordSchema.safeParse(values.password);
  if (!password.success) fail(`--password ${password.error.issues[0].message}`);
  const weakness = passwordWeakness(password.data, [email.data]);
  if (weakness) fail(`--password ${weakness}`);

  const config = loadConfig({ ...process.env, ...(values['data-dir'] ? { DATA_DIR: values['data-dir'] } : {}) }, { serving: false });
  const { database, release } = await openConfiguredDatabase(config, console.log);
  try {
    const existing = await findUserByEmail(database.db, email.data);
    if (existing) {
      await database.db
        .update(users)
        .set({ role: 'admin', suspendedAt: null, passwordHash: await hashPassword(password.data), emailVerifiedAt: existing.emailVerifiedAt ?? new Date() })
        .where(eq(users.id, existing.id));
      // The password was just set here: a reset link mailed before must not set it again.
      await revokeTokens(database.db, existing.id, 'reset');
      // A role action like any other: the audit log names the command line as its actor.
      const target = { kind: 'user' as const, id: existing.id, label: existing.displayName };
      if (existing.role !== 'admin') await recordAudit(database.db, { actor: null, action: 'user.role', target, subject: existing, details: { from: existing.role, to: 'admin' } });
      if (existing.suspendedAt) await recordAudit(database.db, { actor: null, action: 'user.unsuspend', target, subject: existing });
      console.log(`${email.data} is now an admin.`);
    } else {
      const created = await insertUser(database.db, { email: email.data, password: password.data, displayName: values.name ?? email.data.split('@')[0], role: 'admin', verified: true });
      if (created) await recordAudit(database.db, { actor: null, action: 'user.role', target: { kind: 'user', id: created.id, label: created.displayName }, subject: created, details: { from: null, to: 'admin' } });
      console.log(`Admin ${email.data} created.`);
    }
  } finally {
    await database.close();
    release();
  }
}

main().catch((error) => fail(error instanceof Error ? error.message : String(error)));
