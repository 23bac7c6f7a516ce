import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';

export class RemoveTipCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,

    readonly tipId: string,
  ) {
    super();
  }
}
