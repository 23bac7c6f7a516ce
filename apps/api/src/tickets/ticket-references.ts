import { Injectable } from '@nestjs/common';
import { branches, clients, products, servicePrices, services, staff } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { Database } from '../database/database.js';

/** What tickets read from the menu, catalogue, staff and client tables, always within the organisation. */
@Injectable()
export class TicketReferences {
  constructor(private readonly database: Database) {}

  async branch(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(branches).where(and(eq(branches.id, id), eq(branches.organisationId, organisationId)));
    return row ?? null;
  }

  async client(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(clients).where(and(eq(clients.id, id), eq(clients.organisationId, organisationId)));
    return row ?? null;
  }

  async service(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(services).where(and(eq(services.id, id), eq(services.organisationId, organisationId)));
    return row ?? null;
  }

  async price(serviceId: string, levelId: string): Promise<string | null> {
    const [row] = await this.database.db
      .select({ price: servicePrices.price })
      .from(servicePrices)
      .where(and(eq(servicePrices.serviceId, serviceId), eq(servicePrices.levelId, levelId)));
    return row?.price ?? null;
  }

  async staffMember(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(staff).where(and(eq(staff.id, id), eq(staff.organisationId, organisationId)));
    return row ?? null;
  }

  async product(organisationId: string, id: string) {
    const [row] = await this.database.db.select().from(products).where(and(eq(products.id, id), eq(products.organisationId, organisationId)));
    return row ?? null;
  }
}
