import type { PayrollRunStatus } from '@tressury/schema';

export class EarningsBranchView {
  id: string;
  name: string;
  timeZone: string;
  currency: string;
}

export class EarningsPeriodView {
  startDate: string;
  endDate: string;
  /** The stored pay period, once someone has created it. */
  id: string | null;
}

export class EarningsPlanView {
  name: string;
  tierMode: 'marginal' | 'whole-period';
  tiers: { from: string; rate: string }[];
  productChargeMode: 'none' | 'actual-cost' | 'percent-of-price' | 'fixed-per-colour-service';
  retailRate: string;
}

export class EarningsTierRowView {
  from: string;
  /** Null on the top tier. */
  to: string | null;
  rate: string;
  /** The commissionable revenue that falls in this tier. */
  base: string;
  commission: string;
}

/** The period so far, from closed days only; money as decimal strings. */
export class EarningsFiguresView {
  serviceRevenue: string;
  productCharge: string;
  commissionableRevenue: string;
  serviceCommission: string;
  tierBreakdown: EarningsTierRowView[];
  retailRevenue: string;
  retailCommission: string;
  tips: string;
  /** Timesheet hours recorded in the period so far. */
  hours: string;
  hourlyPay: string;
}

export class EarningsTierView {
  /** Index into the plan's tiers (0 = the first). */
  index: number;
  from: string;
  to: string | null;
  rate: string;
}

export class EarningsNextTierView {
  index: number;
  from: string;
  rate: string;
}

/** Where the commissionable revenue stands against the plan's tiers, from libs/domain tierProgress. */
export class EarningsTierProgressView {
  currentTier: EarningsTierView;
  /** Null on the top tier. */
  nextTier: EarningsNextTierView | null;
  revenueToNextTier: string | null;
  commissionAtNextTier: string | null;
  /** What reaching the next threshold adds to the service commission. */
  commissionAdded: string | null;
  /** "0" to "1": how far through the current tier toward the next. */
  progress: string;
}

export class EarningsDayView {
  date: string;
  serviceRevenue: string;
  productCharge: string;
  retailRevenue: string;
  tips: string;
}

/** One of the caller's lines in an approved or exported payroll run. */
export class EarningsStatementView {
  runId: string;
  lineId: string;
  startDate: string;
  endDate: string;
  grossPay: string;
  status: PayrollRunStatus;
}

export class MyEarningsView {
  staffId: string;
  staffName: string;
  /** The staff member's home branch: its business date, time zone and currency. */
  branch: EarningsBranchView;
  /** The home branch's business date now. */
  today: string;
  /** What is not set up yet, so nothing can be computed: the pay schedule, or a pay plan for this period. */
  missing: ('pay_schedule' | 'pay_plan')[];
  /** The pay period holding today; null without a pay schedule. */
  period: EarningsPeriodView | null;
  /** The last closed day of the home branch in the period: the figures run through it. Null before any closes. */
  throughDate: string | null;
  plan: EarningsPlanView | null;
  /** Null while something is missing. */
  figures: EarningsFiguresView | null;
  nextTier: EarningsTierProgressView | null;
  /** Every day from the period's first through `throughDate`, days without work at zero. */
  days: EarningsDayView[];
  /** Past statements, latest period first. */
  statements: EarningsStatementView[];
}
