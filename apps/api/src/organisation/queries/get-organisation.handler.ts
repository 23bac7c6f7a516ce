import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { organisations } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import { Database } from '../../database/database.js';
import { type OrganisationView, toOrganisationView } from '../dto/organisation.view.js';
import { organisationNotFound } from '../organisation-errors.js';
import { GetOrganisationQuery } from './get-organisation.query.js';

@QueryHandler(GetOrganisationQuery)
export class GetOrganisationHandler implements IQueryHandler<GetOrganisationQuery> {
  constructor(private readonly database: Database) {}

  // Every role may read its own organisation (organisation.policies.ts), so the token's organisation is the filter.
  async execute({ user }: GetOrganisationQuery): Promise<OrganisationView> {
    const [row] = await this.database.db.select().from(organisations).where(eq(organisations.id, user.organisationId));
    if (!row) throw organisationNotFound();
    return toOrganisationView(row);
  }
}
