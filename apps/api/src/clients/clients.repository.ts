import { Injectable } from '@nestjs/common';
import { branches, clients, type ClientRow, ticketServiceLines, tickets } from '@tressury/schema';
import { and, eq, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type NewClient = typeof clients.$inferInsert;

/** A client row with every field the Client rules name. */
export type ClientRecord = ClientRow & { servedByStaffIds: string[] };

/** What the clients feature needs of a branch: its name, calendar and patch-test window. */
export type ClientBranch = { id: string; name: string; timeZone: string; patchTestMaxAgeDays: number };

@Injectable()
export class ClientsRepository {
  constructor(private readonly database: Database) {}

  async find(organisationId: string, id: string, options: { forUpdate?: boolean } = {}): Promise<ClientRecord | null> {
    const query = this.database.db
      .select()
      .from(clients)
      .where(and(eq(clients.organisationId, organisationId), eq(clients.id, id)));
    const [row] = options.forUpdate ? await query.for('update') : await query;
    if (!row) return null;
    return { ...row, servedByStaffIds: await this.servedBy(row.id) };
  }

  /** The staff with a service line on one of the client's tickets. */
  async servedBy(clientId: string): Promise<string[]> {
    const rows = await this.database.db
      .selectDistinct({ staffId: ticketServiceLines.staffId })
      .from(ticketServiceLines)
      .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
      .where(eq(tickets.clientId, clientId));
    return rows.map((row) => row.staffId);
  }

  /** A branch of the organisation, optionally only among those `within` allows. */
  async findBranch(organisationId: string, id: string, within?: SQL): Promise<ClientBranch | null> {
    const [row] = await this.database.db
      .select({ id: branches.id, name: branches.name, timeZone: branches.timeZone, patchTestMaxAgeDays: branches.patchTestMaxAgeDays })
      .from(branches)
      .where(and(eq(branches.organisationId, organisationId), eq(branches.id, id), within));
    return row ?? null;
  }

  async insert(client: NewClient): Promise<ClientRow> {
    const [row] = await this.database.db.insert(clients).values(client).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewClient>): Promise<ClientRow> {
    const [row] = await this.database.db
      .update(clients)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(clients.id, id))
      .returning();
    return row!;
  }
}
