import { count } from 'drizzle-orm';
import { users } from '../db/schema';
import type { Db } from '../apps/server/src/database/database';
import { insertUser } from '../apps/server/src/auth/users';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-scenario';
import { seedDemoCommunity } from './seed-demo-community';
import { seedDemoRacks } from './demo-racks';

/** Seeds the demo scenario into an empty database; returns false (and does nothing) when users exist. */
export async function seedDemoScenario(db: Db): Promise<boolean> {
  const [{ n }] = await db.select({ n: count() }).from(users);
  if (n > 0) return false;
  for (const account of DEMO_ACCOUNTS) {
    await insertUser(db, { ...account, password: DEMO_PASSWORD, verified: true });
  }
  await seedDemoCommunity(db);
  await seedDemoRacks(db);
  return true;
}
