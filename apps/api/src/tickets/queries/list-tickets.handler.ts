import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { ticketTotals } from '@tressury/domain';
import { bowls, branches, clients, dayCloses, payments, retailLines, staff, ticketServiceLines, tickets, tips } from '@tressury/schema';
import { and, asc, eq, inArray, type SQL, sql } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import type { TicketSummaryView } from '../dto/ticket-summary.view.js';
import { ListTicketsQuery } from './list-tickets.query.js';

/** `staffIds` in the Ticket rules: the staff member has a service line on the ticket. */
export const ticketHasStaff = (operator: string, value: unknown): SQL => {
  if (operator !== 'eq') throw new Error(`Ticket.staffIds supports only equality, not ${operator}`);
  return sql`exists (select 1 from ${ticketServiceLines} where ${ticketServiceLines.ticketId} = ${tickets.id} and (${ticketServiceLines.staffId} = ${value} or ${ticketServiceLines.assistantStaffId} = ${value}))`;
};

@QueryHandler(ListTicketsQuery)
export class ListTicketsHandler implements IQueryHandler<ListTicketsQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, branchId, date }: ListTicketsQuery): Promise<TicketSummaryView[]> {
    const db = this.database.db;
    const [branch] = await db.select().from(branches).where(and(eq(branches.id, branchId), eq(branches.organisationId, user.organisationId)));
    if (!branch) return [];
    const businessDate = date ?? businessDateIn(branch.timeZone);
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Ticket', {
      id: tickets.id,
      organisationId: tickets.organisationId,
      branchId: tickets.branchId,
      staffIds: ticketHasStaff,
    });
    const rows = await db
      .select({ ticket: tickets, clientFirst: clients.firstName, clientLast: clients.lastName })
      .from(tickets)
      .leftJoin(clients, eq(clients.id, tickets.clientId))
      .where(and(eq(tickets.branchId, branchId), eq(tickets.businessDate, businessDate), readable))
      .orderBy(asc(tickets.number));
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.ticket.id);
    const [lines, retail, tipRows, paymentRows, bowlLines, closed] = await Promise.all([
      db
        .select({ ticketId: ticketServiceLines.ticketId, id: ticketServiceLines.id, price: ticketServiceLines.price, isColour: ticketServiceLines.isColour, noProductReason: ticketServiceLines.noProductReason, refundOf: ticketServiceLines.refundOfLineId, name: staff.displayName })
        .from(ticketServiceLines)
        .innerJoin(staff, eq(staff.id, ticketServiceLines.staffId))
        .where(inArray(ticketServiceLines.ticketId, ids)),
      db.select({ ticketId: retailLines.ticketId, amount: retailLines.amount, tax: retailLines.tax }).from(retailLines).where(inArray(retailLines.ticketId, ids)),
      db.select({ ticketId: tips.ticketId, amount: tips.amount }).from(tips).where(inArray(tips.ticketId, ids)),
      db.select({ ticketId: payments.ticketId, amount: payments.amount, status: payments.status }).from(payments).where(inArray(payments.ticketId, ids)),
      db
        .selectDistinct({ lineId: bowls.serviceLineId })
        .from(bowls)
        .innerJoin(ticketServiceLines, eq(ticketServiceLines.id, bowls.serviceLineId))
        .where(inArray(ticketServiceLines.ticketId, ids)),
      db.select({ id: dayCloses.id }).from(dayCloses).where(and(eq(dayCloses.branchId, branchId), eq(dayCloses.businessDate, businessDate))),
    ]);
    const withBowl = new Set(bowlLines.map((b) => b.lineId));
    return rows.map(({ ticket, clientFirst, clientLast }) => {
      const own = <T extends { ticketId: string }>(items: T[]) => items.filter((item) => item.ticketId === ticket.id);
      const ticketLines = own(lines);
      const totals = ticketTotals({ serviceLines: ticketLines, retailLines: own(retail), tips: own(tipRows), payments: own(paymentRows) });
      return {
        id: ticket.id,
        number: ticket.number,
        businessDate: ticket.businessDate,
        status: ticket.status,
        clientName: clientFirst ? `${clientFirst} ${clientLast}` : null,
        staffNames: [...new Set(ticketLines.map((l) => l.name))],
        services: totals.services,
        total: totals.total,
        paid: totals.paid,
        due: totals.due,
        colourLinesWithoutBowl: ticketLines.filter((l) => l.isColour && l.refundOf === null && !l.noProductReason && !withBowl.has(l.id)).length,
        openedAt: ticket.openedAt.toISOString(),
        locked: closed.length > 0,
      };
    });
  }
}
