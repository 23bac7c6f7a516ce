/**
 * Awaits Drizzle queries one after another. They are lazy until awaited, and a transaction (or PGlite)
 * has one connection that runs one query at a time anyway; node-postgres deprecates queueing on it.
 */
export async function inTurn<T extends readonly unknown[]>(queries: readonly [...T]): Promise<{ -readonly [K in keyof T]: Awaited<T[K]> }> {
  const results: unknown[] = [];
  for (const query of queries) results.push(await query);
  return results as { -readonly [K in keyof T]: Awaited<T[K]> };
}
