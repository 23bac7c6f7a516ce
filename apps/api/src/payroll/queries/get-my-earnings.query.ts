import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { MyEarningsView } from '../dto/my-earnings.view.js';

/** The caller's own earnings for the pay period holding their home branch's business date at `now`. */
export class GetMyEarningsQuery extends Query<MyEarningsView> {
  constructor(
    readonly user: AuthUser,
    readonly now: Date,
  ) {
    super();
  }
}
