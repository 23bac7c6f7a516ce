import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreatePayPlanDto } from '../dto/create-pay-plan.dto.js';
import type { PayPlanView } from '../dto/pay-plan.view.js';

export class CreatePayPlanCommand extends Command<PayPlanView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreatePayPlanDto,
  ) {
    super();
  }
}
