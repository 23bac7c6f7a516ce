import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayrollRunView } from '../dto/payroll-run.view.js';

export class StartPayrollRunCommand extends Command<PayrollRunView> {
  constructor(
    readonly user: AuthUser,
    readonly periodId: string,
    /** Compute before answering instead of in the background (the demo's payroll history); the HTTP route never waits. */
    readonly wait = false,
  ) {
    super();
  }
}
