import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchDaysView } from '../dto/branch-days.view.js';

export class ListBranchDaysQuery extends Query<BranchDaysView> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly from: string,
    readonly to: string,
  ) {
    super();
  }
}
