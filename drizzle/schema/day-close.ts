import { date, jsonb, numeric, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid, index } from 'drizzle-orm/pg-core';
import { users } from './auth.js';
import { branches } from './branches.js';
import { organisations } from './organisation.js';
import { staff } from './staff.js';
import { tickets } from './tickets.js';

/** One per branch and business date: its existence locks that day's tickets. */
export const dayCloses = pgTable(
  'day_closes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    businessDate: date('business_date').notNull(),
    expectedCash: numeric('expected_cash', { precision: 12, scale: 2 }).notNull(),
    countedCash: numeric('counted_cash', { precision: 12, scale: 2 }).notNull(),
    /** Optional count by note and coin: { "20.00": 4, "0.25": 3 }. */
    cashDenominations: jsonb('cash_denominations'),
    cashVariance: numeric('cash_variance', { precision: 12, scale: 2 }).notNull(),
    cardTotalTickets: numeric('card_total_tickets', { precision: 12, scale: 2 }).notNull(),
    cardTotalProcessor: numeric('card_total_processor', { precision: 12, scale: 2 }).notNull(),
    cardVariance: numeric('card_variance', { precision: 12, scale: 2 }).notNull(),
    note: text('note').notNull().default(''),
    closedById: uuid('closed_by_id').notNull().references(() => users.id),
    closedAt: timestamp('closed_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('day_closes_branch_day_unique').on(table.branchId, table.businessDate)],
);

export const adjustmentCategories = ['service', 'retail', 'tip', 'product_charge', 'cash'] as const;
export const adjustmentCategoryEnum = pgEnum('adjustment_category', adjustmentCategories);

/** A correction to a locked day, booked on a later open day of the same branch. */
export const adjustments = pgTable(
  'adjustments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    bookedOn: date('booked_on').notNull(),
    ticketId: uuid('ticket_id').references(() => tickets.id),
    staffId: uuid('staff_id').references(() => staff.id),
    category: adjustmentCategoryEnum('category').notNull(),
    amount: numeric('amount', { precision: 12, scale: 2 }).notNull(),
    reason: text('reason').notNull(),
    createdById: uuid('created_by_id').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('adjustments_branch_day_idx').on(table.branchId, table.bookedOn)],
);

/** Card-processor webhook events already handled, so a redelivered event is applied once. */
export const processorEvents = pgTable('processor_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});

export type DayCloseRow = typeof dayCloses.$inferSelect;
export type AdjustmentRow = typeof adjustments.$inferSelect;
