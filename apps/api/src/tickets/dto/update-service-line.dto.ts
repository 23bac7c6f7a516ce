import { IsOptional, IsString, IsUUID, Length, ValidateIf } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class UpdateServiceLineDto {
  @IsOptional()
  @IsUUID()
  staffId?: string;

  /** null removes the assistant. */
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsUUID()
  assistantStaffId?: string | null;

  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @IsDecimalString({ min: '0', max: '1', scale: 4 })
  assistantShare?: string | null;

  @IsOptional()
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  discount?: string;

  /** Why a colour service used no product; null clears it. */
  @IsOptional()
  @ValidateIf((_, value) => value !== null)
  @Trim()
  @IsString()
  @Length(3, 200)
  noProductReason?: string | null;
}
