import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { AssignPayPlanDto } from '../dto/assign-pay-plan.dto.js';
import type { PayPlanView } from '../dto/pay-plan.view.js';

export class AssignPayPlanCommand extends Command<PayPlanView> {
  constructor(
    readonly user: AuthUser,
    readonly planId: string,
    readonly input: AssignPayPlanDto,
  ) {
    super();
  }
}
