import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { levels } from '@tressury/schema';
import { asc } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { type LevelView, toLevelView } from '../dto/level.view.js';
import { ListLevelsQuery } from './list-levels.query.js';

@QueryHandler(ListLevelsQuery)
export class ListLevelsHandler implements IQueryHandler<ListLevelsQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user }: ListLevelsQuery): Promise<LevelView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Catalogue', { organisationId: levels.organisationId });
    const rows = await this.database.db.select().from(levels).where(readable).orderBy(asc(levels.rank), asc(levels.name));
    return rows.map(toLevelView);
  }
}
