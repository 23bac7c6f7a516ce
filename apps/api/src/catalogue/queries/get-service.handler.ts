import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { services } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { serviceNotFound } from '../catalogue-errors.js';
import type { ServiceView } from '../dto/service.view.js';
import { ServicesRepository } from '../services.repository.js';
import { GetServiceQuery } from './get-service.query.js';

@QueryHandler(GetServiceQuery)
export class GetServiceHandler implements IQueryHandler<GetServiceQuery> {
  constructor(
    private readonly services: ServicesRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, serviceId }: GetServiceQuery): Promise<ServiceView> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Catalogue', { organisationId: services.organisationId });
    const [view] = await this.services.views(and(eq(services.id, serviceId), readable));
    if (!view) throw serviceNotFound();
    return view;
  }
}
