import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { ValidationFailedError } from '../../common/validation-failed.error.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { serviceNameTaken, serviceNotFound } from '../catalogue-errors.js';
import { definedOnly, refuseNulls } from '../patch-fields.js';
import type { ServiceView } from '../dto/service.view.js';
import { ServiceUpdated } from '../events/service-updated.js';
import { LevelsRepository } from '../levels.repository.js';
import { priceProblems } from '../service-prices.js';
import { ServicesRepository } from '../services.repository.js';
import { UpdateServiceCommand } from './update-service.command.js';

@CommandHandler(UpdateServiceCommand)
export class UpdateServiceHandler implements ICommandHandler<UpdateServiceCommand> {
  constructor(
    private readonly database: Database,
    private readonly services: ServicesRepository,
    private readonly levels: LevelsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, serviceId, changes }: UpdateServiceCommand): Promise<ServiceView> {
    const ability = this.abilities.createFor(user);
    refuseNulls(changes);
    const { prices: sentPrices, ...fields } = changes;
    const prices = sentPrices?.map(({ levelId, price }) => ({ levelId, price }));
    return this.database.transaction(async () => {
      const current = await this.services.findInOrganisation(user.organisationId, serviceId);
      if (!current) throw serviceNotFound();
      assertCan(ability, user.role, 'update', 'Catalogue', current, serviceNotFound);
      if (prices) {
        const levelIds = new Set((await this.levels.listInOrganisation(user.organisationId)).map((level) => level.id));
        const problems = priceProblems(prices, levelIds);
        if (problems.length > 0) throw new ValidationFailedError(problems);
      }
      if (fields.name !== undefined && (await this.services.nameTaken(user.organisationId, fields.name, serviceId))) {
        throw serviceNameTaken(fields.name);
      }
      const before = await this.services.view(serviceId);
      const sent = definedOnly(fields);
      if (Object.keys(sent).length === 0 && !prices) return before;
      await this.services.update(serviceId, sent);
      if (prices) await this.services.replacePrices(serviceId, prices);
      const after = await this.services.view(serviceId);
      await this.events.append(new ServiceUpdated(user.organisationId, serviceId, user.id, before, after));
      return after;
    });
  }
}
