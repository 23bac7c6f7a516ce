import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { RecordBowlDto } from '../dto/record-bowl.dto.js';

export class RecordBowlCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: RecordBowlDto,
  ) {
    super();
  }
}
