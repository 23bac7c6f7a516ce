import { AsyncLocalStorage } from 'node:async_hooks';
import { sql } from 'drizzle-orm';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from '@tressury/schema';

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
export type DatabaseEngine = 'pglite' | 'postgres';

type UnitOfWork = { tx: Db; afterCommit: (() => void)[] };

/**
 * The Drizzle handle of the current transaction, carried through AsyncLocalStorage: on PGlite a query
 * sent to the root connection while a transaction is open waits forever, so nothing may reach past it.
 */
export class Database {
  private readonly unitOfWork = new AsyncLocalStorage<UnitOfWork>();

  constructor(
    private readonly root: Db,
    readonly engine: DatabaseEngine,
  ) {}

  get db(): Db {
    return this.unitOfWork.getStore()?.tx ?? this.root;
  }

  get inTransaction(): boolean {
    return this.unitOfWork.getStore() !== undefined;
  }

  /** Runs `work` in one transaction (joining the current one if any); after-commit hooks run once it commits. */
  async transaction<T>(work: () => Promise<T>): Promise<T> {
    if (this.inTransaction) return work();
    const afterCommit: (() => void)[] = [];
    const result = await this.root.transaction((tx) => this.unitOfWork.run({ tx: tx as unknown as Db, afterCommit }, work));
    for (const hook of afterCommit) hook();
    return result;
  }

  /**
   * Holds a branch's business date until the current transaction ends. Opening a ticket and closing
   * the day both take it, so no ticket opens on a day while that day is being closed.
   */
  async lockBranchDay(branchId: string, businessDate: string): Promise<void> {
    if (!this.inTransaction) throw new Error('lockBranchDay must run inside a transaction');
    await this.db.execute(sql`select pg_advisory_xact_lock(hashtext(${`${branchId}:${businessDate}`}))`);
  }

  /** Defers `hook` until the current transaction commits (runs at once outside a transaction). */
  afterCommit(hook: () => void): void {
    const unit = this.unitOfWork.getStore();
    if (unit) unit.afterCommit.push(hook);
    else hook();
  }
}
