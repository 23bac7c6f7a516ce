import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { clientNotFound } from '../client-errors.js';
import { ClientsRepository } from '../clients.repository.js';
import { type ClientDetailView, toClientDetailView } from '../dto/client.view.js';
import { GetClientQuery } from './get-client.query.js';

@QueryHandler(GetClientQuery)
export class GetClientHandler implements IQueryHandler<GetClientQuery> {
  constructor(
    private readonly clients: ClientsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, clientId }: GetClientQuery): Promise<ClientDetailView> {
    const client = await this.clients.find(user.organisationId, clientId);
    if (!client) throw clientNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'Client', client, clientNotFound);
    const branch = (await this.clients.findBranch(user.organisationId, client.homeBranchId))!;
    return toClientDetailView(client, branch, businessDateIn(branch.timeZone));
  }
}
