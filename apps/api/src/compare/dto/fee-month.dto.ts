import { Matches } from 'class-validator';

export class FeeMonthDto {
  /** The calendar month of the statement, YYYY-MM. */
  @Matches(/^\d{4}-(0[1-9]|1[0-2])$/, { message: 'month must be a month written YYYY-MM' })
  month: string;
}
