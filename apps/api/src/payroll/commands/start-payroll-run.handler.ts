import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { isStalled, type PayrollRunView, toPayrollRunView } from '../dto/payroll-run.view.js';
import { PayrollRunStarted } from '../events/payroll-run-started.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { PayrollComputation } from '../payroll-computation.js';
import { payPeriodNotFound, payrollRunBusy, payrollRunFrozen, payrollRunNotFound } from '../payroll-errors.js';
import { PayrollRunsRepository } from '../payroll-runs.repository.js';
import { StartPayrollRunCommand } from './start-payroll-run.command.js';

/**
 * Starts (or restarts) the period's draft run; the staff are computed in the background once this commits.
 * A run still computing answers 409, unless it has stalled (its instance stopped renewing the heartbeat):
 * then it is replaced.
 */
@CommandHandler(StartPayrollRunCommand)
export class StartPayrollRunHandler implements ICommandHandler<StartPayrollRunCommand> {
  constructor(
    private readonly database: Database,
    private readonly calendar: PayCalendarRepository,
    private readonly runs: PayrollRunsRepository,
    private readonly computation: PayrollComputation,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, periodId, wait }: StartPayrollRunCommand): Promise<PayrollRunView> {
    const ability = this.abilities.createFor(user);
    const view = await this.database.transaction(async () => {
      const period = await this.calendar.findPeriod(user.organisationId, periodId);
      if (!period) throw payPeriodNotFound();
      assertCan(ability, user.role, 'create', 'PayrollRun', { organisationId: user.organisationId }, payPeriodNotFound);
      const previous = await this.runs.runForPeriod(period.id);
      if (previous?.status === 'approved' || previous?.status === 'exported') throw payrollRunFrozen(previous.status);
      if (previous?.status === 'computing' && !isStalled(previous)) throw payrollRunBusy();
      if (previous) await this.runs.deleteRun(previous.id);
      const run = await this.runs.insertRun({
        organisationId: user.organisationId,
        periodId: period.id,
        status: 'computing',
        startedById: user.id,
        heartbeatAt: new Date(),
      });
      await this.events.append(
        new PayrollRunStarted(user.organisationId, run.id, user.id, {
          periodId: period.id,
          startDate: period.startDate,
          endDate: period.endDate,
          replaces: previous?.id ?? null,
          replacesStalled: previous?.status === 'computing',
        }),
      );
      return toPayrollRunView(run, period);
    });
    if (!wait) {
      this.computation.start(user.organisationId, view.id);
      return view;
    }
    await this.computation.compute(user.organisationId, view.id);
    const done = await this.runs.findRun(user.organisationId, view.id);
    if (!done) throw payrollRunNotFound();
    return toPayrollRunView(done.run, done.period);
  }
}
