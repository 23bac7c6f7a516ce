import { Injectable } from '@nestjs/common';
import { levels, type LevelRow } from '@tressury/schema';
import { and, asc, eq, ne } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type NewLevel = typeof levels.$inferInsert;

@Injectable()
export class LevelsRepository {
  constructor(private readonly database: Database) {}

  async findInOrganisation(organisationId: string, id: string): Promise<LevelRow | null> {
    const [row] = await this.database.db
      .select()
      .from(levels)
      .where(and(eq(levels.organisationId, organisationId), eq(levels.id, id)))
      .for('update');
    return row ?? null;
  }

  /** Every level of the organisation, most junior first. */
  listInOrganisation(organisationId: string): Promise<LevelRow[]> {
    return this.database.db.select().from(levels).where(eq(levels.organisationId, organisationId)).orderBy(asc(levels.rank), asc(levels.name));
  }

  async nameTaken(organisationId: string, name: string, exceptId?: string): Promise<boolean> {
    const conditions = [eq(levels.organisationId, organisationId), eq(levels.name, name)];
    if (exceptId) conditions.push(ne(levels.id, exceptId));
    const rows = await this.database.db.select({ id: levels.id }).from(levels).where(and(...conditions)).limit(1);
    return rows.length > 0;
  }

  async insert(level: NewLevel): Promise<LevelRow> {
    const [row] = await this.database.db.insert(levels).values(level).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewLevel>): Promise<LevelRow> {
    const [row] = await this.database.db.update(levels).set(changes).where(eq(levels.id, id)).returning();
    return row!;
  }
}
