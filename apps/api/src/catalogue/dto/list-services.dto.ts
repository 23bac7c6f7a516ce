import { IsBoolean, IsOptional } from 'class-validator';
import { BooleanQuery } from './boolean-query.js';

export class ListServicesDto {
  /** Only active (true) or only inactive (false) services; all when left out. */
  @IsOptional()
  @BooleanQuery()
  @IsBoolean()
  active?: boolean;
}
