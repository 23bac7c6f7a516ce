import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchComparisonView } from '../dto/branch-comparison.view.js';

export class GetBranchComparisonQuery extends Query<BranchComparisonView> {
  constructor(
    readonly user: AuthUser,
    readonly from: string,
    readonly to: string,
    readonly rebookingDays: number,
  ) {
    super();
  }
}
