import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayPeriodsView } from '../dto/pay-schedule.view.js';

export class ListPayPeriodsQuery extends Query<PayPeriodsView> {
  constructor(
    readonly user: AuthUser,
    readonly today: string,
  ) {
    super();
  }
}
