import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional } from 'class-validator';

export class ImportOptionsDto {
  /** false (the default): check the file and answer with a preview. true: write every row, or nothing if any row is bad. */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean()
  commit?: boolean;
}
