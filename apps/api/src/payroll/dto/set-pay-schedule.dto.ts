import { IsIn, IsInt, IsISO8601, Matches, Max, Min } from 'class-validator';
import { payFrequencies, type PayFrequency } from '@tressury/schema';
import { DATE_ONLY } from './pay-plan-terms.dto.js';

export class SetPayScheduleDto {
  @IsIn(payFrequencies)
  frequency: PayFrequency;

  /** The first day of any one pay period (weekly, biweekly), YYYY-MM-DD; semi-monthly periods always start on the 1st and 16th. */
  @Matches(DATE_ONLY, { message: 'anchorDate must be a date written YYYY-MM-DD' })
  @IsISO8601({ strict: true })
  anchorDate: string;

  /** The day workweeks begin for overtime, 0 = Sunday … 6 = Saturday. */
  @IsInt()
  @Min(0)
  @Max(6)
  workweekStartsOn: number;
}
