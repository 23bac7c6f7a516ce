import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayrollLineView } from '../dto/payroll-run.view.js';

export class ListPayrollLinesQuery extends Query<PayrollLineView[]> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
  ) {
    super();
  }
}
