import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CloseDayDto } from '../dto/close-day.dto.js';
import type { DayPreviewView } from '../dto/day-preview.view.js';

export class CloseDayCommand extends Command<DayPreviewView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CloseDayDto,
  ) {
    super();
  }
}
