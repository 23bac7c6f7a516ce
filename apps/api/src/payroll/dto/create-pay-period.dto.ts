import { IsISO8601, IsOptional, Matches } from 'class-validator';
import { DATE_ONLY } from './pay-plan-terms.dto.js';

export class CreatePayPeriodDto {
  /** A day inside the period to create, YYYY-MM-DD; left out: the period after the latest one (or the one holding today). */
  @IsOptional()
  @Matches(DATE_ONLY, { message: 'date must be a date written YYYY-MM-DD' })
  @IsISO8601({ strict: true })
  date?: string;
}
