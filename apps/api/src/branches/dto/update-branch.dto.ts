import { PartialType } from '@nestjs/swagger';
import { CreateBranchDto } from './create-branch.dto.js';

/** Rename a branch or change its settings: only the fields sent change. */
export class UpdateBranchDto extends PartialType(CreateBranchDto) {}
