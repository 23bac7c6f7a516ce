import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { LevelView } from '../dto/level.view.js';

export class ListLevelsQuery extends Query<LevelView[]> {
  constructor(readonly user: AuthUser) {
    super();
  }
}
