import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ClientPageView } from '../dto/client.view.js';
import type { ListClientsDto } from '../dto/list-clients.dto.js';

export class ListClientsQuery extends Query<ClientPageView> {
  constructor(
    readonly user: AuthUser,
    readonly filter: ListClientsDto,
  ) {
    super();
  }
}
