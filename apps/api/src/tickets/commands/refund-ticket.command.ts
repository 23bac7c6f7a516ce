import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { RefundTicketDto } from '../dto/refund-ticket.dto.js';

export class RefundTicketCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: RefundTicketDto,
  ) {
    super();
  }
}
