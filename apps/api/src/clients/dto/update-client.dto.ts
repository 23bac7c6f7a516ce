import { IsEmail, IsISO8601, IsOptional, IsString, IsUUID, Length, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim.js';
import { BlankAsNull, ISO_DATE, ISO_DATE_MESSAGE, NotNull, PHONE, PHONE_MESSAGE } from './client-fields.js';

/** Only the fields sent change; null clears phone, email and the patch-test date. */
export class UpdateClientDto {
  @NotNull()
  @Trim()
  @IsString()
  @Length(1, 80)
  firstName?: string;

  @NotNull()
  @Trim()
  @IsString()
  @Length(1, 80)
  lastName?: string;

  /** Moves the client's record to another of the caller's branches. */
  @NotNull()
  @IsUUID()
  homeBranchId?: string;

  @BlankAsNull()
  @IsOptional()
  @Matches(PHONE, { message: PHONE_MESSAGE })
  phone?: string | null;

  @BlankAsNull()
  @IsOptional()
  @IsEmail()
  @MaxLength(254)
  email?: string | null;

  @NotNull()
  @Trim()
  @IsString()
  @MaxLength(4000)
  notes?: string;

  @NotNull()
  @Trim()
  @IsString()
  @MaxLength(4000)
  allergyNotes?: string;

  /** Date of the last skin patch test (YYYY-MM-DD), not after today at the home branch; null clears it. */
  @IsOptional()
  @Matches(ISO_DATE, { message: ISO_DATE_MESSAGE })
  @IsISO8601({ strict: true }, { message: ISO_DATE_MESSAGE })
  lastPatchTestOn?: string | null;
}
