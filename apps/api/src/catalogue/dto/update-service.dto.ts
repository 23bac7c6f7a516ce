import { PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateServiceDto } from './create-service.dto.js';

/** Only the fields sent change; `prices`, when sent, replaces every price of the service. */
export class UpdateServiceDto extends PartialType(CreateServiceDto) {
  /** Take the service off the menu (false) or put it back (true). */
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
