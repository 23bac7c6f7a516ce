import { boolean, index, numeric, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { branches } from './branches.js';
import { levels } from './catalogue.js';
import { organisations } from './organisation.js';

export const staff = pgTable(
  'staff',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    homeBranchId: uuid('home_branch_id').notNull().references(() => branches.id),
    displayName: text('display_name').notNull(),
    email: text('email'),
    levelId: uuid('level_id').notNull().references(() => levels.id),
    /** Paid for every hour worked on top of commission, where the plan has one. */
    hourlyRate: numeric('hourly_rate', { precision: 12, scale: 2 }),
    active: boolean('active').notNull().default(true),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('staff_home_branch_idx').on(table.homeBranchId)],
);

export type StaffRow = typeof staff.$inferSelect;
