import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ListServicesDto } from '../dto/list-services.dto.js';
import type { ServiceView } from '../dto/service.view.js';

export class ListServicesQuery extends Query<ServiceView[]> {
  constructor(
    readonly user: AuthUser,
    readonly filter: ListServicesDto,
  ) {
    super();
  }
}
