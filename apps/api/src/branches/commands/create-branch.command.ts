import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreateBranchDto } from '../dto/create-branch.dto.js';
import type { BranchView } from '../dto/branch.view.js';

export class CreateBranchCommand extends Command<BranchView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateBranchDto,
  ) {
    super();
  }
}
