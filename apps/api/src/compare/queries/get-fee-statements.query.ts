import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { FeeStatementsView } from '../dto/fee-statements.view.js';

export class GetFeeStatementsQuery extends Query<FeeStatementsView> {
  constructor(
    readonly user: AuthUser,
    readonly month: string,
    /** Only this branch (404 outside the caller's branches); every branch the caller may see when left out. */
    readonly branchId?: string,
  ) {
    super();
  }
}
