import { IsISO8601, IsOptional, IsUUID, Matches } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { DATE_ONLY } from './pay-plan-terms.dto.js';

export class SetTimesheetHoursDto {
  @IsUUID()
  staffId: string;

  /** Where the hours were worked; left out: the staff member's home branch. */
  @IsOptional()
  @IsUUID()
  branchId?: string;

  /** The work day, YYYY-MM-DD. */
  @Matches(DATE_ONLY, { message: 'date must be a date written YYYY-MM-DD' })
  @IsISO8601({ strict: true })
  date: string;

  /** Hours worked that day, decimal string from "0" to "24"; "0" clears the day. */
  @IsDecimalString({ min: '0', max: '24', scale: 3 })
  hours: string;
}
