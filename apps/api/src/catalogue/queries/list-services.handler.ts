import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { services } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import type { ServiceView } from '../dto/service.view.js';
import { ServicesRepository } from '../services.repository.js';
import { ListServicesQuery } from './list-services.query.js';

@QueryHandler(ListServicesQuery)
export class ListServicesHandler implements IQueryHandler<ListServicesQuery> {
  constructor(
    private readonly services: ServicesRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  execute({ user, filter }: ListServicesQuery): Promise<ServiceView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Catalogue', { organisationId: services.organisationId });
    return this.services.views(and(readable, filter.active === undefined ? undefined : eq(services.active, filter.active)));
  }
}
