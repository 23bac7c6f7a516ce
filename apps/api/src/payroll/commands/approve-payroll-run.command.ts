import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayrollRunView } from '../dto/payroll-run.view.js';

export class ApprovePayrollRunCommand extends Command<PayrollRunView> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
  ) {
    super();
  }
}
