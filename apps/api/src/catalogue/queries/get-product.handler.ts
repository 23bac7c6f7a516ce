import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { products } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { productNotFound } from '../catalogue-errors.js';
import { type ProductView, toProductView } from '../dto/product.view.js';
import { GetProductQuery } from './get-product.query.js';

@QueryHandler(GetProductQuery)
export class GetProductHandler implements IQueryHandler<GetProductQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, productId }: GetProductQuery): Promise<ProductView> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Catalogue', { organisationId: products.organisationId });
    const [row] = await this.database.db.select().from(products).where(and(eq(products.id, productId), readable));
    if (!row) throw productNotFound();
    return toProductView(row);
  }
}
