import { Injectable } from '@nestjs/common';
import type { PayInput } from '@tressury/domain';
import { payPeriods, payrollLines, payrollRuns, type PayPeriodRow, type PayrollLineRow, type PayrollRunRow } from '@tressury/schema';
import { and, asc, eq, getTableColumns, inArray, sql, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type RunWithPeriod = { run: PayrollRunRow; period: PayPeriodRow };
/** A line's figures without the stored input and result (about 14 KB of JSON per staff member). */
export type PayrollLineFigures = Omit<PayrollLineRow, 'input' | 'result'>;

const lineColumns = getTableColumns(payrollLines);
const { input: _input, result: _result, ...figureColumns } = lineColumns;

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

  /**
   * Inserts a batch of lines with one statement and one jsonb parameter: a batch holds megabytes of stored
   * inputs, and Drizzle's building of a parameter per value took longer than the insert itself.
   */
  async insertLines(lines: (typeof payrollLines.$inferInsert)[]): Promise<void> {
    if (lines.length === 0) return;
    const keys = Object.keys(lines[0]!) as (keyof typeof lineColumns)[];
    const names = sql.raw(keys.map((key) => `"${lineColumns[key].name}"`).join(', '));
    const rows = lines.map((line) => Object.fromEntries(keys.map((key) => [lineColumns[key].name, line[key]])));
    await this.database.db.execute(sql`insert into payroll_lines (${names}) select ${names} from jsonb_populate_recordset(null::payroll_lines, ${JSON.stringify(rows)}::jsonb)`);
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

  /** As `lines`, without the stored input and result. */
  async lineFigures(runId: string, readable: SQL): Promise<PayrollLineFigures[]> {
    return this.database.db
      .select(figureColumns)
      .from(payrollLines)
      .innerJoin(payrollRuns, eq(payrollRuns.id, payrollLines.runId))
      .where(and(eq(payrollLines.runId, runId), readable))
      .orderBy(asc(payrollLines.branchName), asc(payrollLines.staffName), asc(payrollLines.staffId));
  }

  /** The stored computePay inputs of some lines of a run, by line id. */
  async lineInputs(runId: string, lineIds: string[]): Promise<Map<string, PayInput>> {
    if (lineIds.length === 0) return new Map();
    const rows = await this.database.db
      .select({ id: payrollLines.id, input: payrollLines.input })
      .from(payrollLines)
      .where(and(eq(payrollLines.runId, runId), inArray(payrollLines.id, lineIds)));
    return new Map(rows.map((r) => [r.id, r.input as PayInput]));
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
