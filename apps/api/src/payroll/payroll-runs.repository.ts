import { Injectable } from '@nestjs/common';
import { payPeriods, payrollLines, payrollRuns, type PayPeriodRow, type PayrollLineRow, type PayrollRunRow } from '@tressury/schema';
import { and, asc, eq, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type RunWithPeriod = { run: PayrollRunRow; period: PayPeriodRow };

@Injectable()
export class PayrollRunsRepository {
  constructor(private readonly database: Database) {}

  async findRun(organisationId: string, id: string, lock = false): Promise<RunWithPeriod | null> {
    const query = this.database.db
      .select({ run: payrollRuns, period: payPeriods })
      .from(payrollRuns)
      .innerJoin(payPeriods, eq(payPeriods.id, payrollRuns.periodId))
      .where(and(eq(payrollRuns.organisationId, organisationId), eq(payrollRuns.id, id)));
    const [row] = lock ? await query.for('update', { of: payrollRuns }) : await query;
    return row ?? null;
  }

  async runForPeriod(periodId: string): Promise<PayrollRunRow | null> {
    const [row] = await this.database.db.select().from(payrollRuns).where(eq(payrollRuns.periodId, periodId)).for('update');
    return row ?? null;
  }

  async deleteRun(id: string): Promise<void> {
    await this.database.db.delete(payrollRuns).where(eq(payrollRuns.id, id));
  }

  async insertRun(values: typeof payrollRuns.$inferInsert): Promise<PayrollRunRow> {
    const [row] = await this.database.db.insert(payrollRuns).values(values).returning();
    return row!;
  }

  async updateRun(id: string, changes: Partial<typeof payrollRuns.$inferInsert>): Promise<PayrollRunRow> {
    const [row] = await this.database.db.update(payrollRuns).set(changes).where(eq(payrollRuns.id, id)).returning();
    return row!;
  }

  async insertLines(lines: (typeof payrollLines.$inferInsert)[]): Promise<void> {
    if (lines.length > 0) await this.database.db.insert(payrollLines).values(lines);
  }

  /** The run's lines the caller may read (`readable` filters on payroll_lines and payroll_runs). */
  async lines(runId: string, readable: SQL): Promise<PayrollLineRow[]> {
    const rows = await this.database.db
      .select({ line: payrollLines })
      .from(payrollLines)
      .innerJoin(payrollRuns, eq(payrollRuns.id, payrollLines.runId))
      .where(and(eq(payrollLines.runId, runId), readable))
      .orderBy(asc(payrollLines.branchName), asc(payrollLines.staffName), asc(payrollLines.staffId));
    return rows.map((r) => r.line);
  }

  async findLine(organisationId: string, runId: string, lineId: string): Promise<{ line: PayrollLineRow; runStatus: string } | null> {
    const [row] = await this.database.db
      .select({ line: payrollLines, runStatus: payrollRuns.status })
      .from(payrollLines)
      .innerJoin(payrollRuns, eq(payrollRuns.id, payrollLines.runId))
      .where(and(eq(payrollLines.organisationId, organisationId), eq(payrollLines.runId, runId), eq(payrollLines.id, lineId)));
    return row ?? null;
  }
}
