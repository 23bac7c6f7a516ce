import { Type } from 'class-transformer';
import { IsString, Length, ValidateNested } from 'class-validator';
import { Trim } from '../../common/trim.js';
import { PayPlanTermsDto } from './pay-plan-terms.dto.js';

export class CreatePayPlanDto {
  @Trim()
  @IsString()
  @Length(1, 80)
  name: string;

  /** The plan's first terms. */
  @ValidateNested()
  @Type(() => PayPlanTermsDto)
  terms: PayPlanTermsDto;
}
