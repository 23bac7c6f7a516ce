import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { payPeriodAfter, payPeriodContaining } from '@tressury/domain';
import { type PayPeriodsView, toPayPeriodView, toPayScheduleView } from '../dto/pay-schedule.view.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { ListPayPeriodsQuery } from './list-pay-periods.query.js';

const LISTED = 26;

@QueryHandler(ListPayPeriodsQuery)
export class ListPayPeriodsHandler implements IQueryHandler<ListPayPeriodsQuery> {
  constructor(private readonly calendar: PayCalendarRepository) {}

  async execute({ user, today }: ListPayPeriodsQuery): Promise<PayPeriodsView> {
    const schedule = await this.calendar.schedule(user.organisationId);
    const periods = await this.calendar.latestPeriods(user.organisationId, LISTED);
    const runs = await this.calendar.runsOf(periods.map((p) => p.id));
    const latest = periods[0];
    return {
      schedule: schedule && toPayScheduleView(schedule),
      current: schedule && payPeriodContaining(schedule, today),
      next: schedule && (latest ? payPeriodAfter(schedule, latest) : payPeriodContaining(schedule, today)),
      periods: periods.map((p) => toPayPeriodView(p, runs.get(p.id) ?? null)),
    };
  }
}
