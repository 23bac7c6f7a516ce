import { boolean, char, integer, numeric, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisation.js';

export const branches = pgTable(
  'branches',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    name: text('name').notNull(),
    timeZone: text('time_zone').notNull(),
    currency: char('currency', { length: 3 }).notNull(),
    minimumWage: numeric('minimum_wage', { precision: 12, scale: 2 }).notNull(),
    overtimeAfterHours: numeric('overtime_after_hours', { precision: 12, scale: 3 }).notNull(),
    overtimeMultiplier: numeric('overtime_multiplier', { precision: 12, scale: 3 }).notNull(),
    commissionExemption: boolean('commission_exemption').notNull().default(false),
    retailTaxRate: numeric('retail_tax_rate', { precision: 12, scale: 5 }).notNull(),
    /** A day close whose cash or card variance is larger than this needs a note. */
    varianceNoteThreshold: numeric('variance_note_threshold', { precision: 12, scale: 2 }).notNull().default('5.00'),
    /** How old a client's patch test may be before colour needs an explicit acknowledgement. */
    patchTestMaxAgeDays: integer('patch_test_max_age_days').notNull().default(180),
    /** Franchise fees as fractions of the branch's gross sales (0.06 = 6 %), billed monthly. */
    royaltyRate: numeric('royalty_rate', { precision: 12, scale: 5 }).notNull().default('0'),
    marketingFundRate: numeric('marketing_fund_rate', { precision: 12, scale: 5 }).notNull().default('0'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('branches_organisation_name_unique').on(table.organisationId, table.name)],
);

export type BranchRow = typeof branches.$inferSelect;
