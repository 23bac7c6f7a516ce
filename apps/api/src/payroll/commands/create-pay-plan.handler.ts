import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type PayPlanView, toPayPlanView } from '../dto/pay-plan.view.js';
import { PayPlanCreated } from '../events/pay-plan-created.js';
import { PayPlansRepository } from '../pay-plans.repository.js';
import { payPlanNameTaken, payPlanNotFound, scheduleMissing } from '../payroll-errors.js';
import { checkPlanTerms, versionValues } from '../plan-terms.js';
import { CreatePayPlanCommand } from './create-pay-plan.command.js';

@CommandHandler(CreatePayPlanCommand)
export class CreatePayPlanHandler implements ICommandHandler<CreatePayPlanCommand> {
  constructor(
    private readonly database: Database,
    private readonly plans: PayPlansRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreatePayPlanCommand): Promise<PayPlanView> {
    const ability = this.abilities.createFor(user);
    assertCan(ability, user.role, 'create', 'PayPlan', { organisationId: user.organisationId }, payPlanNotFound);
    return this.database.transaction(async () => {
      const schedule = await this.plans.schedule(user.organisationId);
      if (!schedule) throw scheduleMissing();
      checkPlanTerms(input.terms, schedule, 'terms');
      if (await this.plans.nameTaken(user.organisationId, input.name)) throw payPlanNameTaken(input.name);
      const plan = await this.plans.insertPlan({ organisationId: user.organisationId, name: input.name });
      const version = await this.plans.insertVersion(versionValues(plan.id, input.terms, user.id));
      const view = toPayPlanView(plan, [version], []);
      await this.events.append(new PayPlanCreated(user.organisationId, plan.id, user.id, { after: view }));
      return view;
    });
  }
}
