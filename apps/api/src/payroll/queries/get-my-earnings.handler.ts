import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { addDays, computePay, DomainError, payPeriodContaining, sumMoney, tierProgress, type PayInput } from '@tressury/domain';
import {
  branches,
  dayCloses,
  payPeriods,
  payPlanAssignments,
  payPlans,
  payPlanVersions,
  payrollLines,
  payrollRuns,
  paySchedules,
  staff,
  type PayPeriodRow,
} from '@tressury/schema';
import Big from 'big.js';
import { and, desc, eq, gte, inArray, lte, max } from 'drizzle-orm';
import type { AppAbility } from '../../authz/ability.js';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import type { EarningsDayView, EarningsFiguresView, EarningsTierProgressView, MyEarningsView } from '../dto/my-earnings.view.js';
import { PayInputsReader } from '../pay-inputs.js';
import { readablePayrollLines } from '../readable-payroll-lines.js';
import { GetMyEarningsQuery } from './get-my-earnings.query.js';

const STATEMENTS = 52;

const noStaffLink = () =>
  new DomainError('earnings.no_staff_link', 'This sign-in is not linked to a staff record, so it has no earnings to show.', 'not_found');
const earningsNotFound = () => new DomainError('earnings.not_found', 'No earnings to show for this sign-in.', 'not_found');

/**
 * A staff member's own pay period so far, read from closed days only with the reader and computePay that
 * the payroll run uses, so these figures become the period's statement once nothing changes. Only ever
 * the caller's own staff record: no request names a staff member.
 */
@QueryHandler(GetMyEarningsQuery)
export class GetMyEarningsHandler implements IQueryHandler<GetMyEarningsQuery> {
  constructor(
    private readonly database: Database,
    private readonly inputs: PayInputsReader,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, now }: GetMyEarningsQuery): Promise<MyEarningsView> {
    if (!user.staffId) throw noStaffLink();
    const db = this.database.db;
    const [found] = await db
      .select({ member: staff, branch: branches })
      .from(staff)
      .innerJoin(branches, eq(branches.id, staff.homeBranchId))
      .where(and(eq(staff.id, user.staffId), eq(staff.organisationId, user.organisationId)));
    if (!found) throw noStaffLink();
    const { member, branch } = found;
    const ability = this.abilities.createFor(user);
    assertCan(ability, user.role, 'read', 'StaffPay', { staffId: member.id, organisationId: member.organisationId, homeBranchId: member.homeBranchId }, earningsNotFound);

    const today = businessDateIn(branch.timeZone, now);
    const view: MyEarningsView = {
      staffId: member.id,
      staffName: member.displayName,
      branch: { id: branch.id, name: branch.name, timeZone: branch.timeZone, currency: branch.currency },
      today,
      missing: [],
      period: null,
      throughDate: null,
      plan: null,
      figures: null,
      nextTier: null,
      days: [],
      statements: await this.statements(ability, user.organisationId, member.id),
    };

    const [schedule] = await db.select().from(paySchedules).where(eq(paySchedules.organisationId, user.organisationId));
    if (!schedule) return { ...view, missing: ['pay_schedule'] };
    const range = payPeriodContaining(schedule, today);
    const [stored] = await db
      .select()
      .from(payPeriods)
      .where(and(eq(payPeriods.organisationId, user.organisationId), eq(payPeriods.startDate, range.startDate)));
    const [closed] = await db
      .select({ date: max(dayCloses.businessDate) })
      .from(dayCloses)
      .where(and(eq(dayCloses.branchId, branch.id), gte(dayCloses.businessDate, range.startDate), lte(dayCloses.businessDate, range.endDate)));
    view.period = { ...range, id: stored?.id ?? null };
    view.throughDate = closed?.date ?? null;

    const terms = await this.planOn(member.id, range.startDate);
    if (!terms) return { ...view, missing: ['pay_plan'] };
    const { name, version } = terms;
    view.plan = { name, tierMode: version.tierMode, tiers: version.tiers, productChargeMode: version.productChargeMode, retailRate: new Big(version.retailRate).toFixed() };

    // The reader reads only the period's dates; the period need not be stored yet.
    const period: PayPeriodRow = stored ?? { id: '', organisationId: user.organisationId, createdAt: now, ...range };
    const own = await this.inputs.forStaff(user.organisationId, period, schedule, member.id);
    // Nothing booked yet: only the tiers shape the result, every figure zero.
    const input: PayInput = own?.input ?? {
      plan: { tierMode: version.tierMode, tiers: version.tiers, productCharge: { mode: 'none' }, retailRate: '0' },
      serviceLines: [],
      retailLines: [],
      tips: [],
      hours: [],
      wageRules: { minimumWage: '0', overtimeAfterHours: '40', overtimeMultiplier: '1.5', workweekStartsOn: 0, commissionExemption: false },
    };
    view.figures = figuresOf(input);
    view.nextTier = progressOf(input, view.figures.commissionableRevenue);
    view.days = view.throughDate ? daysOf(input, range.startDate, view.throughDate) : [];
    return view;
  }

  /** The plan version in effect on `date`: the latest assignment on or before it, and that plan's latest terms on or before it. */
  private async planOn(staffId: string, date: string) {
    const db = this.database.db;
    const [assignment] = await db
      .select({ planId: payPlanAssignments.planId })
      .from(payPlanAssignments)
      .where(and(eq(payPlanAssignments.staffId, staffId), lte(payPlanAssignments.effectiveFrom, date)))
      .orderBy(desc(payPlanAssignments.effectiveFrom))
      .limit(1);
    if (!assignment) return null;
    const [terms] = await db
      .select({ name: payPlans.name, version: payPlanVersions })
      .from(payPlanVersions)
      .innerJoin(payPlans, eq(payPlans.id, payPlanVersions.planId))
      .where(and(eq(payPlanVersions.planId, assignment.planId), lte(payPlanVersions.effectiveFrom, date)))
      .orderBy(desc(payPlanVersions.effectiveFrom))
      .limit(1);
    return terms ?? null;
  }

  /** Their lines in approved or exported runs, still through the payroll-line rules the statement download applies. */
  private async statements(ability: AppAbility, organisationId: string, staffId: string) {
    return this.database.db
      .select({
        runId: payrollRuns.id,
        lineId: payrollLines.id,
        startDate: payPeriods.startDate,
        endDate: payPeriods.endDate,
        grossPay: payrollLines.grossPay,
        status: payrollRuns.status,
      })
      .from(payrollLines)
      .innerJoin(payrollRuns, eq(payrollRuns.id, payrollLines.runId))
      .innerJoin(payPeriods, eq(payPeriods.id, payrollRuns.periodId))
      .where(
        and(
          eq(payrollLines.organisationId, organisationId),
          eq(payrollLines.staffId, staffId),
          inArray(payrollRuns.status, ['approved', 'exported']),
          readablePayrollLines(ability),
        ),
      )
      .orderBy(desc(payPeriods.startDate))
      .limit(STATEMENTS);
  }
}

function figuresOf(input: PayInput): EarningsFiguresView {
  const result = computePay(input);
  return {
    serviceRevenue: result.serviceRevenue,
    productCharge: result.productCharge,
    commissionableRevenue: result.commissionableRevenue,
    serviceCommission: result.serviceCommission,
    tierBreakdown: result.tierBreakdown,
    retailRevenue: sumMoney(input.retailLines.map((line) => line.amount)),
    retailCommission: result.retailCommission,
    tips: result.tips,
    hours: input.hours.reduce((total, entry) => total.plus(entry.hours), new Big(0)).toFixed(),
    hourlyPay: result.hourlyPay,
  };
}

function progressOf(input: PayInput, commissionableRevenue: string): EarningsTierProgressView {
  const { currentTier, nextTier, revenueToNextTier, commissionAtNextTier, commissionAdded, progress } = tierProgress({
    tierMode: input.plan.tierMode,
    tiers: input.plan.tiers,
    commissionableRevenue,
  });
  return { currentTier, nextTier, revenueToNextTier, commissionAtNextTier, commissionAdded, progress };
}

/** Each day's own figures, computed on that day's lines alone (so a day's product charge is rounded once, for that day). */
function daysOf(input: PayInput, from: string, through: string): EarningsDayView[] {
  const days: EarningsDayView[] = [];
  for (let date = from; date <= through; date = addDays(date, 1)) {
    const on = <T extends { date: string }>(rows: T[]) => rows.filter((row) => row.date === date);
    const retailLines = on(input.retailLines);
    const day = computePay({
      ...input,
      serviceLines: on(input.serviceLines),
      productChargeAdjustments: on(input.productChargeAdjustments ?? []),
      retailLines,
      tips: on(input.tips),
      hours: [],
    });
    days.push({ date, serviceRevenue: day.serviceRevenue, productCharge: day.productCharge, retailRevenue: sumMoney(retailLines.map((line) => line.amount)), tips: day.tips });
  }
  return days;
}
