import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { VoidTicketDto } from '../dto/void-ticket.dto.js';

export class VoidTicketCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: VoidTicketDto,
  ) {
    super();
  }
}
