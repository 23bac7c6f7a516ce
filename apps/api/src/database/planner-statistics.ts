import type { PGlite } from '@electric-sql/pglite';

/**
 * PGlite runs no autovacuum and keeps no activity counters, so nothing would ever gather the planner's
 * statistics; without them it guesses row counts and can pick plans that scan a large table once per row.
 * Tables never analysed, or whose size on disk has moved by more than a fifth (and a few pages) since they
 * last were, are analysed here: at start and on the checkpoint timer. Returns the tables analysed.
 */
export async function analyseChangedTables(client: PGlite): Promise<string[]> {
  const { rows } = await client.query<{ name: string }>(`
    select c.relname as name
    from pg_class c join pg_namespace n on n.oid = c.relnamespace
    where n.nspname = 'public' and c.relkind = 'r'
      and (c.reltuples < 0
        or abs(pg_relation_size(c.oid) / current_setting('block_size')::int - c.relpages) > greatest(c.relpages / 5, 8))
    order by c.relname`);
  for (const { name } of rows) await client.exec(`analyze "${name.replaceAll('"', '""')}"`);
  return rows.map((r) => r.name);
}
