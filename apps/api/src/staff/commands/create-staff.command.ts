import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreateStaffDto } from '../dto/create-staff.dto.js';
import type { StaffView } from '../dto/staff.view.js';

export class CreateStaffCommand extends Command<StaffView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateStaffDto,
  ) {
    super();
  }
}
