import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { products } from '@tressury/schema';
import { and, asc, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { type ProductView, toProductView } from '../dto/product.view.js';
import { ListProductsQuery } from './list-products.query.js';

@QueryHandler(ListProductsQuery)
export class ListProductsHandler implements IQueryHandler<ListProductsQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, filter }: ListProductsQuery): Promise<ProductView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Catalogue', { organisationId: products.organisationId });
    const rows = await this.database.db
      .select()
      .from(products)
      .where(
        and(
          readable,
          filter.kind === undefined ? undefined : eq(products.kind, filter.kind),
          filter.active === undefined ? undefined : eq(products.active, filter.active),
        ),
      )
      .orderBy(asc(products.kind), asc(products.name), asc(products.code));
    return rows.map(toProductView);
  }
}
