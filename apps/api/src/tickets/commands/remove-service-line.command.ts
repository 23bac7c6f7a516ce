import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';

export class RemoveServiceLineCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,

    readonly lineId: string,
  ) {
    super();
  }
}
