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

/**
 * What every group of staff in a period's payroll shares, read once: the staff, their branches, the plan
 * version in effect on the period's first day, and the branch-days closed when the run began (a day closed
 * while the run goes on waits for the next run, for every staff member alike).
 */
export type PayrollScope = {
  organisationId: string;
  period: PayPeriodRow;
  schedule: PayScheduleRow;
  /** By name. */
  staff: StaffRow[];
  branchOf: Map<string, BranchRow>;
  planOf: Map<string, PayPlanVersionRow>;
  closedDays: Set<string>;
};

type Activity = Pick<PayInput, 'serviceLines' | 'retailLines' | 'tips' | 'hours'> & { productChargeAdjustments: NonNullable<PayInput['productChargeAdjustments']> };

const plain = (value: string): string => new Big(value).toFixed();

/**
 * A group of staff members' rows for the period, one query per kind, found through the staff indexes.
 * Closed branch-days are matched in JavaScript against the set the run read when it began, so every group
 * sees the same days.
 */
function groupQueries(organisationId: string, { startDate, endDate }: PayPeriodRow, staffIds: string[]) {
  const inPeriod = (column: SQL) => sql`${column} between ${startDate}::date and ${endDate}::date`;
  // One array parameter whatever the group's size (uuids need no quoting inside an array literal).
  const group = sql`any(${`{${staffIds.join(',')}}`}::uuid[])`;
  const closedTicket = sql`t.organisation_id = ${organisationId}::uuid and t.status = 'closed'`;
  return {
    serviceLines: sql`
      select format('%s,%s,%s,%s,%s,%s,%s,%s', l.booked_on, l.id, l.staff_id, l.assistant_staff_id, l.assistant_share, l.price, l.is_colour, t.branch_id) as line
      from ticket_service_lines l join tickets t on t.id = l.ticket_id
      where ${closedTicket} and ${inPeriod(sql`l.booked_on`)} and (l.staff_id = ${group} or l.assistant_staff_id = ${group})`,
    // A service line's product cost is the sum of its bowls' costs, to the cent. Asked apart from the lines:
    // one grouped join costs half as much as a sum per line.
    bowlCosts: sql`
      select format('%s,%s', b.service_line_id, sum(b.cost)::numeric(12, 2)) as line
      from ticket_service_lines l join bowls b on b.service_line_id = l.id
      where ${inPeriod(sql`l.booked_on`)} and (l.staff_id = ${group} or l.assistant_staff_id = ${group})
      group by b.service_line_id`,
    retailLines: sql`
      select format('%s,%s,%s,%s,%s', r.booked_on, r.id, r.seller_staff_id, r.amount, t.branch_id) as line
      from retail_lines r join tickets t on t.id = r.ticket_id
      where ${closedTicket} and ${inPeriod(sql`r.booked_on`)} and r.seller_staff_id = ${group}`,
    tips: sql`
      select format('%s,%s,%s,%s,%s', p.booked_on, p.id, p.staff_id, p.amount, t.branch_id) as line
      from tips p join tickets t on t.id = p.ticket_id
      where ${closedTicket} and ${inPeriod(sql`p.booked_on`)} and p.staff_id = ${group}`,
    adjustments: sql`
      select format('%s,%s,%s,%s,%s,%s', a.booked_on, a.id, a.staff_id, a.category, a.amount, a.branch_id) as line
      from adjustments a
      where a.organisation_id = ${organisationId}::uuid and a.category <> 'cash' and ${inPeriod(sql`a.booked_on`)} and a.staff_id = ${group}`,
    hours: sql`
      select format('%s,%s,%s,%s', h.work_date, h.staff_id, h.branch_id, h.hours) as line
      from timesheet_entries h
      where h.organisation_id = ${organisationId}::uuid and ${inPeriod(sql`h.work_date`)} and h.hours > 0 and h.staff_id = ${group}`,
  };
}

/**
 * Reads what a pay period's payroll rests on: closed days only (the ticket closed and its branch's day
 * closed), refunds as the negative lines they are, adjustments booked on closed days in the period, and
 * the plan in effect on the period's first day. A run reads its staff a group at a time, so what it holds
 * in memory is bounded by the group, not by the organisation.
 */
@Injectable()
export class PayInputsReader {
  constructor(private readonly database: Database) {}

  /** The period's scope for every staff member of the organisation, or only for `staffIds`. */
  async scope(organisationId: string, period: PayPeriodRow, schedule: PayScheduleRow, staffIds?: string[]): Promise<PayrollScope> {
    const db = this.database.db;
    const staffRows = await db
      .select()
      .from(staff)
      .where(and(eq(staff.organisationId, organisationId), staffIds ? inArray(staff.id, staffIds) : undefined));
    staffRows.sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id));
    const branchRows = await db.select().from(branches).where(eq(branches.organisationId, organisationId));
    const closedDays = await this.textRows(sql`
      select format('%s,%s', branch_id, business_date) as line from day_closes
      where organisation_id = ${organisationId}::uuid and business_date between ${period.startDate}::date and ${period.endDate}::date`);
    return {
      organisationId,
      period,
      schedule,
      staff: staffRows,
      branchOf: new Map(branchRows.map((b) => [b.id, b])),
      planOf: await this.planVersionsOn(organisationId, period.startDate),
      closedDays: new Set(Array.from(closedDays, ([branchId, date]) => `${branchId} ${date}`)),
    };
  }

  /** The inputs of the staff members of `group` that have hours or closed-day lines in the period, by name. */
  async inputsOf(scope: PayrollScope, group: StaffRow[]): Promise<StaffPayInput[]> {
    if (group.length === 0) return [];
    const inGroup = new Set(group.map((s) => s.id));
    const activity = new Map<string, Activity>();
    const of = (staffId: string): Activity => {
      let found = activity.get(staffId);
      if (!found) activity.set(staffId, (found = { serviceLines: [], retailLines: [], tips: [], hours: [], productChargeAdjustments: [] }));
      return found;
    };
    const closed = (branchId: string, date: string) => scope.closedDays.has(`${branchId} ${date}`);
    const queries = groupQueries(scope.organisationId, scope.period, [...inGroup]);

    const bowlCost = new Map(Array.from(await this.textRows(queries.bowlCosts), ([lineId, cost]) => [lineId!, cost!]));
    for (const [date, id, staffId, assistantStaffId, assistantShare, price, isColour, branchId] of await this.textRows(queries.serviceLines, true)) {
      if (!closed(branchId!, date!)) continue;
      const line = { date: date!, price: price!, isColour: isColour === 't', productCost: bowlCost.get(id!) ?? '0.00' };
      // An assistant's share of a line is theirs; the stylist keeps the rest of the same line.
      if (assistantStaffId && assistantShare && new Big(assistantShare).gt(0)) {
        const share = new Big(assistantShare);
        if (inGroup.has(staffId!)) of(staffId!).serviceLines.push({ id: id!, ...line, share: new Big(1).minus(share).toFixed() });
        if (inGroup.has(assistantStaffId)) of(assistantStaffId).serviceLines.push({ id: `${id}:assistant`, ...line, share: share.toFixed() });
      } else if (inGroup.has(staffId!)) {
        of(staffId!).serviceLines.push({ id: id!, ...line });
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
      else if (category === 'product_charge') mine.productChargeAdjustments.push({ id, date: date!, amount: amount! });
    }
    for (const [date, staffId, , hours] of await this.textRows(queries.hours, true)) of(staffId!).hours.push({ date: date!, hours: plain(hours!) });

    return group.filter((member) => activity.has(member.id)).map((member) => this.staffInput(scope, member, activity.get(member.id)!));
  }

  /** One staff member's inputs for the period (a stylist's own earnings so far), or null with nothing booked. */
  async forStaff(organisationId: string, period: PayPeriodRow, schedule: PayScheduleRow, staffId: string): Promise<StaffPayInput | null> {
    const scope = await this.scope(organisationId, period, schedule, [staffId]);
    const [own] = await this.inputsOf(scope, scope.staff);
    return own ?? null;
  }

  private staffInput(scope: PayrollScope, member: StaffRow, { productChargeAdjustments, ...activity }: Activity): StaffPayInput {
    const branch = scope.branchOf.get(member.homeBranchId)!;
    const version = scope.planOf.get(member.id) ?? null;
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
      ...activity,
      ...(productChargeAdjustments.length > 0 ? { productChargeAdjustments } : {}),
      wageRules: {
        minimumWage: branch.minimumWage,
        overtimeAfterHours: plain(branch.overtimeAfterHours),
        overtimeMultiplier: plain(branch.overtimeMultiplier),
        workweekStartsOn: scope.schedule.workweekStartsOn as PayInput['wageRules']['workweekStartsOn'],
        commissionExemption: branch.commissionExemption,
      },
    };
    return { staff: member, branch, planVersion: version, input };
  }

  /**
   * The rows of a query that selects one `line` of comma-separated fields (ids, numbers, dates and flags
   * only; '' for null), split into fields. PGlite decodes every column of every row in JavaScript, so one
   * text column costs half as much as the columns themselves. `sorted` orders the lines as text, which is
   * their order by leading fields when those are ISO dates and uuids, sparing the database a sort.
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
