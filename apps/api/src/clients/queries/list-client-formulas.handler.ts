import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { bowlComponents, bowls, branches, staff, ticketServiceLines, tickets } from '@tressury/schema';
import Big from 'big.js';
import { and, asc, count, desc, eq, inArray, ne } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { clientNotFound } from '../client-errors.js';
import { seesBowlCosts } from '../clients.policies.js';
import { ClientsRepository } from '../clients.repository.js';
import type { FormulaComponentView, FormulaPageView, FormulaView } from '../dto/formula.view.js';
import { DEFAULT_PAGE_SIZE } from '../../common/page-query.dto.js';
import { ListClientFormulasQuery } from './list-client-formulas.query.js';

// Grams are numeric(12,3) in the database ("60.000"); "60" reads better and is the same quantity.
const plain = (value: string): string => new Big(value).toString();
const mixer = alias(staff, 'mixer');

@QueryHandler(ListClientFormulasQuery)
export class ListClientFormulasHandler implements IQueryHandler<ListClientFormulasQuery> {
  constructor(
    private readonly database: Database,
    private readonly clients: ClientsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, clientId, page }: ListClientFormulasQuery): Promise<FormulaPageView> {
    // The whole history is readable by whoever reads the client: a colourist needs every earlier formula.
    const client = await this.clients.find(user.organisationId, clientId);
    if (!client) throw clientNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'Client', client, clientNotFound);
    const limit = page.limit ?? DEFAULT_PAGE_SIZE;
    const offset = page.offset ?? 0;
    // A voided ticket may have been opened for the wrong client, so its bowls are not this client's history.
    const ofClient = and(eq(tickets.clientId, clientId), ne(tickets.status, 'void'));
    const db = this.database.db;
    const [rows, [totals]] = await Promise.all([
      db
        .select({
          bowl: bowls,
          date: tickets.businessDate,
          branchName: branches.name,
          serviceName: ticketServiceLines.serviceName,
          stylistName: staff.displayName,
          mixedByName: mixer.displayName,
        })
        .from(bowls)
        .innerJoin(ticketServiceLines, eq(ticketServiceLines.id, bowls.serviceLineId))
        .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
        .innerJoin(branches, eq(branches.id, tickets.branchId))
        .innerJoin(staff, eq(staff.id, ticketServiceLines.staffId))
        .innerJoin(mixer, eq(mixer.id, bowls.mixedByStaffId))
        .where(ofClient)
        .orderBy(desc(tickets.businessDate), desc(bowls.createdAt), desc(bowls.id))
        .limit(limit)
        .offset(offset),
      db
        .select({ total: count() })
        .from(bowls)
        .innerJoin(ticketServiceLines, eq(ticketServiceLines.id, bowls.serviceLineId))
        .innerJoin(tickets, eq(tickets.id, ticketServiceLines.ticketId))
        .where(ofClient),
    ]);
    const components = new Map<string, FormulaComponentView[]>();
    if (rows.length > 0) {
      const componentRows = await db
        .select()
        .from(bowlComponents)
        .where(
          inArray(
            bowlComponents.bowlId,
            rows.map((row) => row.bowl.id),
          ),
        )
        .orderBy(asc(bowlComponents.position));
      for (const component of componentRows) {
        const list = components.get(component.bowlId) ?? [];
        list.push({
          productName: component.productName,
          kind: component.kind,
          grams: plain(component.grams),
          developerVolume: component.developerVolume === null ? null : plain(component.developerVolume),
        });
        components.set(component.bowlId, list);
      }
    }
    const withCost = seesBowlCosts(user.role);
    const items = rows.map(({ bowl, ...row }): FormulaView => ({
      id: bowl.id,
      date: row.date,
      branchName: row.branchName,
      serviceName: row.serviceName,
      stylistName: row.stylistName,
      mixedByName: row.mixedByName,
      components: components.get(bowl.id) ?? [],
      totalGrams: plain(bowl.totalGrams),
      leftoverGrams: plain(bowl.leftoverGrams),
      processingMinutes: bowl.processingMinutes,
      ratio: bowl.ratio,
      developerVolume: bowl.developerVolume,
      note: bowl.note,
      ...(withCost ? { cost: bowl.cost } : {}),
    }));
    return { items, total: totals?.total ?? 0, limit, offset };
  }
}
