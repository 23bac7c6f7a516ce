import { IsDateString, IsUUID } from 'class-validator';

export class DayQueryDto {
  @IsUUID()
  branchId: string;

  @IsDateString({ strict: true })
  businessDate: string;
}
