import { Transform } from 'class-transformer';
import { IsEmail, IsOptional, IsString, IsUUID, Length, MaxLength } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class CreateStaffDto {
  /** The name shown on tickets and statements. */
  @Trim()
  @IsString()
  @Length(1, 80)
  displayName: string;

  /** Contact address; optional. */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @IsEmail()
  @MaxLength(254)
  email?: string | null;

  /** A level of the organisation: it sets the staff member's menu prices. */
  @IsUUID()
  levelId: string;

  /** A branch of the organisation where the caller manages staff. */
  @IsUUID()
  homeBranchId: string;

  /** A stylist's sign-in in the organisation, to link to this staff member; null or left out for none. */
  @IsOptional()
  @IsUUID()
  userId?: string | null;

  /** Hourly rate on top of commission, decimal string; null or left out for none. Setting it needs the right to change pay figures. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1000', scale: 2 })
  hourlyRate?: string | null;
}
