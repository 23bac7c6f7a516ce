import { fileURLToPath } from 'node:url';

/** The drizzle-kit SQL migrations, beside both the schema source and its build. */
export const migrationsFolder = fileURLToPath(new URL('../migrations', import.meta.url));
