import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { PayScheduleView } from '../dto/pay-schedule.view.js';
import type { SetPayScheduleDto } from '../dto/set-pay-schedule.dto.js';

export class SetPayScheduleCommand extends Command<PayScheduleView> {
  constructor(
    readonly user: AuthUser,
    readonly input: SetPayScheduleDto,
  ) {
    super();
  }
}
