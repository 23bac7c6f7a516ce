import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { payPeriodAfter, payPeriodContaining } from '@tressury/domain';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayPeriodView, toPayPeriodView } from '../dto/pay-schedule.view.js';
import { PayPeriodCreated } from '../events/pay-period-created.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { payPeriodExists, payPeriodNotFound, scheduleMissing } from '../payroll-errors.js';
import { CreatePayPeriodCommand } from './create-pay-period.command.js';

@CommandHandler(CreatePayPeriodCommand)
export class CreatePayPeriodHandler implements ICommandHandler<CreatePayPeriodCommand> {
  constructor(
    private readonly database: Database,
    private readonly calendar: PayCalendarRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, date, today }: CreatePayPeriodCommand): Promise<PayPeriodView> {
    const ability = this.abilities.createFor(user);
    assertCan(ability, user.role, 'create', 'PaySchedule', { organisationId: user.organisationId }, payPeriodNotFound);
    return this.database.transaction(async () => {
      const schedule = await this.calendar.schedule(user.organisationId);
      if (!schedule) throw scheduleMissing();
      const [latest] = await this.calendar.latestPeriods(user.organisationId, 1);
      const range = date ? payPeriodContaining(schedule, date) : latest ? payPeriodAfter(schedule, latest) : payPeriodContaining(schedule, today);
      if (await this.calendar.periodStarting(user.organisationId, range.startDate)) throw payPeriodExists(range.startDate);
      const row = await this.calendar.insertPeriod({ organisationId: user.organisationId, ...range });
      const view = toPayPeriodView(row, null);
      await this.events.append(new PayPeriodCreated(user.organisationId, row.id, user.id, { after: view }));
      return view;
    });
  }
}
