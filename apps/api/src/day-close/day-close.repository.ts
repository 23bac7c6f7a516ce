import { Injectable } from '@nestjs/common';
import { adjustments, branches, dayCloses, staff, tickets, type AdjustmentRow, type BranchRow, type DayCloseRow } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class DayCloseRepository {
  constructor(private readonly database: Database) {}

  async branch(organisationId: string, id: string): Promise<BranchRow | null> {
    const [row] = await this.database.db.select().from(branches).where(and(eq(branches.id, id), eq(branches.organisationId, organisationId)));
    return row ?? null;
  }

  async find(branchId: string, businessDate: string): Promise<DayCloseRow | null> {
    const [row] = await this.database.db
      .select()
      .from(dayCloses)
      .where(and(eq(dayCloses.branchId, branchId), eq(dayCloses.businessDate, businessDate)));
    return row ?? null;
  }


  async insert(values: typeof dayCloses.$inferInsert): Promise<DayCloseRow> {
    const [row] = await this.database.db.insert(dayCloses).values(values).returning();
    return row!;
  }

  async ticket(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(tickets).where(and(eq(tickets.id, id), eq(tickets.organisationId, organisationId)));
    return row ?? null;
  }

  async staffExists(organisationId: string, id: string): Promise<boolean> {
    const rows = await this.database.db.select({ id: staff.id }).from(staff).where(and(eq(staff.id, id), eq(staff.organisationId, organisationId)));
    return rows.length > 0;
  }

  async insertAdjustment(values: typeof adjustments.$inferInsert): Promise<AdjustmentRow> {
    const [row] = await this.database.db.insert(adjustments).values(values).returning();
    return row!;
  }
}
