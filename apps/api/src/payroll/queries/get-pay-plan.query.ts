import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayPlanView } from '../dto/pay-plan.view.js';

export class GetPayPlanQuery extends Query<PayPlanView> {
  constructor(
    readonly user: AuthUser,
    readonly planId: string,
  ) {
    super();
  }
}
