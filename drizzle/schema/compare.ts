import { boolean, date, index, integer, numeric, pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { branches } from './branches.js';
import { clients } from './clients.js';
import { organisations } from './organisation.js';
import { staff } from './staff.js';

// Read models of the branch comparison. Each row is recomputed whole from the source tables when a ticket
// closes, is voided or refunded, an adjustment is booked, hours are entered or a day closes, so replaying an
// event or rebuilding from scratch gives the same rows.

/** One branch's business date: closed tickets' figures by the day each line was booked. */
export const branchDayFigures = pgTable(
  'branch_day_figures',
  {
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    businessDate: date('business_date').notNull(),
    serviceRevenue: numeric('service_revenue', { precision: 12, scale: 2 }).notNull(),
    colourServiceRevenue: numeric('colour_service_revenue', { precision: 12, scale: 2 }).notNull(),
    colourProductCost: numeric('colour_product_cost', { precision: 12, scale: 2 }).notNull(),
    retailRevenue: numeric('retail_revenue', { precision: 12, scale: 2 }).notNull(),
    tips: numeric('tips', { precision: 12, scale: 2 }).notNull(),
    tickets: integer('tickets').notNull(),
    voids: integer('voids').notNull(),
    refunds: integer('refunds').notNull(),
    refundedAmount: numeric('refunded_amount', { precision: 12, scale: 2 }).notNull(),
    /** Timesheet hours worked at the branch that day, and the service revenue of the staff-days that have hours. */
    hours: numeric('hours', { precision: 12, scale: 3 }).notNull(),
    revenueWithHours: numeric('revenue_with_hours', { precision: 12, scale: 2 }).notNull(),
    dayClosed: boolean('day_closed').notNull(),
  },
  (table) => [primaryKey({ columns: [table.branchId, table.businessDate] })],
);

/** One staff member's day at one branch: the lines they served, the retail they sold, their tips and hours. */
export const staffDayFigures = pgTable(
  'staff_day_figures',
  {
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    businessDate: date('business_date').notNull(),
    serviceRevenue: numeric('service_revenue', { precision: 12, scale: 2 }).notNull(),
    colourServiceRevenue: numeric('colour_service_revenue', { precision: 12, scale: 2 }).notNull(),
    colourProductCost: numeric('colour_product_cost', { precision: 12, scale: 2 }).notNull(),
    retailRevenue: numeric('retail_revenue', { precision: 12, scale: 2 }).notNull(),
    tips: numeric('tips', { precision: 12, scale: 2 }).notNull(),
    tickets: integer('tickets').notNull(),
    hours: numeric('hours', { precision: 12, scale: 3 }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.branchId, table.businessDate, table.staffId] })],
);

/**
 * A client's visit to a branch: a business date with at least one closed ticket for them there. The
 * neighbouring visits to the same branch and whether it was their first in the organisation are kept on
 * the row, so new, returning and rebooked clients of any range are counted without looking further.
 */
export const clientVisits = pgTable(
  'client_visits',
  {
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    clientId: uuid('client_id').notNull().references(() => clients.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    businessDate: date('business_date').notNull(),
    previousVisitOn: date('previous_visit_on'),
    nextVisitOn: date('next_visit_on'),
    firstInOrganisation: boolean('first_in_organisation').notNull(),
  },
  (table) => [primaryKey({ columns: [table.branchId, table.businessDate, table.clientId] }), index('client_visits_client_idx').on(table.clientId)],
);

/** When each organisation's read models were last rebuilt from the source tables (none yet: rebuilt at start). */
export const compareRebuilds = pgTable('compare_rebuilds', {
  organisationId: uuid('organisation_id')
    .primaryKey()
    .references(() => organisations.id),
  rebuiltAt: timestamp('rebuilt_at', { withTimezone: true }).notNull(),
});

export type BranchDayFiguresRow = typeof branchDayFigures.$inferSelect;
export type StaffDayFiguresRow = typeof staffDayFigures.$inferSelect;
export type ClientVisitRow = typeof clientVisits.$inferSelect;
