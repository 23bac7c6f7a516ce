import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { AddServiceLineDto } from '../dto/add-service-line.dto.js';

export class AddServiceLineCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: AddServiceLineDto,
  ) {
    super();
  }
}
