import { IsISO8601, IsUUID, Matches } from 'class-validator';
import { DATE_ONLY } from './pay-plan-terms.dto.js';

export class AssignPayPlanDto {
  @IsUUID()
  staffId: string;

  /** The first day of a pay period, YYYY-MM-DD: the staff member is paid on this plan from that period on. */
  @Matches(DATE_ONLY, { message: 'effectiveFrom must be a date written YYYY-MM-DD' })
  @IsISO8601({ strict: true })
  effectiveFrom: string;
}
