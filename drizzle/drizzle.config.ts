import { defineConfig } from 'drizzle-kit';

// Generates SQL from the schema only; never point drizzle-kit at a live PGlite data directory.
export default defineConfig({
  dialect: 'postgresql',
  schema: './schema/index.ts',
  out: './migrations',
});
