import { PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateStaffDto } from './create-staff.dto.js';

/** Only the fields sent change; null clears `email`, `userId` (unlinks the sign-in) or `hourlyRate`. */
export class UpdateStaffDto extends PartialType(CreateStaffDto) {
  /** A staff member who has left is made inactive (false), never deleted: their history stays. */
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
