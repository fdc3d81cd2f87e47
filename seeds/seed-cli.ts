import { loadConfig } from '../apps/server/src/config';
import { openConfiguredDatabase } from '../apps/server/src/runtime';
import { seedDemoScenario } from './seed-demo';

// `npm run seed`: seeds the demo scenario into the configured database if it has no users yet.
const config = loadConfig(process.env, { serving: false });
const { database, release } = await openConfiguredDatabase(config, console.log);
try {
  console.log((await seedDemoScenario(database.db)) ? 'Demo scenario seeded.' : 'The database already has users; nothing seeded.');
} finally {
  await database.close();
  release();
}
