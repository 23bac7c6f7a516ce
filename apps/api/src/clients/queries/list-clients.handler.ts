import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { branches, clients } from '@tressury/schema';
import { and, asc, count, eq, ilike, or, type SQL, sql } from 'drizzle-orm';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { Database } from '../../database/database.js';
import { clientColumns } from '../clients.policies.js';
import { type ClientPageView, toClientView } from '../dto/client.view.js';
import { DEFAULT_PAGE_SIZE } from '../../common/page-query.dto.js';
import { ListClientsQuery } from './list-clients.query.js';

// LIKE treats % and _ as wildcards and \ as its escape: a search for "50%" means those characters.
const likeContaining = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

function matching(search: string): SQL {
  const pattern = likeContaining(search);
  const conditions = [
    ilike(clients.firstName, pattern),
    ilike(clients.lastName, pattern),
    sql`(${clients.firstName} || ' ' || ${clients.lastName}) ilike ${pattern}`,
    ilike(clients.email, pattern),
    ilike(clients.phone, pattern),
  ];
  // "555 0142" finds "(555) 014-2" too: phones are compared on their digits.
  const digits = search.replace(/\D/g, '');
  if (digits.length >= 3) conditions.push(sql`regexp_replace(coalesce(${clients.phone}, ''), '[^0-9]', '', 'g') like ${`%${digits}%`}`);
  return or(...conditions)!;
}

@QueryHandler(ListClientsQuery)
export class ListClientsHandler implements IQueryHandler<ListClientsQuery> {
  constructor(
    private readonly database: Database,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, filter }: ListClientsQuery): Promise<ClientPageView> {
    const limit = filter.limit ?? DEFAULT_PAGE_SIZE;
    const offset = filter.offset ?? 0;
    const where = and(
      accessibleBy(this.abilities.createFor(user), 'read', 'Client', clientColumns),
      filter.branchId ? eq(clients.homeBranchId, filter.branchId) : undefined,
      filter.search ? matching(filter.search) : undefined,
    );
    const db = this.database.db;
    const [rows, [totals]] = await Promise.all([
      db
        .select({ client: clients, branchName: branches.name })
        .from(clients)
        .innerJoin(branches, eq(branches.id, clients.homeBranchId))
        .where(where)
        .orderBy(asc(sql`lower(${clients.lastName})`), asc(sql`lower(${clients.firstName})`), asc(clients.id))
        .limit(limit)
        .offset(offset),
      db.select({ total: count() }).from(clients).where(where),
    ]);
    return { items: rows.map((row) => toClientView(row.client, row.branchName)), total: totals?.total ?? 0, limit, offset };
  }
}
