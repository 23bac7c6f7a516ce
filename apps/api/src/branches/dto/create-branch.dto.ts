import { IsBoolean, IsISO4217CurrencyCode, IsInt, IsOptional, IsString, IsTimeZone, Length, Max, Min } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

// Defaults are US federal (29 U.S.C. 206, 207); each branch carries its own because local law governs.
export class CreateBranchDto {
  /** The branch's name, unique in the organisation. */
  @Trim()
  @IsString()
  @Length(1, 80)
  name: string;

  /** IANA time zone such as America/Chicago. */
  @IsTimeZone()
  timeZone: string;

  /** ISO 4217 currency code; USD when left out. */
  @IsOptional()
  @IsISO4217CurrencyCode()
  currency?: string;

  /** Hourly minimum wage; "7.25" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1000', scale: 2 })
  minimumWage?: string;

  /** Weekly hours after which overtime is due; "40" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '168', scale: 2 })
  overtimeAfterHours?: string;

  /** Overtime multiple of the regular rate; "1.5" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '1', max: '5', scale: 3 })
  overtimeMultiplier?: string;

  /** Apply the commission exemption of 29 U.S.C. 207(i); off when left out. */
  @IsOptional()
  @IsBoolean()
  commissionExemption?: boolean;

  /** Retail sales tax as a fraction ("0.0825"); "0" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1', scale: 5 })
  retailTaxRate?: string;

  /** A day close whose cash or card variance is above this needs a note; "5.00" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  varianceNoteThreshold?: string;

  /** How many days a client's patch test stays current for colour; 180 when left out (a salon policy: local codes govern). */
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(3650)
  patchTestMaxAgeDays?: number;

  /** Franchise royalty on gross sales as a fraction from 0 up to (not including) 1, e.g. "0.06"; "0" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '0.99999', scale: 5 })
  royaltyRate?: string;

  /** Franchise marketing-fund contribution on gross sales as a fraction from 0 up to (not including) 1; "0" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '0.99999', scale: 5 })
  marketingFundRate?: string;
}
