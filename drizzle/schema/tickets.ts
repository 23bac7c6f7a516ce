import { boolean, date, index, integer, numeric, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { users } from './auth.js';
import { branches } from './branches.js';
import { products, services, levels } from './catalogue.js';
import { clients } from './clients.js';
import { organisations } from './organisation.js';
import { staff } from './staff.js';

export const ticketStatuses = ['open', 'closed', 'void'] as const;
export type TicketStatus = (typeof ticketStatuses)[number];
export const ticketStatusEnum = pgEnum('ticket_status', ticketStatuses);

export const tickets = pgTable(
  'tickets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    branchId: uuid('branch_id').notNull().references(() => branches.id),
    /** The branch's calendar day in its own time zone when the ticket was opened. */
    businessDate: date('business_date').notNull(),
    /** Counts up per branch and business date, for people to say "ticket 14". */
    number: integer('number').notNull(),
    clientId: uuid('client_id').references(() => clients.id),
    status: ticketStatusEnum('status').notNull().default('open'),
    openedById: uuid('opened_by_id').notNull().references(() => users.id),
    openedAt: timestamp('opened_at', { withTimezone: true }).notNull().defaultNow(),
    closedById: uuid('closed_by_id').references(() => users.id),
    closedAt: timestamp('closed_at', { withTimezone: true }),
    voidedById: uuid('voided_by_id').references(() => users.id),
    voidedAt: timestamp('voided_at', { withTimezone: true }),
    voidReason: text('void_reason'),
    /** Who confirmed colour could go ahead without a patch test in the branch's window, and when. */
    patchTestAcknowledgedById: uuid('patch_test_acknowledged_by_id').references(() => users.id),
    patchTestAcknowledgedAt: timestamp('patch_test_acknowledged_at', { withTimezone: true }),
  },
  (table) => [
    uniqueIndex('tickets_branch_day_number_unique').on(table.branchId, table.businessDate, table.number),
    index('tickets_client_idx').on(table.clientId),
  ],
);

/**
 * Services sold on a ticket. A refund adds a line with a negative price on the day it is booked
 * (`bookedOn`), pointing at the line it reverses.
 */
export const ticketServiceLines = pgTable(
  'ticket_service_lines',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    serviceId: uuid('service_id').notNull().references(() => services.id),
    serviceName: text('service_name').notNull(),
    isColour: boolean('is_colour').notNull(),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    levelId: uuid('level_id').notNull().references(() => levels.id),
    assistantStaffId: uuid('assistant_staff_id').references(() => staff.id),
    /** The assistant's part of the line (0..1); the stylist keeps the rest. */
    assistantShare: numeric('assistant_share', { precision: 12, scale: 4 }),
    listPrice: numeric('list_price', { precision: 12, scale: 2 }).notNull(),
    discount: numeric('discount', { precision: 12, scale: 2 }).notNull().default('0'),
    /** listPrice − discount: what the client pays for the service. */
    price: numeric('price', { precision: 12, scale: 2 }).notNull(),
    /** Why a colour service has no bowl (e.g. the client brought no change); required to close without one. */
    noProductReason: text('no_product_reason'),
    bookedOn: date('booked_on').notNull(),
    refundOfLineId: uuid('refund_of_line_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('ticket_service_lines_ticket_idx').on(table.ticketId),
    index('ticket_service_lines_staff_day_idx').on(table.staffId, table.bookedOn),
    // Payroll reads a group of staff at a time, as stylists and as assistants.
    index('ticket_service_lines_assistant_day_idx').on(table.assistantStaffId, table.bookedOn).where(sql`${table.assistantStaffId} is not null`),
  ],
);

export const bowlComponentKinds = ['colour', 'lightener', 'developer', 'additive'] as const;
export const bowlComponentKindEnum = pgEnum('bowl_component_kind', bowlComponentKinds);

/** One mix weighed for a colour service line; its cost is computed by libs/domain costBowl and kept. */
export const bowls = pgTable(
  'bowls',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    serviceLineId: uuid('service_line_id').notNull().references(() => ticketServiceLines.id, { onDelete: 'cascade' }),
    mixedByStaffId: uuid('mixed_by_staff_id').notNull().references(() => staff.id),
    leftoverGrams: numeric('leftover_grams', { precision: 12, scale: 3 }).notNull().default('0'),
    processingMinutes: integer('processing_minutes'),
    note: text('note').notNull().default(''),
    totalGrams: numeric('total_grams', { precision: 12, scale: 3 }).notNull(),
    ratio: numeric('ratio', { precision: 12, scale: 2 }),
    developerVolume: numeric('developer_volume', { precision: 12, scale: 1 }),
    cost: numeric('cost', { precision: 12, scale: 2 }).notNull(),
    wasteGrams: numeric('waste_grams', { precision: 12, scale: 3 }).notNull(),
    wasteCost: numeric('waste_cost', { precision: 12, scale: 2 }).notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('bowls_service_line_idx').on(table.serviceLineId)],
);

export const bowlComponents = pgTable(
  'bowl_components',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    bowlId: uuid('bowl_id').notNull().references(() => bowls.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id),
    productName: text('product_name').notNull(),
    kind: bowlComponentKindEnum('kind').notNull(),
    grams: numeric('grams', { precision: 12, scale: 3 }).notNull(),
    /** The product's cost per gram when the bowl was mixed, so later price changes leave it alone. */
    costPerGram: numeric('cost_per_gram', { precision: 12, scale: 6 }).notNull(),
    developerVolume: numeric('developer_volume', { precision: 12, scale: 3 }),
    position: integer('position').notNull(),
  },
  (table) => [index('bowl_components_bowl_idx').on(table.bowlId)],
);

export const retailLines = pgTable(
  'retail_lines',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id),
    productName: text('product_name').notNull(),
    /** Negative on a refund line. */
    quantity: integer('quantity').notNull(),
    unitPrice: numeric('unit_price', { precision: 12, scale: 2 }).notNull(),
    amount: numeric('amount', { precision: 12, scale: 2 }).notNull(),
    taxRate: numeric('tax_rate', { precision: 12, scale: 5 }).notNull(),
    tax: numeric('tax', { precision: 12, scale: 2 }).notNull(),
    sellerStaffId: uuid('seller_staff_id').notNull().references(() => staff.id),
    bookedOn: date('booked_on').notNull(),
    refundOfLineId: uuid('refund_of_line_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('retail_lines_ticket_idx').on(table.ticketId), index('retail_lines_seller_day_idx').on(table.sellerStaffId, table.bookedOn)],
);

export const tips = pgTable(
  'tips',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    staffId: uuid('staff_id').notNull().references(() => staff.id),
    amount: numeric('amount', { precision: 12, scale: 2 }).notNull(),
    bookedOn: date('booked_on').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('tips_ticket_idx').on(table.ticketId), index('tips_staff_day_idx').on(table.staffId, table.bookedOn)],
);

export const paymentMethods = ['cash', 'card'] as const;
export const paymentMethodEnum = pgEnum('payment_method', paymentMethods);
export const paymentKinds = ['charge', 'refund'] as const;
export const paymentKindEnum = pgEnum('payment_kind', paymentKinds);
export const paymentStatuses = ['pending', 'succeeded', 'failed'] as const;
export const paymentStatusEnum = pgEnum('payment_status', paymentStatuses);

export const payments = pgTable(
  'payments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    method: paymentMethodEnum('method').notNull(),
    kind: paymentKindEnum('kind').notNull().default('charge'),
    status: paymentStatusEnum('status').notNull(),
    /** Positive for a charge, negative for a refund. */
    amount: numeric('amount', { precision: 12, scale: 2 }).notNull(),
    /** The client's cash handed over, when more than the amount (change is given back). */
    tendered: numeric('tendered', { precision: 12, scale: 2 }),
    processorPaymentId: text('processor_payment_id'),
    processorRefundId: text('processor_refund_id'),
    /** From the front end per checkout attempt, so a double-submitted payment charges once. */
    idempotencyKey: text('idempotency_key').notNull(),
    bookedOn: date('booked_on').notNull(),
    takenById: uuid('taken_by_id').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('payments_idempotency_unique').on(table.ticketId, table.idempotencyKey), index('payments_ticket_idx').on(table.ticketId)],
);

export type TicketRow = typeof tickets.$inferSelect;
export type TicketServiceLineRow = typeof ticketServiceLines.$inferSelect;
export type BowlRow = typeof bowls.$inferSelect;
export type BowlComponentRow = typeof bowlComponents.$inferSelect;
export type RetailLineRow = typeof retailLines.$inferSelect;
export type TipRow = typeof tips.$inferSelect;
export type PaymentRow = typeof payments.$inferSelect;
