import { Type } from 'class-transformer';
import { IsDateString, IsInt, IsOptional, Max, Min } from 'class-validator';

/** A range of business dates, both ends included (at most 366 days). */
export class CompareRangeDto {
  /** First business date, YYYY-MM-DD. */
  @IsDateString({ strict: true })
  from: string;

  /** Last business date, YYYY-MM-DD, on or after `from`. */
  @IsDateString({ strict: true })
  to: string;
}

export class BranchComparisonQueryDto extends CompareRangeDto {
  /** A client counts as rebooked when they come back within this many days; 42 when left out. */
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(365)
  rebookingDays?: number;
}
