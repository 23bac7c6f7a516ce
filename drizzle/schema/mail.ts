import { index, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth.js';
import { organisations } from './organisation.js';
import { staff } from './staff.js';

export const outboundMessageStatuses = ['sent', 'failed'] as const;
export type OutboundMessageStatus = (typeof outboundMessageStatuses)[number];
export const outboundMessageStatusEnum = pgEnum('outbound_message_status', outboundMessageStatuses);

/** Every e-mail the app has handed to the mail server (or failed to), for the outbox page. */
export const outboundMessages = pgTable(
  'outbound_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    /** What the message is, e.g. `pay_statement`. */
    kind: text('kind').notNull(),
    recipient: text('recipient').notNull(),
    recipientStaffId: uuid('recipient_staff_id').references(() => staff.id),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    attachmentName: text('attachment_name'),
    /** The run, period or other record the message is about. */
    subjectRef: text('subject_ref'),
    status: outboundMessageStatusEnum('status').notNull(),
    error: text('error'),
    transportMessageId: text('transport_message_id'),
    sentById: uuid('sent_by_id').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('outbound_messages_organisation_created').on(table.organisationId, table.createdAt)],
);

export type OutboundMessageRow = typeof outboundMessages.$inferSelect;
