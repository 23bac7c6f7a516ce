import { Injectable } from '@nestjs/common';
import { branches, levels, staff, type StaffRow, userBranches, users } from '@tressury/schema';
import { and, asc, eq, ne, type SQL, sql } from 'drizzle-orm';
import { Database } from '../database/database.js';
import type { StaffViewRow } from './dto/staff.view.js';

export type NewStaff = typeof staff.$inferInsert;
export type LinkableUser = { id: string; organisationId: string; role: string; staffId: string | null; branchIds: string[] };

@Injectable()
export class StaffRepository {
  constructor(private readonly database: Database) {}

  async findInOrganisation(organisationId: string, id: string): Promise<StaffRow | null> {
    const [row] = await this.database.db
      .select()
      .from(staff)
      .where(and(eq(staff.organisationId, organisationId), eq(staff.id, id)))
      .for('update');
    return row ?? null;
  }

  /** Staff rows with their level and branch names and linked sign-in, by name. */
  viewRows(where: SQL | undefined): Promise<StaffViewRow[]> {
    return this.database.db
      .select({
        id: staff.id,
        organisationId: staff.organisationId,
        homeBranchId: staff.homeBranchId,
        displayName: staff.displayName,
        email: staff.email,
        levelId: staff.levelId,
        hourlyRate: staff.hourlyRate,
        active: staff.active,
        createdAt: staff.createdAt,
        updatedAt: staff.updatedAt,
        levelName: levels.name,
        homeBranchName: branches.name,
        userId: sql<string | null>`(select ${users.id} from ${users} where ${users.staffId} = ${staff.id} order by ${users.id} limit 1)`,
      })
      .from(staff)
      .innerJoin(levels, eq(levels.id, staff.levelId))
      .innerJoin(branches, eq(branches.id, staff.homeBranchId))
      .where(where)
      .orderBy(asc(staff.displayName), asc(staff.id));
  }

  async viewRow(id: string): Promise<StaffViewRow> {
    const [row] = await this.viewRows(eq(staff.id, id));
    return row!;
  }

  async branchInOrganisation(organisationId: string, branchId: string): Promise<boolean> {
    const rows = await this.database.db
      .select({ id: branches.id })
      .from(branches)
      .where(and(eq(branches.organisationId, organisationId), eq(branches.id, branchId)));
    return rows.length > 0;
  }

  async levelInOrganisation(organisationId: string, levelId: string): Promise<boolean> {
    const rows = await this.database.db
      .select({ id: levels.id })
      .from(levels)
      .where(and(eq(levels.organisationId, organisationId), eq(levels.id, levelId)));
    return rows.length > 0;
  }

  async findUser(organisationId: string, userId: string): Promise<LinkableUser | null> {
    const [row] = await this.database.db
      .select({ id: users.id, organisationId: users.organisationId, role: users.role, staffId: users.staffId })
      .from(users)
      .where(and(eq(users.organisationId, organisationId), eq(users.id, userId)))
      .for('update');
    if (!row) return null;
    const assigned = await this.database.db.select({ branchId: userBranches.branchId }).from(userBranches).where(eq(userBranches.userId, userId));
    return { ...row, branchIds: assigned.map((a) => a.branchId) };
  }

  /** Points `userId` (or nobody, with null) at this staff member; any other sign-in linked to it is unlinked. */
  async linkUser(staffId: string, userId: string | null): Promise<void> {
    const others = userId === null ? eq(users.staffId, staffId) : and(eq(users.staffId, staffId), ne(users.id, userId));
    await this.database.db.update(users).set({ staffId: null }).where(others);
    if (userId !== null) await this.database.db.update(users).set({ staffId }).where(eq(users.id, userId));
  }

  async insert(member: NewStaff): Promise<StaffRow> {
    const [row] = await this.database.db.insert(staff).values(member).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewStaff>): Promise<StaffRow> {
    const [row] = await this.database.db
      .update(staff)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(staff.id, id))
      .returning();
    return row!;
  }
}
