import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { branches } from '@tressury/schema';
import { asc } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { type BranchView, toBranchView } from '../dto/branch.view.js';
import { ListBranchesQuery } from './list-branches.query.js';

@QueryHandler(ListBranchesQuery)
export class ListBranchesHandler implements IQueryHandler<ListBranchesQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user }: ListBranchesQuery): Promise<BranchView[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Branch', {
      id: branches.id,
      organisationId: branches.organisationId,
    });
    const rows = await this.database.db.select().from(branches).where(readable).orderBy(asc(branches.name));
    return rows.map(toBranchView);
  }
}
