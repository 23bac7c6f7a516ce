import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ServiceView } from '../dto/service.view.js';

export class GetServiceQuery extends Query<ServiceView> {
  constructor(
    readonly user: AuthUser,
    readonly serviceId: string,
  ) {
    super();
  }
}
