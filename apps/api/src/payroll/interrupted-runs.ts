import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { payrollRuns } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import { Database } from '../database/database.js';

export const INTERRUPTED_REASON = 'The app stopped while this run was being computed; run the period again.';

/**
 * On the embedded database only one process can have the data open, so a run still marked computing at
 * start was left by this app's previous life and will never finish: it is marked failed. On a PostgreSQL
 * server other instances may be computing runs right now; there a run counts as dead only once its
 * heartbeat stops (see isStalled).
 */
@Injectable()
export class InterruptedRuns implements OnApplicationBootstrap {
  private readonly logger = new Logger('PayrollComputation');

  constructor(private readonly database: Database) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.database.engine !== 'pglite') return;
    const failed = await this.database.db
      .update(payrollRuns)
      .set({ status: 'failed', error: INTERRUPTED_REASON, completedAt: new Date() })
      .where(eq(payrollRuns.status, 'computing'))
      .returning({ id: payrollRuns.id });
    if (failed.length > 0) this.logger.warn(`Marked ${failed.length} payroll run(s) left computing by the previous start as failed`);
  }
}
