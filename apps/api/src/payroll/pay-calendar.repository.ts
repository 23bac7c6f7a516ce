import { Injectable } from '@nestjs/common';
import { payPeriods, payrollRuns, paySchedules, type PayPeriodRow, type PayrollRunStatus, type PayScheduleRow } from '@tressury/schema';
import { and, desc, eq, gte, inArray, lte } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class PayCalendarRepository {
  constructor(private readonly database: Database) {}

  async schedule(organisationId: string): Promise<PayScheduleRow | null> {
    const [row] = await this.database.db.select().from(paySchedules).where(eq(paySchedules.organisationId, organisationId));
    return row ?? null;
  }

  async saveSchedule(values: typeof paySchedules.$inferInsert): Promise<PayScheduleRow> {
    const { organisationId: _, ...changes } = values;
    const [row] = await this.database.db
      .insert(paySchedules)
      .values(values)
      .onConflictDoUpdate({ target: paySchedules.organisationId, set: { ...changes, updatedAt: new Date() } })
      .returning();
    return row!;
  }

  async hasPeriods(organisationId: string): Promise<boolean> {
    const rows = await this.database.db.select({ id: payPeriods.id }).from(payPeriods).where(eq(payPeriods.organisationId, organisationId)).limit(1);
    return rows.length > 0;
  }

  async findPeriod(organisationId: string, id: string): Promise<PayPeriodRow | null> {
    const [row] = await this.database.db
      .select()
      .from(payPeriods)
      .where(and(eq(payPeriods.organisationId, organisationId), eq(payPeriods.id, id)));
    return row ?? null;
  }

  async periodStarting(organisationId: string, startDate: string): Promise<PayPeriodRow | null> {
    const [row] = await this.database.db
      .select()
      .from(payPeriods)
      .where(and(eq(payPeriods.organisationId, organisationId), eq(payPeriods.startDate, startDate)));
    return row ?? null;
  }

  async latestPeriods(organisationId: string, limit: number): Promise<PayPeriodRow[]> {
    return this.database.db.select().from(payPeriods).where(eq(payPeriods.organisationId, organisationId)).orderBy(desc(payPeriods.startDate)).limit(limit);
  }

  async insertPeriod(values: typeof payPeriods.$inferInsert): Promise<PayPeriodRow> {
    const [row] = await this.database.db.insert(payPeriods).values(values).returning();
    return row!;
  }

  async runsOf(periodIds: string[]): Promise<Map<string, { id: string; status: PayrollRunStatus }>> {
    if (periodIds.length === 0) return new Map();
    const rows = await this.database.db
      .select({ id: payrollRuns.id, status: payrollRuns.status, periodId: payrollRuns.periodId })
      .from(payrollRuns)
      .where(inArray(payrollRuns.periodId, periodIds));
    return new Map(rows.map((r) => [r.periodId, { id: r.id, status: r.status }]));
  }

  /** Whether `date` falls in a period whose run is approved or exported: its inputs are frozen. */
  async frozenOn(organisationId: string, date: string): Promise<boolean> {
    const rows = await this.database.db
      .select({ id: payrollRuns.id })
      .from(payrollRuns)
      .innerJoin(payPeriods, eq(payPeriods.id, payrollRuns.periodId))
      .where(
        and(
          eq(payPeriods.organisationId, organisationId),
          lte(payPeriods.startDate, date),
          gte(payPeriods.endDate, date),
          inArray(payrollRuns.status, ['approved', 'exported']),
        ),
      )
      .limit(1);
    return rows.length > 0;
  }
}
