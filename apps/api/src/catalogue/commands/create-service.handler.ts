import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { ValidationFailedError } from '../../common/validation-failed.error.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { serviceNameTaken, serviceNotFound } from '../catalogue-errors.js';
import type { ServiceView } from '../dto/service.view.js';
import { ServiceCreated } from '../events/service-created.js';
import { LevelsRepository } from '../levels.repository.js';
import { priceProblems } from '../service-prices.js';
import { ServicesRepository } from '../services.repository.js';
import { CreateServiceCommand } from './create-service.command.js';

@CommandHandler(CreateServiceCommand)
export class CreateServiceHandler implements ICommandHandler<CreateServiceCommand> {
  constructor(
    private readonly database: Database,
    private readonly services: ServicesRepository,
    private readonly levels: LevelsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateServiceCommand): Promise<ServiceView> {
    assertCan(this.abilities.createFor(user), user.role, 'create', 'Catalogue', { organisationId: user.organisationId }, serviceNotFound);
    const prices = (input.prices ?? []).map(({ levelId, price }) => ({ levelId, price }));
    return this.database.transaction(async () => {
      const levelIds = new Set((await this.levels.listInOrganisation(user.organisationId)).map((level) => level.id));
      const problems = priceProblems(prices, levelIds);
      if (problems.length > 0) throw new ValidationFailedError(problems);
      if (await this.services.nameTaken(user.organisationId, input.name)) throw serviceNameTaken(input.name);
      const row = await this.services.insert({
        organisationId: user.organisationId,
        name: input.name,
        category: input.category,
        durationMinutes: input.durationMinutes,
        isColour: input.isColour ?? false,
      });
      await this.services.replacePrices(row.id, prices);
      const view = await this.services.view(row.id);
      await this.events.append(new ServiceCreated(user.organisationId, row.id, user.id, view));
      return view;
    });
  }
}
