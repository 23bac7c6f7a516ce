import { IsDateString, IsObject, IsOptional, IsString, IsUUID, Length } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class CloseDayDto {
  @IsUUID()
  branchId: string;

  @IsDateString({ strict: true })
  businessDate: string;

  /** The drawer's total; may be left out when denominations are given. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1000000', scale: 2 })
  countedCash?: string;

  /** Face value as a decimal string → how many, e.g. { "20": 14, "0.25": 8 }. */
  @IsOptional()
  @IsObject()
  denominations?: Record<string, number>;

  /** Required when a variance is above the branch's threshold. */
  @IsOptional()
  @Trim()
  @IsString()
  @Length(0, 1000)
  note?: string;
}
