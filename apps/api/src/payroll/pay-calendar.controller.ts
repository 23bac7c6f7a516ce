import { Body, Controller, Get, Post, Put } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { CreatePayPeriodCommand } from './commands/create-pay-period.command.js';
import { SetPayScheduleCommand } from './commands/set-pay-schedule.command.js';
import { CreatePayPeriodDto } from './dto/create-pay-period.dto.js';
import { PayPeriodsView, PayPeriodView, PayScheduleView } from './dto/pay-schedule.view.js';
import { SetPayScheduleDto } from './dto/set-pay-schedule.dto.js';
import { ListPayPeriodsQuery } from './queries/list-pay-periods.query.js';

const todayUtc = (): string => new Date().toISOString().slice(0, 10);

@ApiTags('payroll')
@ApiBearerAuth()
@Controller('payroll')
export class PayCalendarController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** Sets the pay frequency, anchor date and workweek start; fixed once the first period exists (owner). */
  @Put('schedule')
  @CheckPolicies('update', 'PaySchedule')
  setSchedule(@CurrentUser() user: AuthUser, @Body() body: SetPayScheduleDto): Promise<PayScheduleView> {
    return this.commands.execute(new SetPayScheduleCommand(user, body));
  }

  /** The schedule, the period holding today, the next one to create, and the stored periods with their runs. */
  @Get('periods')
  @CheckPolicies('read', 'PaySchedule')
  listPeriods(@CurrentUser() user: AuthUser): Promise<PayPeriodsView> {
    return this.queries.execute(new ListPayPeriodsQuery(user, todayUtc()));
  }

  /** Creates the next pay period, or the one holding `date` (owner, accountant). */
  @Post('periods')
  @CheckPolicies('create', 'PaySchedule')
  createPeriod(@CurrentUser() user: AuthUser, @Body() body: CreatePayPeriodDto): Promise<PayPeriodView> {
    return this.commands.execute(new CreatePayPeriodCommand(user, body.date, todayUtc()));
  }
}
