import { Injectable } from '@nestjs/common';
import { branches, organisations, type BranchRow } from '@tressury/schema';
import { and, asc, eq } from 'drizzle-orm';
import type { AuthUser } from '../auth/auth-user.js';
import { AbilityFactory } from '../authz/ability.factory.js';
import { accessibleBy } from '../authz/accessible-by.js';
import { assertCan } from '../authz/refusal.js';
import { Database } from '../database/database.js';
import { CompareFigures } from './compare-figures.js';
import { branchNotFound } from './compare-errors.js';

/** The branches a caller may compare, and the figures reader on the current connection. */
@Injectable()
export class CompareRepository {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  get figures(): CompareFigures {
    return new CompareFigures(this.database.db);
  }

  /** The caller's branches by name: every branch for owners and accountants, the assigned ones for a manager. */
  visibleBranches(user: AuthUser): Promise<BranchRow[]> {
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'BranchFigures', {
      organisationId: branches.organisationId,
      branchId: branches.id,
    });
    return this.database.db.select().from(branches).where(readable).orderBy(asc(branches.name), asc(branches.id));
  }

  /** One branch, or 404 when it does not exist or lies outside the caller's branches. */
  async branch(user: AuthUser, branchId: string): Promise<BranchRow> {
    const [row] = await this.database.db
      .select()
      .from(branches)
      .where(and(eq(branches.organisationId, user.organisationId), eq(branches.id, branchId)));
    if (!row) throw branchNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'BranchFigures', { organisationId: row.organisationId, branchId: row.id }, branchNotFound);
    return row;
  }

  async organisationName(organisationId: string): Promise<string> {
    const [row] = await this.database.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, organisationId));
    return row?.name ?? '';
  }
}
