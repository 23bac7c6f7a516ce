import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsIn, IsISO8601, IsOptional, Matches, ValidateNested } from 'class-validator';
import { payTierModes, productChargeModes } from '@tressury/schema';
import { IsDecimalString } from '../../common/is-decimal-string.js';

export const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;

export class TierDto {
  /** Commissionable service revenue in the pay period from which this rate applies, decimal string; the first tier starts at "0". */
  @IsDecimalString({ min: '0', scale: 2 })
  from: string;

  /** Commission rate as a fraction, decimal string ("0.40" = 40 %). */
  @IsDecimalString({ min: '0', max: '1', scale: 4 })
  rate: string;
}

export class ProductChargeDto {
  /** How colour product is charged back before commission. */
  @IsIn(productChargeModes)
  mode: (typeof productChargeModes)[number];

  /** percent-of-price: the fraction of price; fixed-per-colour-service: the amount. Decimal string. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1000', scale: 4 })
  value?: string;

  /** actual-cost: markup on the cost as a fraction ("0.10" = cost + 10 %). Decimal string. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '10', scale: 4 })
  markup?: string;
}

/** A plan's terms from one pay period on. */
export class PayPlanTermsDto {
  /** The first day of a pay period under the pay schedule, YYYY-MM-DD. */
  @Matches(DATE_ONLY, { message: 'effectiveFrom must be a date written YYYY-MM-DD' })
  @IsISO8601({ strict: true })
  effectiveFrom: string;

  /** marginal: each band at its own rate; whole-period: all revenue at the rate of the highest tier reached. */
  @IsIn(payTierModes)
  tierMode: (typeof payTierModes)[number];

  @ValidateNested({ each: true })
  @Type(() => TierDto)
  @ArrayMinSize(1)
  @ArrayMaxSize(20)
  tiers: TierDto[];

  @ValidateNested()
  @Type(() => ProductChargeDto)
  productCharge: ProductChargeDto;

  /** Commission on retail sales as a fraction, decimal string. */
  @IsDecimalString({ min: '0', max: '1', scale: 4 })
  retailRate: string;

  /** Paid for every hour worked on top of commission, decimal string; a staff member's own hourly rate takes precedence. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1000', scale: 2 })
  hourlyRate?: string;
}
