/** drizzle-kit configuration: `npm run db:generate` writes SQL migrations for db/schema.ts into drizzle/. */
import { defineConfig } from 'drizzle-kit';

export default defineConfig({
  dialect: 'sqlite',
  schema: './db/schema.ts',
  out: './drizzle',
});
