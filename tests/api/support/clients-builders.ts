import { costBowl } from '@tressury/domain';
import {
  bowlComponents,
  bowls,
  branches,
  levels,
  products,
  services,
  staff,
  ticketServiceLines,
  tickets,
  users,
  type ProductKind,
} from '@tressury/schema';
import { and, eq, max } from 'drizzle-orm';
import type { Db } from '../../../apps/api/src/database/database.js';

// Tickets have no commands yet: these rows are written straight to the tables, with invented names.

type ComponentSpec = { product: string; kind: 'colour' | 'lightener' | 'developer' | 'additive'; grams: string; costPerGram: string; developerVolume?: string };
export type BowlSpec = { components: ComponentSpec[]; leftoverGrams?: string; processingMinutes?: number; note?: string; mixedByStaffId?: string };
export type VisitSpec = {
  clientId: string;
  branchName: string;
  staffId: string;
  businessDate: string;
  serviceName: string;
  bowls?: BowlSpec[];
  status?: 'open' | 'closed' | 'void';
};

const productKindOf: Record<ComponentSpec['kind'], ProductKind> = { colour: 'permanent', lightener: 'lightener', developer: 'developer', additive: 'treatment' };

export class ClientsBuilder {
  private constructor(
    private readonly db: Db,
    readonly organisationId: string,
    private readonly levelId: string,
    private readonly openerId: string,
  ) {}

  static async create(db: Db): Promise<ClientsBuilder> {
    const [owner] = await db.select().from(users).where(eq(users.email, 'owner@thistlewick.example'));
    const [level] = await db.insert(levels).values({ organisationId: owner!.organisationId, name: 'Builder level', rank: 90 }).returning();
    return new ClientsBuilder(db, owner!.organisationId, level!.id, owner!.id);
  }

  async branchId(name: string): Promise<string> {
    const [row] = await this.db.select({ id: branches.id }).from(branches).where(and(eq(branches.organisationId, this.organisationId), eq(branches.name, name)));
    return row!.id;
  }

  async staffMember(displayName: string, branchName: string): Promise<string> {
    const [row] = await this.db
      .insert(staff)
      .values({ organisationId: this.organisationId, homeBranchId: await this.branchId(branchName), displayName, levelId: this.levelId })
      .returning();
    return row!.id;
  }

  /** A staff record behind the demo user with this e-mail; sign in after this, since tokens carry the staff id. */
  async linkUser(email: string, displayName: string, branchName: string): Promise<string> {
    const staffId = await this.staffMember(displayName, branchName);
    await this.db.update(users).set({ staffId }).where(eq(users.email, email));
    return staffId;
  }

  /** A ticket for the client with one service line by `staffId`, and the bowls mixed for it. */
  async visit(spec: VisitSpec): Promise<{ ticketId: string; lineId: string; bowlIds: string[] }> {
    const branchId = await this.branchId(spec.branchName);
    const serviceId = await this.service(spec.serviceName);
    const [last] = await this.db
      .select({ number: max(tickets.number) })
      .from(tickets)
      .where(and(eq(tickets.branchId, branchId), eq(tickets.businessDate, spec.businessDate)));
    const [ticket] = await this.db
      .insert(tickets)
      .values({
        organisationId: this.organisationId,
        branchId,
        businessDate: spec.businessDate,
        number: (last?.number ?? 0) + 1,
        clientId: spec.clientId,
        status: spec.status ?? 'closed',
        openedById: this.openerId,
      })
      .returning();
    const [line] = await this.db
      .insert(ticketServiceLines)
      .values({
        ticketId: ticket!.id,
        serviceId,
        serviceName: spec.serviceName,
        isColour: (spec.bowls ?? []).length > 0,
        staffId: spec.staffId,
        levelId: this.levelId,
        listPrice: '120.00',
        price: '120.00',
        bookedOn: spec.businessDate,
      })
      .returning();
    const bowlIds: string[] = [];
    for (const bowl of spec.bowls ?? []) bowlIds.push(await this.bowl(line!.id, spec.staffId, bowl));
    return { ticketId: ticket!.id, lineId: line!.id, bowlIds };
  }

  private async bowl(serviceLineId: string, staffId: string, spec: BowlSpec): Promise<string> {
    const productIds: string[] = [];
    for (const component of spec.components) productIds.push(await this.product(component));
    const figures = costBowl({
      components: spec.components.map((c, i) => ({ productId: productIds[i]!, kind: c.kind, grams: c.grams, costPerGram: c.costPerGram, volume: c.developerVolume })),
      leftoverGrams: spec.leftoverGrams,
    });
    const [row] = await this.db
      .insert(bowls)
      .values({
        serviceLineId,
        mixedByStaffId: spec.mixedByStaffId ?? staffId,
        leftoverGrams: spec.leftoverGrams ?? '0',
        processingMinutes: spec.processingMinutes ?? null,
        note: spec.note ?? '',
        totalGrams: figures.totalGrams,
        ratio: figures.ratio,
        developerVolume: figures.developerVolume,
        cost: figures.cost,
        wasteGrams: figures.wasteGrams,
        wasteCost: figures.wasteCost,
      })
      .returning();
    await this.db.insert(bowlComponents).values(
      spec.components.map((c, position) => ({
        bowlId: row!.id,
        productId: productIds[position]!,
        productName: c.product,
        kind: c.kind,
        grams: c.grams,
        costPerGram: c.costPerGram,
        developerVolume: c.developerVolume ?? null,
        position,
      })),
    );
    return row!.id;
  }

  private async service(name: string): Promise<string> {
    const [existing] = await this.db.select({ id: services.id }).from(services).where(and(eq(services.organisationId, this.organisationId), eq(services.name, name)));
    if (existing) return existing.id;
    const [row] = await this.db.insert(services).values({ organisationId: this.organisationId, name, category: 'Colour', durationMinutes: 90, isColour: true }).returning();
    return row!.id;
  }

  private async product(component: ComponentSpec): Promise<string> {
    const code = `BLD-${component.product.toUpperCase().replace(/[^A-Z0-9]+/g, '-')}`;
    const [existing] = await this.db.select({ id: products.id }).from(products).where(and(eq(products.organisationId, this.organisationId), eq(products.code, code)));
    if (existing) return existing.id;
    const [row] = await this.db
      .insert(products)
      .values({
        organisationId: this.organisationId,
        code,
        name: component.product,
        kind: productKindOf[component.kind],
        developerVolume: component.developerVolume ?? null,
        containerSize: '1000',
        containerUnit: 'g',
        containerCost: '1.00',
        costPerGram: component.costPerGram,
      })
      .returning();
    return row!.id;
  }
}
