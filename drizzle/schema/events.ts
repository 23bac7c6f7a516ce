import { bigserial, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisation.js';

// Append-only: rows are inserted in the same transaction as the write they describe and never updated.
export const domainEvents = pgTable(
  'domain_events',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    type: text('type').notNull(),
    aggregateType: text('aggregate_type').notNull(),
    aggregateId: uuid('aggregate_id').notNull(),
    actorId: uuid('actor_id'),
    payload: jsonb('payload').notNull(),
    occurredAt: timestamp('occurred_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('domain_events_aggregate_idx').on(table.aggregateType, table.aggregateId)],
);

export type DomainEventRow = typeof domainEvents.$inferSelect;
