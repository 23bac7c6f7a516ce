import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsUUID } from 'class-validator';

export class ListStaffDto {
  /** Only the staff whose home branch this is. */
  @IsOptional()
  @IsUUID()
  branchId?: string;

  /** Only active (true) or only inactive (false) staff; all when left out. */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean()
  active?: boolean;
}
