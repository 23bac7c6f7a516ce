import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayrollRunView } from '../dto/payroll-run.view.js';

export class StartPayrollRunCommand extends Command<PayrollRunView> {
  constructor(
    readonly user: AuthUser,
    readonly periodId: string,
  ) {
    super();
  }
}
