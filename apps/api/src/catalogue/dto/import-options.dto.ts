import { IsBoolean, IsOptional } from 'class-validator';
import { BooleanQuery } from './boolean-query.js';

export class ImportOptionsDto {
  /** false (the default): check the file and answer with a preview. true: write every row, or nothing if any row is bad. */
  @IsOptional()
  @BooleanQuery()
  @IsBoolean()
  commit?: boolean;
}
