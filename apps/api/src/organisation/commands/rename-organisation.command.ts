import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { OrganisationView } from '../dto/organisation.view.js';

export class RenameOrganisationCommand extends Command<OrganisationView> {
  constructor(
    readonly user: AuthUser,
    readonly name: string,
  ) {
    super();
  }
}
