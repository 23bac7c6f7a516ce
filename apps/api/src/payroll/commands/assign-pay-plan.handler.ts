import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { isPeriodStart } from '@tressury/domain';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayPlanView, toPayPlanView } from '../dto/pay-plan.view.js';
import { PayPlanAssigned } from '../events/pay-plan-assigned.js';
import { PayPlansRepository } from '../pay-plans.repository.js';
import { assignmentExists, notPeriodStart, payPlanNotFound, scheduleMissing, staffNotFound, termsBeforeFrozen } from '../payroll-errors.js';
import { AssignPayPlanCommand } from './assign-pay-plan.command.js';

@CommandHandler(AssignPayPlanCommand)
export class AssignPayPlanHandler implements ICommandHandler<AssignPayPlanCommand> {
  constructor(
    private readonly database: Database,
    private readonly plans: PayPlansRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, planId, input }: AssignPayPlanCommand): Promise<PayPlanView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const plan = await this.plans.findPlan(user.organisationId, planId, true);
      if (!plan) throw payPlanNotFound();
      assertCan(ability, user.role, 'update', 'PayPlan', plan, payPlanNotFound);
      const member = await this.plans.findStaff(user.organisationId, input.staffId);
      if (!member) throw staffNotFound();
      const schedule = await this.plans.schedule(user.organisationId);
      if (!schedule) throw scheduleMissing();
      if (!isPeriodStart(schedule, input.effectiveFrom)) throw notPeriodStart(input.effectiveFrom, 'effectiveFrom');
      const frozenThrough = await this.plans.frozenThrough(user.organisationId);
      if (frozenThrough && input.effectiveFrom <= frozenThrough) throw termsBeforeFrozen(input.effectiveFrom, frozenThrough);
      if (await this.plans.assignmentOn(member.id, input.effectiveFrom)) throw assignmentExists(input.effectiveFrom);
      await this.plans.insertAssignment({ organisationId: user.organisationId, staffId: member.id, planId: plan.id, effectiveFrom: input.effectiveFrom, createdById: user.id });
      await this.events.append(new PayPlanAssigned(user.organisationId, plan.id, user.id, { staffId: member.id, effectiveFrom: input.effectiveFrom }));
      return toPayPlanView(plan, await this.plans.versionsOf([plan.id]), await this.plans.assignmentsOf([plan.id]));
    });
  }
}
