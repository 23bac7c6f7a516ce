import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ListStaffDto } from '../dto/list-staff.dto.js';
import type { StaffView } from '../dto/staff.view.js';

export class ListStaffQuery extends Query<StaffView[]> {
  constructor(
    readonly user: AuthUser,
    readonly filter: ListStaffDto,
  ) {
    super();
  }
}
