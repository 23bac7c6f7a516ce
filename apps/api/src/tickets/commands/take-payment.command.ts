import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { TakePaymentDto } from '../dto/take-payment.dto.js';

export class TakePaymentCommand extends Command<TicketView> {
  constructor(
    readonly user: AuthUser,
    readonly ticketId: string,
    readonly input: TakePaymentDto,
  ) {
    super();
  }
}
