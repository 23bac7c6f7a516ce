import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { payPlans } from '@tressury/schema';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { type PayPlanView, toPayPlanView } from '../dto/pay-plan.view.js';
import { PayPlansRepository } from '../pay-plans.repository.js';
import { ListPayPlansQuery } from './list-pay-plans.query.js';

@QueryHandler(ListPayPlansQuery)
export class ListPayPlansHandler implements IQueryHandler<ListPayPlansQuery> {
  constructor(
    private readonly plans: PayPlansRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user }: ListPayPlansQuery): Promise<PayPlanView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'PayPlan', { organisationId: payPlans.organisationId });
    const rows = await this.plans.listPlans(readable);
    const ids = rows.map((r) => r.id);
    const versions = await this.plans.versionsOf(ids);
    const assignments = await this.plans.assignmentsOf(ids);
    return rows.map((plan) =>
      toPayPlanView(
        plan,
        versions.filter((v) => v.planId === plan.id),
        assignments.filter((a) => a.planId === plan.id),
      ),
    );
  }
}
