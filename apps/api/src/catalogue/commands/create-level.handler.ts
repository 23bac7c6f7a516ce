import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { levelNameTaken, levelNotFound } from '../catalogue-errors.js';
import { type LevelView, toLevelView } from '../dto/level.view.js';
import { LevelCreated } from '../events/level-created.js';
import { LevelsRepository } from '../levels.repository.js';
import { CreateLevelCommand } from './create-level.command.js';

@CommandHandler(CreateLevelCommand)
export class CreateLevelHandler implements ICommandHandler<CreateLevelCommand> {
  constructor(
    private readonly database: Database,
    private readonly levels: LevelsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateLevelCommand): Promise<LevelView> {
    assertCan(this.abilities.createFor(user), user.role, 'create', 'Catalogue', { organisationId: user.organisationId }, levelNotFound);
    return this.database.transaction(async () => {
      if (await this.levels.nameTaken(user.organisationId, input.name)) throw levelNameTaken(input.name);
      const row = await this.levels.insert({ organisationId: user.organisationId, name: input.name, rank: input.rank });
      const view = toLevelView(row);
      await this.events.append(new LevelCreated(user.organisationId, row.id, user.id, view));
      return view;
    });
  }
}
