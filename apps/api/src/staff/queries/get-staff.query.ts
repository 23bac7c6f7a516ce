import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { StaffView } from '../dto/staff.view.js';

export class GetStaffQuery extends Query<StaffView> {
  constructor(
    readonly user: AuthUser,
    readonly staffId: string,
  ) {
    super();
  }
}
