import { boolean, integer, numeric, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisation.js';

/** Stylist levels of an organisation (e.g. new talent, stylist, senior, master); service prices vary by level. */
export const levels = pgTable(
  'levels',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    name: text('name').notNull(),
    rank: integer('rank').notNull(),
  },
  (table) => [uniqueIndex('levels_organisation_name_unique').on(table.organisationId, table.name)],
);

export const services = pgTable(
  'services',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    name: text('name').notNull(),
    category: text('category').notNull(),
    durationMinutes: integer('duration_minutes').notNull(),
    isColour: boolean('is_colour').notNull().default(false),
    active: boolean('active').notNull().default(true),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('services_organisation_name_unique').on(table.organisationId, table.name)],
);

export const servicePrices = pgTable(
  'service_prices',
  {
    serviceId: uuid('service_id').notNull().references(() => services.id, { onDelete: 'cascade' }),
    levelId: uuid('level_id').notNull().references(() => levels.id),
    price: numeric('price', { precision: 12, scale: 2 }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.serviceId, table.levelId] })],
);

export const productKinds = ['permanent', 'demi_permanent', 'lightener', 'developer', 'treatment', 'retail'] as const;
export type ProductKind = (typeof productKinds)[number];
export const productKindEnum = pgEnum('product_kind', productKinds);

export const containerUnits = ['g', 'oz', 'mL', 'fl oz'] as const;
export type ContainerUnitName = (typeof containerUnits)[number];
export const containerUnitEnum = pgEnum('container_unit', containerUnits);

export const products = pgTable(
  'products',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id').notNull().references(() => organisations.id),
    /** The organisation's own product code. */
    code: text('code').notNull(),
    name: text('name').notNull(),
    kind: productKindEnum('kind').notNull(),
    /** Developer strength in volumes (10, 20, 30, 40); developers only. */
    developerVolume: numeric('developer_volume', { precision: 12, scale: 3 }),
    containerSize: numeric('container_size', { precision: 12, scale: 3 }).notNull(),
    containerUnit: containerUnitEnum('container_unit').notNull(),
    /** Grams per millilitre from the safety data sheet, for products sold by volume. */
    densityGramsPerMl: numeric('density_grams_per_ml', { precision: 12, scale: 4 }),
    containerCost: numeric('container_cost', { precision: 12, scale: 2 }).notNull(),
    retailPrice: numeric('retail_price', { precision: 12, scale: 2 }),
    /** Derived by libs/domain costPerGram from the container; approximate when a volume had no density. */
    costPerGram: numeric('cost_per_gram', { precision: 12, scale: 6 }).notNull(),
    costPerGramApproximate: boolean('cost_per_gram_approximate').notNull().default(false),
    active: boolean('active').notNull().default(true),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('products_organisation_code_unique').on(table.organisationId, table.code)],
);

export type LevelRow = typeof levels.$inferSelect;
export type ServiceRow = typeof services.$inferSelect;
export type ServicePriceRow = typeof servicePrices.$inferSelect;
export type ProductRow = typeof products.$inferSelect;
