import { Injectable } from '@nestjs/common';
import { branches, organisations, staff } from '@tressury/schema';
import { and, eq, inArray } from 'drizzle-orm';
import { Database } from '../database/database.js';

/** What a statement needs besides its payroll line: the organisation's name, currencies, and where to send it. */
@Injectable()
export class PayStatementsRepository {
  constructor(private readonly database: Database) {}

  async organisationName(organisationId: string): Promise<string> {
    const [row] = await this.database.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, organisationId));
    return row!.name;
  }

  async branchCurrencies(organisationId: string): Promise<Map<string, string>> {
    const rows = await this.database.db.select({ id: branches.id, currency: branches.currency }).from(branches).where(eq(branches.organisationId, organisationId));
    return new Map(rows.map((b) => [b.id, b.currency]));
  }

  /** Each staff member's e-mail address as on file now (null when there is none). */
  async emails(organisationId: string, staffIds: string[]): Promise<Map<string, string | null>> {
    if (staffIds.length === 0) return new Map();
    const rows = await this.database.db
      .select({ id: staff.id, email: staff.email })
      .from(staff)
      .where(and(eq(staff.organisationId, organisationId), inArray(staff.id, staffIds)));
    return new Map(rows.map((s) => [s.id, s.email?.trim() || null]));
  }
}
