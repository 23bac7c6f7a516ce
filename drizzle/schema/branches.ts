import { boolean, char, numeric, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
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
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('branches_organisation_name_unique').on(table.organisationId, table.name)],
);

export type BranchRow = typeof branches.$inferSelect;
