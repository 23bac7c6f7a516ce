import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { BranchView } from '../dto/branch.view.js';
import type { UpdateBranchDto } from '../dto/update-branch.dto.js';

export class UpdateBranchCommand extends Command<BranchView> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly changes: UpdateBranchDto,
  ) {
    super();
  }
}
