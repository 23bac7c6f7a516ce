import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchView } from '../dto/branch.view.js';

export class GetBranchQuery extends Query<BranchView> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
  ) {
    super();
  }
}
