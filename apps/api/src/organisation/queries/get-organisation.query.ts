import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { OrganisationView } from '../dto/organisation.view.js';

export class GetOrganisationQuery extends Query<OrganisationView> {
  constructor(readonly user: AuthUser) {
    super();
  }
}
