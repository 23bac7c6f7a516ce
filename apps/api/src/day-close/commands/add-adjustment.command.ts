import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { AddAdjustmentDto } from '../dto/add-adjustment.dto.js';
import type { AdjustmentView } from '../dto/day-preview.view.js';

export class AddAdjustmentCommand extends Command<AdjustmentView> {
  constructor(
    readonly user: AuthUser,
    readonly input: AddAdjustmentDto,
  ) {
    super();
  }
}
