import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayPeriodView } from '../dto/pay-schedule.view.js';

export class CreatePayPeriodCommand extends Command<PayPeriodView> {
  constructor(
    readonly user: AuthUser,
    /** A day inside the period to create, or undefined for the next one. */
    readonly date: string | undefined,
    readonly today: string,
  ) {
    super();
  }
}
