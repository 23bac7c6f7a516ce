import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ClientDetailView } from '../dto/client.view.js';

export class GetClientQuery extends Query<ClientDetailView> {
  constructor(
    readonly user: AuthUser,
    readonly clientId: string,
  ) {
    super();
  }
}
