import { Injectable } from '@nestjs/common';
import { branches, staff, timesheetEntries, type BranchRow, type StaffRow, type TimesheetEntryRow } from '@tressury/schema';
import { and, asc, eq, gte, lte, type SQL, sql } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type TimesheetEntryWithName = TimesheetEntryRow & { staffName: string };

@Injectable()
export class TimesheetsRepository {
  constructor(private readonly database: Database) {}

  async staffOf(organisationId: string): Promise<StaffRow[]> {
    return this.database.db.select().from(staff).where(eq(staff.organisationId, organisationId));
  }

  async branchesOf(organisationId: string): Promise<BranchRow[]> {
    return this.database.db.select().from(branches).where(eq(branches.organisationId, organisationId));
  }

  /** Sets one staff-day at one branch; the later write wins. */
  async upsert(values: typeof timesheetEntries.$inferInsert): Promise<TimesheetEntryRow> {
    const [row] = await this.database.db
      .insert(timesheetEntries)
      .values(values)
      .onConflictDoUpdate({
        target: [timesheetEntries.staffId, timesheetEntries.branchId, timesheetEntries.workDate],
        set: { hours: sql`excluded.hours`, updatedById: sql`excluded.updated_by_id`, updatedAt: new Date() },
      })
      .returning();
    return row!;
  }

  async find(staffId: string, branchId: string, workDate: string): Promise<TimesheetEntryRow | null> {
    const [row] = await this.database.db
      .select()
      .from(timesheetEntries)
      .where(and(eq(timesheetEntries.staffId, staffId), eq(timesheetEntries.branchId, branchId), eq(timesheetEntries.workDate, workDate)));
    return row ?? null;
  }

  async listInRange(organisationId: string, startDate: string, endDate: string, readable: SQL): Promise<TimesheetEntryWithName[]> {
    const rows = await this.database.db
      .select({ entry: timesheetEntries, staffName: staff.displayName })
      .from(timesheetEntries)
      .innerJoin(staff, eq(staff.id, timesheetEntries.staffId))
      .where(
        and(eq(timesheetEntries.organisationId, organisationId), gte(timesheetEntries.workDate, startDate), lte(timesheetEntries.workDate, endDate), readable),
      )
      .orderBy(asc(timesheetEntries.workDate), asc(staff.displayName));
    return rows.map((r) => ({ ...r.entry, staffName: r.staffName }));
  }
}
