import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { DEFAULT_PAGE_SIZE } from '../../common/page-query.dto.js';
import { type OutboundMessageView, toOutboundMessageView } from '../dto/outbound-message.view.js';
import { outboundMessageColumns } from '../mail.policies.js';
import { OutboxRepository } from '../outbox.repository.js';
import { ListOutboxQuery } from './list-outbox.query.js';

@QueryHandler(ListOutboxQuery)
export class ListOutboxHandler implements IQueryHandler<ListOutboxQuery> {
  constructor(
    private readonly outbox: OutboxRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, page }: ListOutboxQuery): Promise<OutboundMessageView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'OutboundMessage', outboundMessageColumns);
    const rows = await this.outbox.page(readable, page.limit ?? DEFAULT_PAGE_SIZE, page.offset ?? 0);
    return rows.map(toOutboundMessageView);
  }
}
