import { Injectable } from '@nestjs/common';
import { branches, type BranchRow } from '@tressury/schema';
import { and, eq, ne } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type NewBranch = typeof branches.$inferInsert;

@Injectable()
export class BranchesRepository {
  constructor(private readonly database: Database) {}

  async findInOrganisation(organisationId: string, id: string): Promise<BranchRow | null> {
    const [row] = await this.database.db
      .select()
      .from(branches)
      .where(and(eq(branches.organisationId, organisationId), eq(branches.id, id)))
      .for('update');
    return row ?? null;
  }

  async nameTaken(organisationId: string, name: string, exceptId?: string): Promise<boolean> {
    const conditions = [eq(branches.organisationId, organisationId), eq(branches.name, name)];
    if (exceptId) conditions.push(ne(branches.id, exceptId));
    const rows = await this.database.db.select({ id: branches.id }).from(branches).where(and(...conditions)).limit(1);
    return rows.length > 0;
  }

  async insert(branch: NewBranch): Promise<BranchRow> {
    const [row] = await this.database.db.insert(branches).values(branch).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewBranch>): Promise<BranchRow> {
    const [row] = await this.database.db
      .update(branches)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(branches.id, id))
      .returning();
    return row!;
  }
}
