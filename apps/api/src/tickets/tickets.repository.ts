import { Injectable } from '@nestjs/common';
import {
  bowlComponents,
  bowls,
  branches,
  clients,
  dayCloses,
  payments,
  retailLines,
  staff,
  ticketServiceLines,
  tickets,
  tips,
  type BowlComponentRow,
  type BowlRow,
  type BranchRow,
  type ClientRow,
  type PaymentRow,
  type RetailLineRow,
  type TicketRow,
  type TicketServiceLineRow,
  type TipRow,
} from '@tressury/schema';
import { and, asc, eq, inArray, max } from 'drizzle-orm';
import { Database } from '../database/database.js';
import { inTurn } from '../database/in-turn.js';

export type LoadedBowl = BowlRow & { components: BowlComponentRow[] };
export type LoadedServiceLine = TicketServiceLineRow & { bowls: LoadedBowl[] };

/** A ticket with everything on it, as commands and views need it. */
export type LoadedTicket = {
  ticket: TicketRow;
  branch: BranchRow;
  client: ClientRow | null;
  serviceLines: LoadedServiceLine[];
  retailLines: RetailLineRow[];
  tips: TipRow[];
  payments: PaymentRow[];
  /** Every staff member with a service line (as stylist or assistant): the stylist's own-ticket rule. */
  staffIds: string[];
  staffNames: Map<string, string>;
  /** The ticket's business date has been closed: the ticket is locked. */
  dayClosed: boolean;
};

@Injectable()
export class TicketsRepository {
  constructor(private readonly database: Database) {}

  /** Locks the ticket row for the rest of the transaction (FOR UPDATE) so edits to one ticket queue up. */
  async load(organisationId: string, ticketId: string, options: { forUpdate?: boolean } = {}): Promise<LoadedTicket | null> {
    const db = this.database.db;
    const query = db
      .select()
      .from(tickets)
      .where(and(eq(tickets.id, ticketId), eq(tickets.organisationId, organisationId)));
    const [ticket] = options.forUpdate ? await query.for('update') : await query;
    if (!ticket) return null;
    const [[branch], clientRows, lines, retail, tipRows, paymentRows, closes] = await inTurn([
      db.select().from(branches).where(eq(branches.id, ticket.branchId)),
      ticket.clientId ? db.select().from(clients).where(eq(clients.id, ticket.clientId)) : Promise.resolve([]),
      db.select().from(ticketServiceLines).where(eq(ticketServiceLines.ticketId, ticketId)).orderBy(asc(ticketServiceLines.createdAt), asc(ticketServiceLines.id)),
      db.select().from(retailLines).where(eq(retailLines.ticketId, ticketId)).orderBy(asc(retailLines.createdAt), asc(retailLines.id)),
      db.select().from(tips).where(eq(tips.ticketId, ticketId)).orderBy(asc(tips.createdAt), asc(tips.id)),
      db.select().from(payments).where(eq(payments.ticketId, ticketId)).orderBy(asc(payments.createdAt), asc(payments.id)),
      db
        .select({ id: dayCloses.id })
        .from(dayCloses)
        .where(and(eq(dayCloses.branchId, ticket.branchId), eq(dayCloses.businessDate, ticket.businessDate))),
    ]);
    const lineIds = lines.map((l) => l.id);
    const bowlRows = lineIds.length ? await db.select().from(bowls).where(inArray(bowls.serviceLineId, lineIds)).orderBy(asc(bowls.createdAt), asc(bowls.id)) : [];
    const componentRows = bowlRows.length
      ? await db.select().from(bowlComponents).where(inArray(bowlComponents.bowlId, bowlRows.map((b) => b.id))).orderBy(asc(bowlComponents.position))
      : [];
    const staffIds = [...new Set(lines.flatMap((l) => (l.assistantStaffId ? [l.staffId, l.assistantStaffId] : [l.staffId])))];
    const namedStaff = [...new Set([...staffIds, ...retail.map((r) => r.sellerStaffId), ...tipRows.map((t) => t.staffId), ...bowlRows.map((b) => b.mixedByStaffId)])];
    const names = namedStaff.length ? await db.select({ id: staff.id, name: staff.displayName }).from(staff).where(inArray(staff.id, namedStaff)) : [];
    return {
      ticket,
      branch: branch!,
      client: clientRows[0] ?? null,
      serviceLines: lines.map((line) => ({
        ...line,
        bowls: bowlRows.filter((b) => b.serviceLineId === line.id).map((b) => ({ ...b, components: componentRows.filter((c) => c.bowlId === b.id) })),
      })),
      retailLines: retail,
      tips: tipRows,
      payments: paymentRows,
      staffIds,
      staffNames: new Map(names.map((n) => [n.id, n.name])),
      dayClosed: closes.length > 0,
    };
  }

  async isDayClosed(branchId: string, businessDate: string): Promise<boolean> {
    const rows = await this.database.db
      .select({ id: dayCloses.id })
      .from(dayCloses)
      .where(and(eq(dayCloses.branchId, branchId), eq(dayCloses.businessDate, businessDate)));
    return rows.length > 0;
  }


  async nextNumber(branchId: string, businessDate: string): Promise<number> {
    const [row] = await this.database.db
      .select({ last: max(tickets.number) })
      .from(tickets)
      .where(and(eq(tickets.branchId, branchId), eq(tickets.businessDate, businessDate)));
    return (row?.last ?? 0) + 1;
  }

  async insertTicket(values: typeof tickets.$inferInsert): Promise<TicketRow> {
    const [row] = await this.database.db.insert(tickets).values(values).returning();
    return row!;
  }

  async updateTicket(id: string, changes: Partial<typeof tickets.$inferInsert>): Promise<void> {
    await this.database.db.update(tickets).set(changes).where(eq(tickets.id, id));
  }

  async insertServiceLine(values: typeof ticketServiceLines.$inferInsert): Promise<TicketServiceLineRow> {
    const [row] = await this.database.db.insert(ticketServiceLines).values(values).returning();
    return row!;
  }

  async updateServiceLine(id: string, changes: Partial<typeof ticketServiceLines.$inferInsert>): Promise<void> {
    await this.database.db.update(ticketServiceLines).set(changes).where(eq(ticketServiceLines.id, id));
  }

  async deleteServiceLine(id: string): Promise<void> {
    await this.database.db.delete(ticketServiceLines).where(eq(ticketServiceLines.id, id));
  }

  async insertBowl(values: typeof bowls.$inferInsert, components: Omit<typeof bowlComponents.$inferInsert, 'bowlId'>[]): Promise<BowlRow> {
    const [row] = await this.database.db.insert(bowls).values(values).returning();
    await this.database.db.insert(bowlComponents).values(components.map((c) => ({ ...c, bowlId: row!.id })));
    return row!;
  }

  async deleteBowl(id: string): Promise<void> {
    await this.database.db.delete(bowls).where(eq(bowls.id, id));
  }

  async insertRetailLine(values: typeof retailLines.$inferInsert): Promise<RetailLineRow> {
    const [row] = await this.database.db.insert(retailLines).values(values).returning();
    return row!;
  }

  async deleteRetailLine(id: string): Promise<void> {
    await this.database.db.delete(retailLines).where(eq(retailLines.id, id));
  }

  async insertTip(values: typeof tips.$inferInsert): Promise<TipRow> {
    const [row] = await this.database.db.insert(tips).values(values).returning();
    return row!;
  }

  async deleteTip(id: string): Promise<void> {
    await this.database.db.delete(tips).where(eq(tips.id, id));
  }

  async findPaymentByKey(ticketId: string, idempotencyKey: string): Promise<PaymentRow | null> {
    const [row] = await this.database.db
      .select()
      .from(payments)
      .where(and(eq(payments.ticketId, ticketId), eq(payments.idempotencyKey, idempotencyKey)));
    return row ?? null;
  }

  async findPayment(id: string): Promise<PaymentRow | null> {
    const [row] = await this.database.db.select().from(payments).where(eq(payments.id, id)).for('update');
    return row ?? null;
  }

  async insertPayment(values: typeof payments.$inferInsert): Promise<PaymentRow> {
    const [row] = await this.database.db.insert(payments).values(values).returning();
    return row!;
  }

  async updatePayment(id: string, changes: Partial<typeof payments.$inferInsert>): Promise<PaymentRow> {
    const [row] = await this.database.db.update(payments).set(changes).where(eq(payments.id, id)).returning();
    return row!;
  }
}
