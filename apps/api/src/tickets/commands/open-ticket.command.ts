import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { OpenTicketDto } from '../dto/open-ticket.dto.js';
import type { TicketView } from '../dto/ticket.view.js';

export class OpenTicketCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly input: OpenTicketDto,
  ) {
    super();
  }
}
