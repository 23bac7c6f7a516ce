import { Injectable } from '@nestjs/common';
import { organisations, type OrganisationRow } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class OrganisationRepository {
  constructor(private readonly database: Database) {}

  async find(id: string): Promise<OrganisationRow | null> {
    const [row] = await this.database.db.select().from(organisations).where(eq(organisations.id, id)).for('update');
    return row ?? null;
  }

  async rename(id: string, name: string): Promise<OrganisationRow> {
    const [row] = await this.database.db.update(organisations).set({ name, updatedAt: new Date() }).where(eq(organisations.id, id)).returning();
    return row!;
  }
}
