import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';

export class GetTicketQuery extends Query<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
  ) {
    super();
  }
}
