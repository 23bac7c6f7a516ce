import { PartialType } from '@nestjs/swagger';
import { CreateLevelDto } from './create-level.dto.js';

/** Rename a level or move it in the order: only the fields sent change. */
export class UpdateLevelDto extends PartialType(CreateLevelDto) {}
