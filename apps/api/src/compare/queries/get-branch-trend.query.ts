import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchTrendView } from '../dto/branch-trend.view.js';

export class GetBranchTrendQuery extends Query<BranchTrendView> {
  constructor(
    readonly user: AuthUser,
    readonly from: string,
    readonly to: string,
  ) {
    super();
  }
}
