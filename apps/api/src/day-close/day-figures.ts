import { Injectable } from '@nestjs/common';
import { sumMoney, ticketTotals } from '@tressury/domain';
import {
  adjustments,
  bowls,
  clients,
  payments,
  retailLines,
  services,
  staff,
  ticketServiceLines,
  tickets,
  tips,
} from '@tressury/schema';
import { and, asc, eq, inArray, ne, sql } from 'drizzle-orm';
import { Database } from '../database/database.js';
import { inTurn } from '../database/in-turn.js';

export type DayFigures = {
  ticketsByStatus: { open: number; closed: number; void: number };
  openTickets: { id: string; number: number; clientName: string | null; due: string }[];
  colourLinesWithoutBowl: { ticketId: string; number: number; serviceName: string; staffName: string }[];
  revenueByCategory: { category: string; amount: string }[];
  serviceRevenue: string;
  retailRevenue: string;
  retailTax: string;
  tipsByStaff: { staffId: string; staffName: string; amount: string }[];
  colourProductCost: string;
  cashFromTickets: string;
  cashAdjustments: string;
  expectedCash: string;
  cardTotalTickets: string;
  pendingCardPayments: number;
  adjustments: { id: string; category: string; amount: string; reason: string; ticketId: string | null; staffId: string | null }[];
};

/**
 * What one branch's business date adds up to. Lines and payments count on the day they are booked
 * (a refund on its own date); void tickets count for nothing. Sums are taken in SQL over cent
 * amounts and added up again with libs/domain so every total is the sum of the parts shown.
 */
@Injectable()
export class DayFiguresQuery {
  constructor(private readonly database: Database) {}

  async forDay(branchId: string, businessDate: string): Promise<DayFigures> {
    const db = this.database.db;
    const live = and(eq(tickets.branchId, branchId), ne(tickets.status, 'void'));
    const [statusRows, lineRows, retailRows, tipRows, paymentRows, bowlRows, adjustmentRows, openRows] = await inTurn([
      db
        .select({ status: tickets.status, n: sql<number>`count(*)::int` })
        .from(tickets)
        .where(and(eq(tickets.branchId, branchId), eq(tickets.businessDate, businessDate)))
        .groupBy(tickets.status),
      db
        .select({
          ticketId: ticketServiceLines.ticketId,
          lineId: ticketServiceLines.id,
          number: tickets.number,
          status: tickets.status,
          category: services.category,
          serviceName: ticketServiceLines.serviceName,
          staffName: staff.displayName,
          price: ticketServiceLines.price,
          isColour: ticketServiceLines.isColour,
          refundOf: ticketServiceLines.refundOfLineId,
          noProductReason: ticketServiceLines.noProductReason,
          bowls: sql<number>`(select count(*)::int from ${bowls} where ${bowls.serviceLineId} = ${ticketServiceLines.id})`,
        })
        .from(ticketServiceLines)
        .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
        .innerJoin(services, eq(services.id, ticketServiceLines.serviceId))
        .innerJoin(staff, eq(staff.id, ticketServiceLines.staffId))
        .where(and(live, eq(ticketServiceLines.bookedOn, businessDate)))
        .orderBy(asc(tickets.number)),
      db
        .select({ amount: retailLines.amount, tax: retailLines.tax })
        .from(retailLines)
        .innerJoin(tickets, eq(tickets.id, retailLines.ticketId))
        .where(and(live, eq(retailLines.bookedOn, businessDate))),
      db
        .select({ staffId: tips.staffId, staffName: staff.displayName, amount: tips.amount })
        .from(tips)
        .innerJoin(tickets, eq(tickets.id, tips.ticketId))
        .innerJoin(staff, eq(staff.id, tips.staffId))
        .where(and(live, eq(tips.bookedOn, businessDate))),
      db
        .select({ method: payments.method, status: payments.status, amount: payments.amount })
        .from(payments)
        .innerJoin(tickets, eq(tickets.id, payments.ticketId))
        .where(and(eq(tickets.branchId, branchId), eq(payments.bookedOn, businessDate))),
      db
        .select({ cost: bowls.cost })
        .from(bowls)
        .innerJoin(ticketServiceLines, eq(ticketServiceLines.id, bowls.serviceLineId))
        .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
        .where(and(live, eq(ticketServiceLines.bookedOn, businessDate))),
      db
        .select()
        .from(adjustments)
        .where(and(eq(adjustments.branchId, branchId), eq(adjustments.bookedOn, businessDate)))
        .orderBy(asc(adjustments.createdAt)),
      db
        .select({ id: tickets.id, number: tickets.number, first: clients.firstName, last: clients.lastName })
        .from(tickets)
        .leftJoin(clients, eq(clients.id, tickets.clientId))
        .where(and(eq(tickets.branchId, branchId), eq(tickets.businessDate, businessDate), eq(tickets.status, 'open')))
        .orderBy(asc(tickets.number)),
    ]);

    const byStatus = { open: 0, closed: 0, void: 0 };
    for (const row of statusRows) byStatus[row.status] = row.n;
    const categories = new Map<string, string[]>();
    for (const line of lineRows) categories.set(line.category, [...(categories.get(line.category) ?? []), line.price]);
    const retailRevenue = sumMoney(retailRows.map((r) => r.amount));
    const tipsByStaff = new Map<string, { staffName: string; amounts: string[] }>();
    for (const tip of tipRows) {
      const entry = tipsByStaff.get(tip.staffId) ?? { staffName: tip.staffName, amounts: [] };
      entry.amounts.push(tip.amount);
      tipsByStaff.set(tip.staffId, entry);
    }
    const settled = (method: 'cash' | 'card') => sumMoney(paymentRows.filter((p) => p.method === method && p.status === 'succeeded').map((p) => p.amount));
    const cashFromTickets = settled('cash');
    const cashAdjustments = sumMoney(adjustmentRows.filter((a) => a.category === 'cash').map((a) => a.amount));
    const openTotals = await this.openTicketDues(openRows.map((r) => r.id));

    return {
      ticketsByStatus: byStatus,
      openTickets: openRows.map((r) => ({ id: r.id, number: r.number, clientName: r.first ? `${r.first} ${r.last}` : null, due: openTotals.get(r.id) ?? '0.00' })),
      colourLinesWithoutBowl: lineRows
        .filter((l) => l.status === 'open' && l.isColour && l.refundOf === null && l.bowls === 0 && !l.noProductReason)
        .map((l) => ({ ticketId: l.ticketId, number: l.number, serviceName: l.serviceName, staffName: l.staffName })),
      revenueByCategory: [...categories.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([category, amounts]) => ({ category, amount: sumMoney(amounts) })),
      serviceRevenue: sumMoney(lineRows.map((l) => l.price)),
      retailRevenue,
      retailTax: sumMoney(retailRows.map((r) => r.tax)),
      tipsByStaff: [...tipsByStaff.entries()].map(([staffId, entry]) => ({ staffId, staffName: entry.staffName, amount: sumMoney(entry.amounts) })),
      colourProductCost: sumMoney(bowlRows.map((b) => b.cost)),
      cashFromTickets,
      cashAdjustments,
      expectedCash: sumMoney([cashFromTickets, cashAdjustments]),
      cardTotalTickets: settled('card'),
      pendingCardPayments: paymentRows.filter((p) => p.method === 'card' && p.status === 'pending').length,
      adjustments: adjustmentRows.map((a) => ({ id: a.id, category: a.category, amount: a.amount, reason: a.reason, ticketId: a.ticketId, staffId: a.staffId })),
    };
  }

  /** What is still due on each open ticket, by libs/domain ticketTotals. */
  private async openTicketDues(ticketIds: string[]): Promise<Map<string, string>> {
    if (ticketIds.length === 0) return new Map();
    const db = this.database.db;
    const [lines, retail, tipRows, paymentRows] = await inTurn([
      db.select({ ticketId: ticketServiceLines.ticketId, price: ticketServiceLines.price }).from(ticketServiceLines).where(inArray(ticketServiceLines.ticketId, ticketIds)),
      db.select({ ticketId: retailLines.ticketId, amount: retailLines.amount, tax: retailLines.tax }).from(retailLines).where(inArray(retailLines.ticketId, ticketIds)),
      db.select({ ticketId: tips.ticketId, amount: tips.amount }).from(tips).where(inArray(tips.ticketId, ticketIds)),
      db.select({ ticketId: payments.ticketId, amount: payments.amount, status: payments.status }).from(payments).where(inArray(payments.ticketId, ticketIds)),
    ]);
    return new Map(
      ticketIds.map((id) => {
        const own = <T extends { ticketId: string }>(rows: T[]) => rows.filter((row) => row.ticketId === id);
        return [id, ticketTotals({ serviceLines: own(lines), retailLines: own(retail), tips: own(tipRows), payments: own(paymentRows) }).due];
      }),
    );
  }
}
