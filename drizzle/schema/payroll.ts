import { date, index, integer, jsonb, numeric, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth.js';
import { branches } from './branches.js';
import { organisations } from './organisation.js';
import { staff } from './staff.js';

export const payTierModes = ['marginal', 'whole-period'] as const;
export const payTierModeEnum = pgEnum('pay_tier_mode', payTierModes);
export const productChargeModes = ['none', 'actual-cost', 'percent-of-price', 'fixed-per-colour-service'] as const;
export const productChargeModeEnum = pgEnum('product_charge_mode', productChargeModes);
export const payFrequencies = ['weekly', 'biweekly', 'semi-monthly'] as const;
export type PayFrequency = (typeof payFrequencies)[number];
export const payFrequencyEnum = pgEnum('pay_frequency', payFrequencies);
/** `computing` while the run works through the staff; `failed` keeps the reason in `error`. */
export const payrollRunStatuses = ['computing', 'draft', 'failed', 'approved', 'exported'] as const;
export type PayrollRunStatus = (typeof payrollRunStatuses)[number];
export const payrollRunStatusEnum = pgEnum('payroll_run_status', payrollRunStatuses);

export const payPlans = pgTable(
  'pay_plans',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    name: text('name').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('pay_plans_organisation_name_unique').on(table.organisationId, table.name)],
);

/** A plan's terms from the pay period starting on `effectiveFrom`; runs copy them into their lines, so a later version never alters an approved run. */
export const payPlanVersions = pgTable(
  'pay_plan_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    planId: uuid('plan_id').notNull().references(() => payPlans.id, { onDelete: 'cascade' }),
    effectiveFrom: date('effective_from').notNull(),
    tierMode: payTierModeEnum('tier_mode').notNull(),
    /** [{ from, rate }] as decimal strings, first from "0", strictly increasing. */
    tiers: jsonb('tiers').$type<{ from: string; rate: string }[]>().notNull(),
    productChargeMode: productChargeModeEnum('product_charge_mode').notNull(),
    productChargeValue: numeric('product_charge_value', { precision: 12, scale: 4 }),
    productChargeMarkup: numeric('product_charge_markup', { precision: 12, scale: 4 }),
    retailRate: numeric('retail_rate', { precision: 12, scale: 4 }).notNull(),
    hourlyRate: numeric('hourly_rate', { precision: 12, scale: 2 }),
    createdById: uuid('created_by_id').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('pay_plan_versions_plan_from_unique').on(table.planId, table.effectiveFrom)],
);

/** Which plan a staff member is paid on from `effectiveFrom` until their next assignment. */
export const payPlanAssignments = pgTable(
  'pay_plan_assignments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    planId: uuid('plan_id').notNull().references(() => payPlans.id),
    effectiveFrom: date('effective_from').notNull(),
    createdById: uuid('created_by_id').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('pay_plan_assignments_staff_from_unique').on(table.staffId, table.effectiveFrom)],
);

/** One per organisation: how its pay periods fall. */
export const paySchedules = pgTable('pay_schedules', {
  organisationId: uuid('organisation_id')
    .primaryKey()
    .references(() => organisations.id),
  frequency: payFrequencyEnum('frequency').notNull(),
  /** The first day of one pay period (weekly, biweekly); semi-monthly periods always run 1–15 and 16–end. */
  anchorDate: date('anchor_date').notNull(),
  /** 0 = Sunday … 6 = Saturday. */
  workweekStartsOn: integer('workweek_starts_on').notNull(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export const payPeriods = pgTable(
  'pay_periods',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    startDate: date('start_date').notNull(),
    endDate: date('end_date').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('pay_periods_organisation_start_unique').on(table.organisationId, table.startDate)],
);

export const timesheetEntries = pgTable(
  'timesheet_entries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    workDate: date('work_date').notNull(),
    hours: numeric('hours', { precision: 12, scale: 3 }).notNull(),
    updatedById: uuid('updated_by_id').notNull().references(() => users.id),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    uniqueIndex('timesheet_entries_staff_branch_day_unique').on(table.staffId, table.branchId, table.workDate),
    index('timesheet_entries_organisation_day_idx').on(table.organisationId, table.workDate),
  ],
);

/** One run per pay period: re-running a draft replaces it; approved and exported runs are frozen. */
export const payrollRuns = pgTable(
  'payroll_runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    periodId: uuid('period_id').notNull().references(() => payPeriods.id),
    status: payrollRunStatusEnum('status').notNull().default('computing'),
    totalStaff: integer('total_staff').notNull().default(0),
    processedStaff: integer('processed_staff').notNull().default(0),
    error: text('error'),
    grossPay: numeric('gross_pay', { precision: 12, scale: 2 }),
    startedById: uuid('started_by_id').notNull().references(() => users.id),
    startedAt: timestamp('started_at', { withTimezone: true }).notNull().defaultNow(),
    completedAt: timestamp('completed_at', { withTimezone: true }),
    /** Renewed by the instance computing the run; a computing run whose heartbeat is old has stalled. */
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }),
    approvedById: uuid('approved_by_id').references(() => users.id),
    approvedAt: timestamp('approved_at', { withTimezone: true }),
    exportedById: uuid('exported_by_id').references(() => users.id),
    exportedAt: timestamp('exported_at', { withTimezone: true }),
  },
  (table) => [uniqueIndex('payroll_runs_period_unique').on(table.periodId)],
);

/** One staff member's pay in a run: the PayInput and PayResult as computed, and the summary figures as columns. */
export const payrollLines = pgTable(
  'payroll_lines',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    runId: uuid('run_id').notNull().references(() => payrollRuns.id, { onDelete: 'cascade' }),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    /** The staff member's home branch at the time of the run: its wage rules apply. */
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    staffName: text('staff_name').notNull(),
    branchName: text('branch_name').notNull(),
    planVersionId: uuid('plan_version_id').notNull().references(() => payPlanVersions.id),
    input: jsonb('input').notNull(),
    result: jsonb('result').notNull(),
    hours: numeric('hours', { precision: 12, scale: 3 }).notNull(),
    serviceRevenue: numeric('service_revenue', { precision: 12, scale: 2 }).notNull(),
    productCharge: numeric('product_charge', { precision: 12, scale: 2 }).notNull(),
    commissionableRevenue: numeric('commissionable_revenue', { precision: 12, scale: 2 }).notNull(),
    serviceCommission: numeric('service_commission', { precision: 12, scale: 2 }).notNull(),
    retailCommission: numeric('retail_commission', { precision: 12, scale: 2 }).notNull(),
    hourlyPay: numeric('hourly_pay', { precision: 12, scale: 2 }).notNull(),
    tips: numeric('tips', { precision: 12, scale: 2 }).notNull(),
    minimumWageTopUp: numeric('minimum_wage_top_up', { precision: 12, scale: 2 }).notNull(),
    overtimePremium: numeric('overtime_premium', { precision: 12, scale: 2 }).notNull(),
    grossPay: numeric('gross_pay', { precision: 12, scale: 2 }).notNull(),
  },
  (table) => [uniqueIndex('payroll_lines_run_staff_unique').on(table.runId, table.staffId), index('payroll_lines_staff_idx').on(table.staffId)],
);

export type PayPlanRow = typeof payPlans.$inferSelect;
export type PayPlanVersionRow = typeof payPlanVersions.$inferSelect;
export type PayPlanAssignmentRow = typeof payPlanAssignments.$inferSelect;
export type PayScheduleRow = typeof paySchedules.$inferSelect;
export type PayPeriodRow = typeof payPeriods.$inferSelect;
export type TimesheetEntryRow = typeof timesheetEntries.$inferSelect;
export type PayrollRunRow = typeof payrollRuns.$inferSelect;
export type PayrollLineRow = typeof payrollLines.$inferSelect;
