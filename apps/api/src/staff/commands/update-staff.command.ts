import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { StaffView } from '../dto/staff.view.js';
import type { UpdateStaffDto } from '../dto/update-staff.dto.js';

export class UpdateStaffCommand extends Command<StaffView> {
  constructor(
    readonly user: AuthUser,
    readonly staffId: string,
    readonly changes: UpdateStaffDto,
  ) {
    super();
  }
}
