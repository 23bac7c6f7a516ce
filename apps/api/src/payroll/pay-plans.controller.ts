import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { AddPayPlanVersionCommand } from './commands/add-pay-plan-version.command.js';
import { AssignPayPlanCommand } from './commands/assign-pay-plan.command.js';
import { CreatePayPlanCommand } from './commands/create-pay-plan.command.js';
import { AssignPayPlanDto } from './dto/assign-pay-plan.dto.js';
import { CreatePayPlanDto } from './dto/create-pay-plan.dto.js';
import { PayPlanTermsDto } from './dto/pay-plan-terms.dto.js';
import { PayPlanView } from './dto/pay-plan.view.js';
import { GetPayPlanQuery } from './queries/get-pay-plan.query.js';
import { ListPayPlansQuery } from './queries/list-pay-plans.query.js';

@ApiTags('payroll')
@ApiBearerAuth()
@Controller('payroll/plans')
export class PayPlansController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** Commission plans with every version of their terms and who is on them (owner, accountant). */
  @Get()
  @CheckPolicies('read', 'PayPlan')
  list(@CurrentUser() user: AuthUser): Promise<PayPlanView[]> {
    return this.queries.execute(new ListPayPlansQuery(user));
  }

  @Get(':id')
  @CheckPolicies('read', 'PayPlan')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<PayPlanView> {
    return this.queries.execute(new GetPayPlanQuery(user, id));
  }

  /** A new plan with its first terms, effective from the first day of a pay period (owner). */
  @Post()
  @CheckPolicies('create', 'PayPlan')
  create(@CurrentUser() user: AuthUser, @Body() body: CreatePayPlanDto): Promise<PayPlanView> {
    return this.commands.execute(new CreatePayPlanCommand(user, body));
  }

  /** New terms from a later pay period; runs already computed keep the terms they stored (owner). */
  @Post(':id/versions')
  @CheckPolicies('update', 'PayPlan')
  addVersion(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: PayPlanTermsDto): Promise<PayPlanView> {
    return this.commands.execute(new AddPayPlanVersionCommand(user, id, body));
  }

  /** Puts a staff member on this plan from the first day of a pay period (owner). */
  @Post(':id/assignments')
  @CheckPolicies('update', 'PayPlan')
  assign(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: AssignPayPlanDto): Promise<PayPlanView> {
    return this.commands.execute(new AssignPayPlanCommand(user, id, body));
  }
}
