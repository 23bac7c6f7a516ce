import { IsEmail, IsISO8601, IsOptional, IsString, IsUUID, Length, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim.js';
import { BlankAsNull, ISO_DATE, ISO_DATE_MESSAGE, NotNull, PHONE, PHONE_MESSAGE } from './client-fields.js';

export class CreateClientDto {
  @Trim()
  @IsString()
  @Length(1, 80)
  firstName: string;

  @Trim()
  @IsString()
  @Length(1, 80)
  lastName: string;

  /** The branch that keeps the client's record; one of the caller's branches. */
  @IsUUID()
  homeBranchId: string;

  /** Digits, spaces and + ( ) - . only; blank or null for none. */
  @BlankAsNull()
  @IsOptional()
  @Matches(PHONE, { message: PHONE_MESSAGE })
  phone?: string | null;

  /** Blank or null for none. */
  @BlankAsNull()
  @IsOptional()
  @IsEmail()
  @MaxLength(254)
  email?: string | null;

  /** Free notes; empty when left out. */
  @NotNull()
  @Trim()
  @IsString()
  @MaxLength(4000)
  notes?: string;

  /** Known allergies and sensitivities; empty when left out. */
  @NotNull()
  @Trim()
  @IsString()
  @MaxLength(4000)
  allergyNotes?: string;

  /** Date of the last skin patch test (YYYY-MM-DD), not after today at the home branch; null for none. */
  @IsOptional()
  @Matches(ISO_DATE, { message: ISO_DATE_MESSAGE })
  @IsISO8601({ strict: true }, { message: ISO_DATE_MESSAGE })
  lastPatchTestOn?: string | null;
}
