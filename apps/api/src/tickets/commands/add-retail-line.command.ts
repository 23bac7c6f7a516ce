import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { AddRetailLineDto } from '../dto/add-retail-line.dto.js';

export class AddRetailLineCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: AddRetailLineDto,
  ) {
    super();
  }
}
