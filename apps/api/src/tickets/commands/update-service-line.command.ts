import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { UpdateServiceLineDto } from '../dto/update-service-line.dto.js';

export class UpdateServiceLineCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: UpdateServiceLineDto,
    readonly lineId: string,
  ) {
    super();
  }
}
