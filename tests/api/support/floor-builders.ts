import { costPerGram } from '@tressury/domain';
import { branches, clients, levels, products, servicePrices, services, staff, users, type ContainerUnitName, type ProductKind } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { businessDateIn } from '../../../apps/api/src/common/business-date.js';
import type { Database } from '../../../apps/api/src/database/database.js';

/** Invented test data for the salon floor: levels, a small menu, house-brand products, staff, clients. */
export async function buildFloor(database: Database) {
  const db = database.db;
  const [riverside] = await db.select().from(branches).where(eq(branches.name, 'Riverside'));
  const [oldMill] = await db.select().from(branches).where(eq(branches.name, 'Old Mill'));
  const organisationId = riverside!.organisationId;

  const [junior, senior] = await db
    .insert(levels)
    .values([
      { organisationId, name: 'Test Emerging', rank: 1 },
      { organisationId, name: 'Test Senior', rank: 3 },
    ])
    .returning();

  const service = async (name: string, category: string, isColour: boolean, prices: [string, string]) => {
    const [row] = await db.insert(services).values({ organisationId, name, category, durationMinutes: 60, isColour }).returning();
    await db.insert(servicePrices).values([
      { serviceId: row!.id, levelId: junior!.id, price: prices[0] },
      { serviceId: row!.id, levelId: senior!.id, price: prices[1] },
    ]);
    return row!;
  };
  const product = async (code: string, name: string, kind: ProductKind, size: string, unit: ContainerUnitName, cost: string, extra: Partial<typeof products.$inferInsert> = {}) => {
    const perGram = costPerGram(cost, size, unit, extra.densityGramsPerMl ?? undefined);
    const [row] = await db
      .insert(products)
      .values({ organisationId, code, name, kind, containerSize: size, containerUnit: unit, containerCost: cost, costPerGram: perGram.costPerGram, costPerGramApproximate: perGram.approximate, ...extra })
      .returning();
    return row!;
  };
  const member = async (displayName: string, levelId: string, homeBranchId: string) => {
    const [row] = await db.insert(staff).values({ organisationId, displayName, levelId, homeBranchId }).returning();
    return row!;
  };

  const floor = {
    organisationId,
    riverside: riverside!,
    oldMill: oldMill!,
    levels: { junior: junior!, senior: senior! },
    services: {
      cut: await service('Test Precision Cut', 'Cuts', false, ['55.00', '85.00']),
      rootColour: await service('Test Root Colour', 'Colour', true, ['80.00', '110.00']),
    },
    products: {
      // 60 g tube for $6.00: $0.10 a gram.
      shade: await product('T-6N', 'Test House Permanent 6N', 'permanent', '60', 'g', '6.00'),
      // 1000 mL at 1.0 g/mL for $12.00: $0.012 a gram.
      developer20: await product('T-D20', 'Test House Developer 20 vol', 'developer', '1000', 'mL', '12.00', { developerVolume: '20', densityGramsPerMl: '1.0' }),
      shampoo: await product('T-SH', 'Test House Shampoo', 'retail', '300', 'mL', '7.00', { retailPrice: '24.00', densityGramsPerMl: '1.0' }),
    },
    staff: {
      rhea: await member('Test Rhea', senior!.id, riverside!.id),
      jonah: await member('Test Jonah', junior!.id, riverside!.id),
      milla: await member('Test Milla', senior!.id, oldMill!.id),
    },
    clients: {
      tested: (await db.insert(clients).values({ organisationId, homeBranchId: riverside!.id, firstName: 'Test', lastName: 'Patched', lastPatchTestOn: businessDateIn(riverside!.timeZone, new Date(Date.now() - 10 * 86_400_000)) }).returning())[0]!,
      walkIn: (await db.insert(clients).values({ organisationId, homeBranchId: riverside!.id, firstName: 'Test', lastName: 'Untested' }).returning())[0]!,
    },
  };
  // The demo stylist signs in as Test Rhea: tokens taken after this carry her staff id.
  await db.update(users).set({ staffId: floor.staff.rhea.id }).where(and(eq(users.organisationId, organisationId), eq(users.role, 'stylist')));
  return floor;
}

export type Floor = Awaited<ReturnType<typeof buildFloor>>;
