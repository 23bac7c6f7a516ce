import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayrollLineDetailView } from '../dto/payroll-run.view.js';

export class GetPayrollLineQuery extends Query<PayrollLineDetailView> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
    readonly lineId: string,
  ) {
    super();
  }
}
