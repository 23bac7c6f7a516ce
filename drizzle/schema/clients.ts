import { date, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { branches } from './branches.js';
import { organisations } from './organisation.js';

export const clients = pgTable(
  'clients',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    homeBranchId: uuid('home_branch_id').notNull().references(() => branches.id),
    firstName: text('first_name').notNull(),
    lastName: text('last_name').notNull(),
    phone: text('phone'),
    email: text('email'),
    notes: text('notes').notNull().default(''),
    allergyNotes: text('allergy_notes').notNull().default(''),
    /** Common practice: a skin test at least 48 hours before colour; its date is kept per client. */
    lastPatchTestOn: date('last_patch_test_on'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('clients_home_branch_idx').on(table.homeBranchId), index('clients_name_idx').on(table.lastName, table.firstName)],
);

export type ClientRow = typeof clients.$inferSelect;
