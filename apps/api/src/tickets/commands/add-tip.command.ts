import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { AddTipDto } from '../dto/add-tip.dto.js';

export class AddTipCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: AddTipDto,
  ) {
    super();
  }
}
