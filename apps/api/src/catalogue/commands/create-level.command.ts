import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreateLevelDto } from '../dto/create-level.dto.js';
import type { LevelView } from '../dto/level.view.js';

export class CreateLevelCommand extends Command<LevelView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateLevelDto,
  ) {
    super();
  }
}
