import { Injectable } from '@nestjs/common';
import type { PayInput } from '@tressury/domain';
import {
  branches,
  payPlanAssignments,
  payPlanVersions,
  staff,
  type BranchRow,
  type PayPeriodRow,
  type PayPlanVersionRow,
  type PayScheduleRow,
  type StaffRow,
} from '@tressury/schema';
import Big from 'big.js';
import { and, asc, eq, inArray, lte, sql, type SQL } from 'drizzle-orm';
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
 * The period's rows, one query per kind. Closed branch-days are matched in forPeriod rather than joined:
 * without planner statistics (PGlite keeps none) the planner scanned day_closes once per line.
 */
function periodQueries(organisationId: string, { startDate, endDate }: PayPeriodRow, staffId: string | undefined) {
  const inPeriod = (column: SQL) => sql`${column} between ${startDate}::date and ${endDate}::date`;
  const onlyStaff = (...columns: SQL[]) => (staffId ? sql`and (${sql.join(columns.map((c) => sql`${c} = ${staffId}::uuid`), sql` or `)})` : sql``);
  const closedTicket = sql`t.organisation_id = ${organisationId}::uuid and t.status = 'closed'`;
  return {
    closedDays: sql`
      select format('%s,%s', branch_id, business_date) as line from day_closes
      where organisation_id = ${organisationId}::uuid and ${inPeriod(sql`business_date`)}`,
    // A service line's product cost is the sum of its bowls' costs, to the cent.
    bowlCosts: sql`
      select format('%s,%s', b.service_line_id, sum(b.cost)::numeric(12, 2)) as line
      from bowls b join ticket_service_lines l on l.id = b.service_line_id join tickets t on t.id = l.ticket_id
      where ${closedTicket} and ${inPeriod(sql`l.booked_on`)} ${onlyStaff(sql`l.staff_id`, sql`l.assistant_staff_id`)}
      group by b.service_line_id`,
    serviceLines: sql`
      select format('%s,%s,%s,%s,%s,%s,%s,%s', l.booked_on, l.id, l.staff_id, l.assistant_staff_id, l.assistant_share, l.price, l.is_colour, t.branch_id) as line
      from ticket_service_lines l join tickets t on t.id = l.ticket_id
      where ${closedTicket} and ${inPeriod(sql`l.booked_on`)} ${onlyStaff(sql`l.staff_id`, sql`l.assistant_staff_id`)}`,
    retailLines: sql`
      select format('%s,%s,%s,%s,%s', r.booked_on, r.id, r.seller_staff_id, r.amount, t.branch_id) as line
      from retail_lines r join tickets t on t.id = r.ticket_id
      where ${closedTicket} and ${inPeriod(sql`r.booked_on`)} ${onlyStaff(sql`r.seller_staff_id`)}`,
    tips: sql`
      select format('%s,%s,%s,%s,%s', p.booked_on, p.id, p.staff_id, p.amount, t.branch_id) as line
      from tips p join tickets t on t.id = p.ticket_id
      where ${closedTicket} and ${inPeriod(sql`p.booked_on`)} ${onlyStaff(sql`p.staff_id`)}`,
    adjustments: sql`
      select format('%s,%s,%s,%s,%s,%s', a.booked_on, a.id, a.staff_id, a.category, a.amount, a.branch_id) as line
      from adjustments a
      where a.organisation_id = ${organisationId}::uuid and a.staff_id is not null and a.category <> 'cash'
        and ${inPeriod(sql`a.booked_on`)} ${onlyStaff(sql`a.staff_id`)}`,
    hours: sql`
      select format('%s,%s,%s,%s', h.work_date, h.staff_id, h.branch_id, h.hours) as line
      from timesheet_entries h
      where h.organisation_id = ${organisationId}::uuid and ${inPeriod(sql`h.work_date`)} and h.hours > 0 ${onlyStaff(sql`h.staff_id`)}`,
  };
}

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
    const queries = periodQueries(organisationId, period, options.staffId);
    const chargeCorrections: { staffId: string; amount: string }[] = [];

    await this.withHashJoins(!options.staffId, async () => {
      const closedDays = new Set(Array.from(await this.textRows(queries.closedDays), ([branchId, date]) => `${branchId} ${date}`));
      const closed = (branchId: string, date: string) => closedDays.has(`${branchId} ${date}`);

      const bowlCost = new Map(Array.from(await this.textRows(queries.bowlCosts), ([lineId, cost]) => [lineId!, cost!]));
      for (const [date, id, staffId, assistantStaffId, assistantShare, price, isColour, branchId] of await this.textRows(queries.serviceLines, true)) {
        if (!closed(branchId!, date!)) continue;
        const productCost = bowlCost.get(id!) ?? '0.00';
        // An assistant's share of a line is theirs; the stylist keeps the rest of the same line.
        if (assistantStaffId && assistantShare && new Big(assistantShare).gt(0)) {
          const share = new Big(assistantShare);
          of(staffId!).serviceLines.push({ id: id!, date: date!, price: price!, isColour: isColour === 't', productCost, share: new Big(1).minus(share).toFixed() });
          of(assistantStaffId).serviceLines.push({ id: `${id}:assistant`, date: date!, price: price!, isColour: isColour === 't', productCost, share: share.toFixed() });
        } else {
          of(staffId!).serviceLines.push({ id: id!, date: date!, price: price!, isColour: isColour === 't', productCost });
        }
      }
      for (const [date, id, staffId, amount, branchId] of await this.textRows(queries.retailLines, true)) {
        if (closed(branchId!, date!)) of(staffId!).retailLines.push({ id: id!, date: date!, amount: amount! });
      }
      for (const [date, , staffId, amount, branchId] of await this.textRows(queries.tips, true)) {
        if (closed(branchId!, date!)) of(staffId!).tips.push({ date: date!, amount: amount! });
      }
      for (const [date, adjustmentId, staffId, category, amount, branchId] of await this.textRows(queries.adjustments, true)) {
        if (!closed(branchId!, date!)) continue;
        const mine = of(staffId!);
        const id = `adjustment:${adjustmentId}`;
        if (category === 'service') mine.serviceLines.push({ id, date: date!, price: amount!, isColour: false, productCost: '0.00' });
        else if (category === 'retail') mine.retailLines.push({ id, date: date!, amount: amount! });
        else if (category === 'tip') mine.tips.push({ date: date!, amount: amount! });
        else if (category === 'product_charge') chargeCorrections.push({ staffId: staffId!, amount: amount! });
      }
      for (const [date, staffId, , hours] of await this.textRows(queries.hours, true)) of(staffId!).hours.push({ date: date!, hours: plain(hours!) });
    });

    // A product-charge correction has no price of its own and computePay caps a line's charge at its price,
    // so it is added to the product cost of the staff member's highest-priced line in the period.
    for (const correction of chargeCorrections) {
      const lines = of(correction.staffId).serviceLines.filter((l) => new Big(l.price).gt(0));
      const target = lines.reduce<(typeof lines)[number] | undefined>((best, l) => (!best || new Big(l.price).gt(best.price) ? l : best), undefined);
      if (!target) continue;
      const cost = new Big(target.productCost).plus(correction.amount);
      target.productCost = (cost.lt(0) ? new Big(0) : cost).toFixed(2);
    }

    if (options.staffId) for (const id of [...activity.keys()]) if (id !== options.staffId) activity.delete(id);
    if (activity.size === 0) return [];
    const staffIds = [...activity.keys()];
    const staffRows = await this.database.db.select().from(staff).where(inArray(staff.id, staffIds));
    const branchOf = new Map((await this.database.db.select().from(branches).where(eq(branches.organisationId, organisationId))).map((b) => [b.id, b]));
    const versions = await this.planVersionsOn(organisationId, period.startDate);

    return staffRows
      .sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id))
      .map((member) => {
        const branch = branchOf.get(member.homeBranchId)!;
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

  /**
   * Runs a whole organisation's reads with hash joins only. PGlite keeps no planner statistics, and
   * without them the planner probed the tickets once per line; one staff member's few rows are left to the
   * planner, which finds them through the staff indexes.
   */
  private async withHashJoins(bulk: boolean, work: () => Promise<void>): Promise<void> {
    if (!bulk) return work();
    await this.database.transaction(async () => {
      await this.database.db.execute(sql`set local enable_nestloop = off`);
      await this.database.db.execute(sql`set local enable_mergejoin = off`);
      await work();
    });
  }

  /**
   * The rows of a query that selects one `line` of comma-separated fields (ids, numbers, dates and flags
   * only; '' for null), split into fields. PGlite decodes every column of every row in JavaScript, so one
   * text column costs half as much as the columns themselves. `sorted` orders the lines as text, which is
   * their order by leading fields when those are ISO dates and uuids, sparing the database a sort on disk.
   */
  private async textRows(query: SQL, sorted = false): Promise<Iterable<string[]>> {
    const result: unknown = await this.database.db.execute(query);
    const lines = ((Array.isArray(result) ? result : (result as { rows: unknown[] }).rows) as { line: string }[]).map((row) => row.line);
    if (sorted) lines.sort();
    // Split one line at a time: the fields are gone before the next, which keeps the garbage collector's work small.
    return (function* () {
      for (const line of lines) yield line.split(',');
    })();
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
