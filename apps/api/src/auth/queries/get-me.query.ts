import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../auth-user.js';
import type { MeView } from '../dto/me.view.js';

export class GetMeQuery extends Query<MeView> {
  constructor(readonly user: AuthUser) {
    super();
  }
}
