import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { branches } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { branchNotFound } from '../branch-errors.js';
import { type BranchView, toBranchView } from '../dto/branch.view.js';
import { GetBranchQuery } from './get-branch.query.js';

@QueryHandler(GetBranchQuery)
export class GetBranchHandler implements IQueryHandler<GetBranchQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, branchId }: GetBranchQuery): Promise<BranchView> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Branch', {
      id: branches.id,
      organisationId: branches.organisationId,
    });
    const [row] = await this.database.db.select().from(branches).where(and(eq(branches.id, branchId), readable));
    if (!row) throw branchNotFound();
    return toBranchView(row);
  }
}
