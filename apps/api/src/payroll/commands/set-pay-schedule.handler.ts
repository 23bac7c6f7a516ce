import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayScheduleView, toPayScheduleView } from '../dto/pay-schedule.view.js';
import { PayScheduleSet } from '../events/pay-schedule-set.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { payPeriodNotFound, scheduleInUse } from '../payroll-errors.js';
import { SetPayScheduleCommand } from './set-pay-schedule.command.js';

/** Sets how pay periods fall; fixed once the first period exists, because periods and plan dates rest on it. */
@CommandHandler(SetPayScheduleCommand)
export class SetPayScheduleHandler implements ICommandHandler<SetPayScheduleCommand> {
  constructor(
    private readonly database: Database,
    private readonly calendar: PayCalendarRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: SetPayScheduleCommand): Promise<PayScheduleView> {
    const ability = this.abilities.createFor(user);
    assertCan(ability, user.role, 'update', 'PaySchedule', { organisationId: user.organisationId }, payPeriodNotFound);
    return this.database.transaction(async () => {
      const before = await this.calendar.schedule(user.organisationId);
      if (before && (await this.calendar.hasPeriods(user.organisationId))) throw scheduleInUse();
      const row = await this.calendar.saveSchedule({
        organisationId: user.organisationId,
        frequency: input.frequency,
        anchorDate: input.anchorDate,
        workweekStartsOn: input.workweekStartsOn,
      });
      const after = toPayScheduleView(row);
      await this.events.append(new PayScheduleSet(user.organisationId, user.organisationId, user.id, { before: before && toPayScheduleView(before), after }));
      return after;
    });
  }
}
