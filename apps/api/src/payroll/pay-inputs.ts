import { Injectable } from '@nestjs/common';
import type { PayInput } from '@tressury/domain';
import {
  adjustments,
  bowls,
  branches,
  dayCloses,
  payPlanAssignments,
  payPlanVersions,
  retailLines,
  staff,
  ticketServiceLines,
  tickets,
  timesheetEntries,
  tips,
  type BranchRow,
  type PayPeriodRow,
  type PayPlanVersionRow,
  type PayScheduleRow,
  type StaffRow,
} from '@tressury/schema';
import Big from 'big.js';
import { and, asc, eq, gte, inArray, isNotNull, lte, ne, sql } from 'drizzle-orm';
import type { PgColumn } from 'drizzle-orm/pg-core';
import { Database } from '../database/database.js';

/** One staff member's computation for a period, ready for computePay. */
export type StaffPayInput = {
  staff: StaffRow;
  branch: BranchRow;
  planVersion: PayPlanVersionRow | null;
  input: PayInput;
};

type Activity = Pick<PayInput, 'serviceLines' | 'retailLines' | 'tips' | 'hours'>;

const plain = (value: string): string => new Big(value).toFixed();

/**
 * Reads what a pay period's payroll rests on, for every staff member of the organisation with hours or
 * lines in it: closed days only (the ticket closed and its branch's day closed), refunds as the negative
 * lines they are, adjustments booked on closed days in the period, and the plan in effect on the period's
 * first day. Rows are read in bulk, a handful of queries per period whatever the number of staff.
 */
@Injectable()
export class PayInputsReader {
  constructor(private readonly database: Database) {}

  /** `staffId` narrows the result to one staff member (a stylist's own earnings). */
  async forPeriod(organisationId: string, period: PayPeriodRow, schedule: PayScheduleRow, options: { staffId?: string } = {}): Promise<StaffPayInput[]> {
    const activity = new Map<string, Activity>();
    const of = (staffId: string): Activity => {
      let found = activity.get(staffId);
      if (!found) activity.set(staffId, (found = { serviceLines: [], retailLines: [], tips: [], hours: [] }));
      return found;
    };
    const { startDate, endDate } = period;
    const db = this.database.db;
    const closedDay = (branchColumn: PgColumn, dateColumn: PgColumn) =>
      and(eq(dayCloses.branchId, branchColumn), eq(dayCloses.businessDate, dateColumn));

    const serviceRows = await db
      .select({
        id: ticketServiceLines.id,
        staffId: ticketServiceLines.staffId,
        assistantStaffId: ticketServiceLines.assistantStaffId,
        assistantShare: ticketServiceLines.assistantShare,
        price: ticketServiceLines.price,
        isColour: ticketServiceLines.isColour,
        date: ticketServiceLines.bookedOn,
        productCost: sql<string>`coalesce((select sum(${bowls.cost}) from ${bowls} where ${bowls.serviceLineId} = ${ticketServiceLines.id}), 0)`,
      })
      .from(ticketServiceLines)
      .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
      .innerJoin(dayCloses, closedDay(tickets.branchId, ticketServiceLines.bookedOn))
      .where(
        and(
          eq(tickets.organisationId, organisationId),
          eq(tickets.status, 'closed'),
          gte(ticketServiceLines.bookedOn, startDate),
          lte(ticketServiceLines.bookedOn, endDate),
        ),
      )
      .orderBy(asc(ticketServiceLines.bookedOn), asc(ticketServiceLines.id));
    for (const line of serviceRows) {
      const base = { date: line.date, price: line.price, isColour: line.isColour, productCost: new Big(line.productCost).toFixed(2) };
      // An assistant's share of a line is theirs; the stylist keeps the rest of the same line.
      if (line.assistantStaffId && line.assistantShare !== null && new Big(line.assistantShare).gt(0)) {
        const share = new Big(line.assistantShare);
        of(line.staffId).serviceLines.push({ id: line.id, ...base, share: new Big(1).minus(share).toFixed() });
        of(line.assistantStaffId).serviceLines.push({ id: `${line.id}:assistant`, ...base, share: share.toFixed() });
      } else {
        of(line.staffId).serviceLines.push({ id: line.id, ...base });
      }
    }

    const retailRows = await db
      .select({ id: retailLines.id, staffId: retailLines.sellerStaffId, date: retailLines.bookedOn, amount: retailLines.amount })
      .from(retailLines)
      .innerJoin(tickets, eq(tickets.id, retailLines.ticketId))
      .innerJoin(dayCloses, closedDay(tickets.branchId, retailLines.bookedOn))
      .where(and(eq(tickets.organisationId, organisationId), eq(tickets.status, 'closed'), gte(retailLines.bookedOn, startDate), lte(retailLines.bookedOn, endDate)))
      .orderBy(asc(retailLines.bookedOn), asc(retailLines.id));
    for (const line of retailRows) of(line.staffId).retailLines.push({ id: line.id, date: line.date, amount: line.amount });

    const tipRows = await db
      .select({ staffId: tips.staffId, date: tips.bookedOn, amount: tips.amount })
      .from(tips)
      .innerJoin(tickets, eq(tickets.id, tips.ticketId))
      .innerJoin(dayCloses, closedDay(tickets.branchId, tips.bookedOn))
      .where(and(eq(tickets.organisationId, organisationId), eq(tickets.status, 'closed'), gte(tips.bookedOn, startDate), lte(tips.bookedOn, endDate)))
      .orderBy(asc(tips.bookedOn), asc(tips.id));
    for (const tip of tipRows) of(tip.staffId).tips.push({ date: tip.date, amount: tip.amount });

    const adjustmentRows = await db
      .select({ id: adjustments.id, staffId: adjustments.staffId, category: adjustments.category, date: adjustments.bookedOn, amount: adjustments.amount })
      .from(adjustments)
      .innerJoin(dayCloses, closedDay(adjustments.branchId, adjustments.bookedOn))
      .where(
        and(
          eq(adjustments.organisationId, organisationId),
          isNotNull(adjustments.staffId),
          ne(adjustments.category, 'cash'),
          gte(adjustments.bookedOn, startDate),
          lte(adjustments.bookedOn, endDate),
        ),
      )
      .orderBy(asc(adjustments.bookedOn), asc(adjustments.id));
    const chargeCorrections: { staffId: string; amount: string }[] = [];
    for (const adjustment of adjustmentRows) {
      const mine = of(adjustment.staffId!);
      const id = `adjustment:${adjustment.id}`;
      if (adjustment.category === 'service') mine.serviceLines.push({ id, date: adjustment.date, price: adjustment.amount, isColour: false, productCost: '0.00' });
      else if (adjustment.category === 'retail') mine.retailLines.push({ id, date: adjustment.date, amount: adjustment.amount });
      else if (adjustment.category === 'tip') mine.tips.push({ date: adjustment.date, amount: adjustment.amount });
      else if (adjustment.category === 'product_charge') chargeCorrections.push({ staffId: adjustment.staffId!, amount: adjustment.amount });
    }
    // A product-charge correction has no price of its own and computePay caps a line's charge at its price,
    // so it is added to the product cost of the staff member's highest-priced line in the period.
    for (const correction of chargeCorrections) {
      const lines = of(correction.staffId).serviceLines.filter((l) => new Big(l.price).gt(0));
      const target = lines.reduce<(typeof lines)[number] | undefined>((best, l) => (!best || new Big(l.price).gt(best.price) ? l : best), undefined);
      if (!target) continue;
      const cost = new Big(target.productCost).plus(correction.amount);
      target.productCost = (cost.lt(0) ? new Big(0) : cost).toFixed(2);
    }

    const hourRows = await db
      .select({ staffId: timesheetEntries.staffId, date: timesheetEntries.workDate, hours: timesheetEntries.hours })
      .from(timesheetEntries)
      .where(and(eq(timesheetEntries.organisationId, organisationId), gte(timesheetEntries.workDate, startDate), lte(timesheetEntries.workDate, endDate)))
      .orderBy(asc(timesheetEntries.workDate), asc(timesheetEntries.staffId), asc(timesheetEntries.branchId));
    for (const entry of hourRows) if (new Big(entry.hours).gt(0)) of(entry.staffId).hours.push({ date: entry.date, hours: plain(entry.hours) });

    if (options.staffId) for (const id of [...activity.keys()]) if (id !== options.staffId) activity.delete(id);
    if (activity.size === 0) return [];
    const staffIds = [...activity.keys()];
    const staffRows = await db.select().from(staff).where(inArray(staff.id, staffIds));
    const branchRows = await db.select().from(branches).where(eq(branches.organisationId, organisationId));
    const versions = await this.planVersionsOn(organisationId, startDate);

    return staffRows
      .sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id))
      .map((member) => {
        const branch = branchRows.find((b) => b.id === member.homeBranchId)!;
        const version = versions.get(member.id) ?? null;
        const hourlyRate = member.hourlyRate ?? version?.hourlyRate ?? null;
        const input: PayInput = {
          plan: version
            ? {
                tierMode: version.tierMode,
                tiers: version.tiers,
                productCharge: {
                  mode: version.productChargeMode,
                  ...(version.productChargeValue !== null ? { value: plain(version.productChargeValue) } : {}),
                  ...(version.productChargeMarkup !== null ? { markup: plain(version.productChargeMarkup) } : {}),
                },
                retailRate: plain(version.retailRate),
                ...(hourlyRate !== null ? { hourlyRate } : {}),
              }
            : { tierMode: 'marginal', tiers: [{ from: '0', rate: '0' }], productCharge: { mode: 'none' }, retailRate: '0' },
          ...activity.get(member.id)!,
          wageRules: {
            minimumWage: branch.minimumWage,
            overtimeAfterHours: plain(branch.overtimeAfterHours),
            overtimeMultiplier: plain(branch.overtimeMultiplier),
            workweekStartsOn: schedule.workweekStartsOn as PayInput['wageRules']['workweekStartsOn'],
            commissionExemption: branch.commissionExemption,
          },
        };
        return { staff: member, branch, planVersion: version, input };
      });
  }

  /** Per staff member, the version of their plan in effect on `date` (the latest assignment and version on or before it). */
  private async planVersionsOn(organisationId: string, date: string): Promise<Map<string, PayPlanVersionRow>> {
    const assignments = await this.database.db
      .select()
      .from(payPlanAssignments)
      .where(and(eq(payPlanAssignments.organisationId, organisationId), lte(payPlanAssignments.effectiveFrom, date)))
      .orderBy(asc(payPlanAssignments.effectiveFrom));
    const planOf = new Map<string, string>();
    for (const a of assignments) planOf.set(a.staffId, a.planId);
    const planIds = [...new Set(planOf.values())];
    if (planIds.length === 0) return new Map();
    const versionRows = await this.database.db
      .select()
      .from(payPlanVersions)
      .where(and(inArray(payPlanVersions.planId, planIds), lte(payPlanVersions.effectiveFrom, date)))
      .orderBy(asc(payPlanVersions.effectiveFrom));
    const versionOf = new Map<string, PayPlanVersionRow>();
    for (const v of versionRows) versionOf.set(v.planId, v);
    const result = new Map<string, PayPlanVersionRow>();
    for (const [staffId, planId] of planOf) {
      const version = versionOf.get(planId);
      if (version) result.set(staffId, version);
    }
    return result;
  }
}
