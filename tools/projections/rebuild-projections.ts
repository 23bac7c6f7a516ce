// Rebuilds the branch comparison's read models (branch_day_figures, staff_day_figures, client_visits) from
// the source tables, for every organisation. On PGlite stop the app first: one process owns a data directory.
//
//   npm run projections:rebuild          (TRESSURY_DATA_DIR or DATABASE_URL as for `npm start`)
import { resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { sql } from 'drizzle-orm';
import { rebuildProjections, rowsOf } from '../../apps/api/src/compare/compare-projections.js';
import { openDatabase } from '../../apps/api/src/database/open-database.js';

const root = resolve(import.meta.dirname, '../..');
const print = (line: string) => process.stdout.write(`${line}\n`);

async function main(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL?.trim() || null;
  // `npm start` runs the API in apps/api, so a relative data directory is taken from there too.
  const dataDir = process.env.TRESSURY_DATA_DIR?.trim() || './data';
  const opened = await openDatabase({ databaseUrl, dataDir: dataDir.startsWith('memory://') ? dataDir : resolve(root, 'apps/api', dataDir) });
  try {
    const { database } = opened;
    const organisations = rowsOf<{ id: string; name: string }>(await database.db.execute(sql`select id, name from organisations order by name`));
    for (const organisation of organisations) {
      const started = performance.now();
      await database.transaction(() => rebuildProjections(database.db, organisation.id));
      const [counts] = rowsOf<{ branch_days: number; staff_days: number; visits: number }>(
        await database.db.execute(sql`
          select (select count(*)::int from branch_day_figures where organisation_id = ${organisation.id}) as branch_days,
                 (select count(*)::int from staff_day_figures where organisation_id = ${organisation.id}) as staff_days,
                 (select count(*)::int from client_visits where organisation_id = ${organisation.id}) as visits`),
      );
      print(
        `${organisation.name}: ${counts!.branch_days} branch-days, ${counts!.staff_days} staff-days, ${counts!.visits} client visits rebuilt in ${((performance.now() - started) / 1000).toFixed(1)} s`,
      );
    }
    if (organisations.length === 0) print('No organisation in this database: nothing to rebuild.');
  } finally {
    await opened.close();
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
