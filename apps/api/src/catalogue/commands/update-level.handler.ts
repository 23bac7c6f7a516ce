import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { levelNameTaken, levelNotFound } from '../catalogue-errors.js';
import { definedOnly, refuseNulls } from '../patch-fields.js';
import { type LevelView, toLevelView } from '../dto/level.view.js';
import { LevelUpdated } from '../events/level-updated.js';
import { LevelsRepository } from '../levels.repository.js';
import { UpdateLevelCommand } from './update-level.command.js';

@CommandHandler(UpdateLevelCommand)
export class UpdateLevelHandler implements ICommandHandler<UpdateLevelCommand> {
  constructor(
    private readonly database: Database,
    private readonly levels: LevelsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, levelId, changes }: UpdateLevelCommand): Promise<LevelView> {
    const ability = this.abilities.createFor(user);
    refuseNulls(changes);
    return this.database.transaction(async () => {
      const current = await this.levels.findInOrganisation(user.organisationId, levelId);
      if (!current) throw levelNotFound();
      assertCan(ability, user.role, 'update', 'Catalogue', current, levelNotFound);
      if (changes.name !== undefined && (await this.levels.nameTaken(user.organisationId, changes.name, levelId))) {
        throw levelNameTaken(changes.name);
      }
      const sent = definedOnly({ name: changes.name, rank: changes.rank });
      if (Object.keys(sent).length === 0) return toLevelView(current);
      const after = toLevelView(await this.levels.update(levelId, sent));
      await this.events.append(new LevelUpdated(user.organisationId, levelId, user.id, toLevelView(current), after));
      return after;
    });
  }
}
