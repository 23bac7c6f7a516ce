import { Injectable } from '@nestjs/common';
import { products, type ProductRow } from '@tressury/schema';
import { and, eq, inArray, ne } from 'drizzle-orm';
import { Database } from '../database/database.js';

export type NewProduct = typeof products.$inferInsert;

@Injectable()
export class ProductsRepository {
  constructor(private readonly database: Database) {}

  async findInOrganisation(organisationId: string, id: string): Promise<ProductRow | null> {
    const [row] = await this.database.db
      .select()
      .from(products)
      .where(and(eq(products.organisationId, organisationId), eq(products.id, id)))
      .for('update');
    return row ?? null;
  }

  /** The products with these codes, locked for the rest of the transaction. */
  findByCodes(organisationId: string, codes: string[]): Promise<ProductRow[]> {
    if (codes.length === 0) return Promise.resolve([]);
    return this.database.db
      .select()
      .from(products)
      .where(and(eq(products.organisationId, organisationId), inArray(products.code, codes)))
      .for('update');
  }

  async codeTaken(organisationId: string, code: string, exceptId?: string): Promise<boolean> {
    const conditions = [eq(products.organisationId, organisationId), eq(products.code, code)];
    if (exceptId) conditions.push(ne(products.id, exceptId));
    const rows = await this.database.db.select({ id: products.id }).from(products).where(and(...conditions)).limit(1);
    return rows.length > 0;
  }

  async insert(product: NewProduct): Promise<ProductRow> {
    const [row] = await this.database.db.insert(products).values(product).returning();
    return row!;
  }

  async update(id: string, changes: Partial<NewProduct>): Promise<ProductRow> {
    const [row] = await this.database.db
      .update(products)
      .set({ ...changes, updatedAt: new Date() })
      .where(eq(products.id, id))
      .returning();
    return row!;
  }
}
