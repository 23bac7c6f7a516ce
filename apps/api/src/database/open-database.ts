import { PGlite } from '@electric-sql/pglite';
import * as schema from '@tressury/schema';
import { migrationsFolder } from '@tressury/schema';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import { sql } from 'drizzle-orm';
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { Database, type Db } from './database.js';
import { lockDataDir } from './data-dir-lock.js';
import { analyseChangedTables } from './planner-statistics.js';

export type OpenedDatabase = {
  database: Database;
  /** Flushes the write-ahead log (PGlite) and refreshes planner statistics that have gone stale. */
  checkpoint: () => Promise<void>;
  close: () => Promise<void>;
};

// Several API instances may start at once against one server: only one applies migrations.
const MIGRATION_LOCK_KEY = 7_305_112_001;

export async function openDatabase(options: { databaseUrl: string | null; dataDir: string }): Promise<OpenedDatabase> {
  if (options.databaseUrl) {
    const pool = new pg.Pool({ connectionString: options.databaseUrl, max: 10 });
    const db = drizzlePg({ client: pool, schema });
    const client = await pool.connect();
    try {
      await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
      await migratePg(drizzlePg({ client, schema }), { migrationsFolder });
    } finally {
      await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
      client.release();
    }
    return {
      database: new Database(db as unknown as Db, 'postgres'),
      checkpoint: async () => undefined,
      close: () => pool.end(),
    };
  }

  const inMemory = options.dataDir.startsWith('memory://');
  const unlock = inMemory ? () => undefined : lockDataDir(options.dataDir);
  try {
    if (!inMemory) mkdirSync(options.dataDir, { recursive: true });
    // PGlite's default 128 MB of shared buffers is touched at start and never given back; the files sit in
    // the operating system's page cache anyway, so a small buffer pool costs little and saves ~100 MB.
    const open = () => PGlite.create(inMemory ? undefined : options.dataDir, { startParams: [...PGlite.defaultStartParams, '-c', 'shared_buffers=16MB'] });
    // Creating a data directory runs initdb inside the process and leaves some 350 MB behind it; closing and
    // opening the new directory again (a fraction of a second) gives that back.
    const fresh = !inMemory && !existsSync(join(options.dataDir, 'PG_VERSION'));
    if (fresh) await (await open()).close();
    const client = await open();
    const db = drizzlePglite({ client, schema });
    await migratePglite(db, { migrationsFolder });
    await analyseChangedTables(client);
    let closed = false;
    return {
      database: new Database(db as unknown as Db, 'pglite'),
      checkpoint: async () => {
        if (closed) return;
        await analyseChangedTables(client);
        await db.execute(sql`CHECKPOINT`);
      },
      close: async () => {
        if (closed) return;
        closed = true;
        await client.query('CHECKPOINT');
        await client.close();
        unlock();
      },
    };
  } catch (error) {
    unlock();
    throw error;
  }
}
