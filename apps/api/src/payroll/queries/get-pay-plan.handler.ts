import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { type PayPlanView, toPayPlanView } from '../dto/pay-plan.view.js';
import { PayPlansRepository } from '../pay-plans.repository.js';
import { payPlanNotFound } from '../payroll-errors.js';
import { GetPayPlanQuery } from './get-pay-plan.query.js';

@QueryHandler(GetPayPlanQuery)
export class GetPayPlanHandler implements IQueryHandler<GetPayPlanQuery> {
  constructor(
    private readonly plans: PayPlansRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, planId }: GetPayPlanQuery): Promise<PayPlanView> {
    const plan = await this.plans.findPlan(user.organisationId, planId);
    if (!plan) throw payPlanNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'PayPlan', plan, payPlanNotFound);
    return toPayPlanView(plan, await this.plans.versionsOf([plan.id]), await this.plans.assignmentsOf([plan.id]));
  }
}
