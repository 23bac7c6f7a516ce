import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchStylistsView } from '../dto/branch-stylists.view.js';

export class ListBranchStylistsQuery extends Query<BranchStylistsView> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly from: string,
    readonly to: string,
  ) {
    super();
  }
}
