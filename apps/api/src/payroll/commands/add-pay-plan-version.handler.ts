import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayPlanView, toPayPlanVersionView, toPayPlanView } from '../dto/pay-plan.view.js';
import { PayPlanVersionAdded } from '../events/pay-plan-version-added.js';
import { PayPlansRepository } from '../pay-plans.repository.js';
import { payPlanNotFound, payPlanVersionExists, scheduleMissing, termsBeforeFrozen } from '../payroll-errors.js';
import { checkPlanTerms, versionValues } from '../plan-terms.js';
import { AddPayPlanVersionCommand } from './add-pay-plan-version.command.js';

/** New terms from a pay period on; runs already computed keep the terms they stored. */
@CommandHandler(AddPayPlanVersionCommand)
export class AddPayPlanVersionHandler implements ICommandHandler<AddPayPlanVersionCommand> {
  constructor(
    private readonly database: Database,
    private readonly plans: PayPlansRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, planId, terms }: AddPayPlanVersionCommand): Promise<PayPlanView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const plan = await this.plans.findPlan(user.organisationId, planId, true);
      if (!plan) throw payPlanNotFound();
      assertCan(ability, user.role, 'update', 'PayPlan', plan, payPlanNotFound);
      const schedule = await this.plans.schedule(user.organisationId);
      if (!schedule) throw scheduleMissing();
      checkPlanTerms(terms, schedule);
      const frozenThrough = await this.plans.frozenThrough(user.organisationId);
      if (frozenThrough && terms.effectiveFrom <= frozenThrough) throw termsBeforeFrozen(terms.effectiveFrom, frozenThrough);
      const versions = await this.plans.versionsOf([plan.id]);
      if (versions.some((v) => v.effectiveFrom === terms.effectiveFrom)) throw payPlanVersionExists(terms.effectiveFrom);
      const version = await this.plans.insertVersion(versionValues(plan.id, terms, user.id));
      await this.events.append(new PayPlanVersionAdded(user.organisationId, plan.id, user.id, { after: toPayPlanVersionView(version) }));
      const all = await this.plans.versionsOf([plan.id]);
      return toPayPlanView(plan, all, await this.plans.assignmentsOf([plan.id]));
    });
  }
}
