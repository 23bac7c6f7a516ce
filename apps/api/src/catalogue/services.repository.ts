import { Injectable } from '@nestjs/common';
import { levels, servicePrices, services, type ServiceRow } from '@tressury/schema';
import { and, asc, eq, inArray, ne, type SQL } from 'drizzle-orm';
import { Database } from '../database/database.js';
import { type ServicePriceView, type ServiceView, toServiceView } from './dto/service.view.js';

export type NewService = typeof services.$inferInsert;
export type PriceInput = { levelId: string; price: string };

@Injectable()
export class ServicesRepository {
  constructor(private readonly database: Database) {}

  async findInOrganisation(organisationId: string, id: string): Promise<ServiceRow | null> {
    const [row] = await this.database.db
      .select()
      .from(services)
      .where(and(eq(services.organisationId, organisationId), eq(services.id, id)))
      .for('update');
    return row ?? null;
  }

  /** The services with these names, locked for the rest of the transaction. */
  findByNames(organisationId: string, names: string[]): Promise<ServiceRow[]> {
    if (names.length === 0) return Promise.resolve([]);
    return this.database.db
      .select()
      .from(services)
      .where(and(eq(services.organisationId, organisationId), inArray(services.name, names)))
      .for('update');
  }

  async nameTaken(organisationId: string, name: string, exceptId?: string): Promise<boolean> {
    const conditions = [eq(services.organisationId, organisationId), eq(services.name, name)];
    if (exceptId) conditions.push(ne(services.id, exceptId));
    const rows = await this.database.db.select({ id: services.id }).from(services).where(and(...conditions)).limit(1);
    return rows.length > 0;
  }

  async insert(service: NewService): Promise<ServiceRow> {
    const [row] = await this.database.db.insert(services).values(service).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewService>): Promise<ServiceRow> {
    const [row] = await this.database.db
      .update(services)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(services.id, id))
      .returning();
    return row!;
  }

  /** Replaces every price of the service with `prices`. */
  async replacePrices(serviceId: string, prices: PriceInput[]): Promise<void> {
    await this.database.db.delete(servicePrices).where(eq(servicePrices.serviceId, serviceId));
    if (prices.length > 0) await this.database.db.insert(servicePrices).values(prices.map((p) => ({ serviceId, ...p })));
  }

  /** The services matching `where` with their prices, by category and name. */
  async views(where: SQL | undefined): Promise<ServiceView[]> {
    const rows = await this.database.db.select().from(services).where(where).orderBy(asc(services.category), asc(services.name));
    const prices = await this.pricesOf(rows.map((row) => row.id));
    return rows.map((row) => toServiceView(row, prices.get(row.id) ?? []));
  }

  async view(serviceId: string): Promise<ServiceView> {
    const [view] = await this.views(eq(services.id, serviceId));
    return view!;
  }

  /** Prices per service, most junior level first. */
  async pricesOf(serviceIds: string[]): Promise<Map<string, ServicePriceView[]>> {
    const byService = new Map<string, ServicePriceView[]>();
    if (serviceIds.length === 0) return byService;
    const rows = await this.database.db
      .select({ serviceId: servicePrices.serviceId, levelId: levels.id, levelName: levels.name, price: servicePrices.price })
      .from(servicePrices)
      .innerJoin(levels, eq(levels.id, servicePrices.levelId))
      .where(inArray(servicePrices.serviceId, serviceIds))
      .orderBy(asc(levels.rank), asc(levels.name));
    for (const { serviceId, ...price } of rows) {
      const list = byService.get(serviceId) ?? [];
      list.push(price);
      byService.set(serviceId, list);
    }
    return byService;
  }
}
