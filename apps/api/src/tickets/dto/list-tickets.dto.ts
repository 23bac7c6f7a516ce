import { IsDateString, IsOptional, IsUUID } from 'class-validator';

export class ListTicketsDto {
  @IsUUID()
  branchId: string;

  /** A business date (YYYY-MM-DD); today in the branch's time zone when left out. */
  @IsOptional()
  @IsDateString({ strict: true })
  date?: string;
}
