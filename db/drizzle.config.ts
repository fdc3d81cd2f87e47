import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes a new SQL migration into db/migrations after a schema change.
// Migrations are committed and never edited after they land.
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema/index.ts',
  out: './db/migrations',
});
