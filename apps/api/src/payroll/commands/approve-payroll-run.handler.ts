import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayrollRunView, toPayrollRunView } from '../dto/payroll-run.view.js';
import { PayrollRunApproved } from '../events/payroll-run-approved.js';
import { payrollRunFrozen, payrollRunNotDraft, payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { ApprovePayrollRunCommand } from './approve-payroll-run.command.js';

/** Freezes a draft: its stored inputs and figures are final, and every later change answers 409. */
@CommandHandler(ApprovePayrollRunCommand)
export class ApprovePayrollRunHandler implements ICommandHandler<ApprovePayrollRunCommand> {
  constructor(
    private readonly database: Database,
    private readonly runs: PayrollRunsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, runId }: ApprovePayrollRunCommand): Promise<PayrollRunView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const found = await this.runs.findRun(user.organisationId, runId, true);
      if (!found) throw payrollRunNotFound();
      assertCan(ability, user.role, 'update', 'PayrollRun', found.run, payrollRunNotFound);
      if (found.run.status === 'approved' || found.run.status === 'exported') throw payrollRunFrozen(found.run.status);
      if (found.run.status !== 'draft') throw payrollRunNotDraft(found.run.status);
      const run = await this.runs.updateRun(runId, { status: 'approved', approvedById: user.id, approvedAt: new Date() });
      await this.events.append(new PayrollRunApproved(user.organisationId, runId, user.id, { periodId: run.periodId, grossPay: run.grossPay }));
      return toPayrollRunView(run, found.period);
    });
  }
}
