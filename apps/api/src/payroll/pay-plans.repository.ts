import { Injectable } from '@nestjs/common';
import {
  payPlanAssignments,
  payPlans,
  payPlanVersions,
  payPeriods,
  payrollRuns,
  paySchedules,
  staff,
  type PayPlanAssignmentRow,
  type PayPlanRow,
  type PayPlanVersionRow,
  type PayScheduleRow,
  type StaffRow,
} from '@tressury/schema';
import { and, asc, eq, inArray, max, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class PayPlansRepository {
  constructor(private readonly database: Database) {}

  async findPlan(organisationId: string, id: string, lock = false): Promise<PayPlanRow | null> {
    const query = this.database.db
      .select()
      .from(payPlans)
      .where(and(eq(payPlans.organisationId, organisationId), eq(payPlans.id, id)));
    const [row] = lock ? await query.for('update') : await query;
    return row ?? null;
  }

  async listPlans(where: SQL): Promise<PayPlanRow[]> {
    return this.database.db.select().from(payPlans).where(where).orderBy(asc(payPlans.name));
  }

  async nameTaken(organisationId: string, name: string): Promise<boolean> {
    const rows = await this.database.db
      .select({ id: payPlans.id })
      .from(payPlans)
      .where(and(eq(payPlans.organisationId, organisationId), eq(payPlans.name, name)));
    return rows.length > 0;
  }

  async insertPlan(plan: typeof payPlans.$inferInsert): Promise<PayPlanRow> {
    const [row] = await this.database.db.insert(payPlans).values(plan).returning();
    return row!;
  }

  async versionsOf(planIds: string[]): Promise<PayPlanVersionRow[]> {
    if (planIds.length === 0) return [];
    return this.database.db.select().from(payPlanVersions).where(inArray(payPlanVersions.planId, planIds)).orderBy(asc(payPlanVersions.effectiveFrom));
  }

  async insertVersion(version: typeof payPlanVersions.$inferInsert): Promise<PayPlanVersionRow> {
    const [row] = await this.database.db.insert(payPlanVersions).values(version).returning();
    return row!;
  }

  async assignmentsOf(planIds: string[]): Promise<PayPlanAssignmentRow[]> {
    if (planIds.length === 0) return [];
    return this.database.db
      .select()
      .from(payPlanAssignments)
      .where(inArray(payPlanAssignments.planId, planIds))
      .orderBy(asc(payPlanAssignments.effectiveFrom), asc(payPlanAssignments.staffId));
  }

  async assignmentOn(staffId: string, effectiveFrom: string): Promise<PayPlanAssignmentRow | null> {
    const [row] = await this.database.db
      .select()
      .from(payPlanAssignments)
      .where(and(eq(payPlanAssignments.staffId, staffId), eq(payPlanAssignments.effectiveFrom, effectiveFrom)));
    return row ?? null;
  }

  async insertAssignment(assignment: typeof payPlanAssignments.$inferInsert): Promise<PayPlanAssignmentRow> {
    const [row] = await this.database.db.insert(payPlanAssignments).values(assignment).returning();
    return row!;
  }

  async findStaff(organisationId: string, id: string): Promise<StaffRow | null> {
    const [row] = await this.database.db
      .select()
      .from(staff)
      .where(and(eq(staff.organisationId, organisationId), eq(staff.id, id)));
    return row ?? null;
  }

  async schedule(organisationId: string): Promise<PayScheduleRow | null> {
    const [row] = await this.database.db.select().from(paySchedules).where(eq(paySchedules.organisationId, organisationId));
    return row ?? null;
  }

  /** The last day of the latest pay period whose run is approved or exported: terms on or before it would misstate what was paid. */
  async frozenThrough(organisationId: string): Promise<string | null> {
    const [row] = await this.database.db
      .select({ end: max(payPeriods.endDate) })
      .from(payrollRuns)
      .innerJoin(payPeriods, eq(payPeriods.id, payrollRuns.periodId))
      .where(and(eq(payPeriods.organisationId, organisationId), inArray(payrollRuns.status, ['approved', 'exported'])));
    return row?.end ?? null;
  }
}
