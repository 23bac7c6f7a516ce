import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { UpdateLevelDto } from '../dto/update-level.dto.js';
import type { LevelView } from '../dto/level.view.js';

export class UpdateLevelCommand extends Command<LevelView> {
  constructor(
    readonly user: AuthUser,
    readonly levelId: string,
    readonly changes: UpdateLevelDto,
  ) {
    super();
  }
}
