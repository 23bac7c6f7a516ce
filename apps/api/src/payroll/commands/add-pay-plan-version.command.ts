import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayPlanTermsDto } from '../dto/pay-plan-terms.dto.js';
import type { PayPlanView } from '../dto/pay-plan.view.js';

export class AddPayPlanVersionCommand extends Command<PayPlanView> {
  constructor(
    readonly user: AuthUser,
    readonly planId: string,
    readonly terms: PayPlanTermsDto,
  ) {
    super();
  }
}
