import { type ProductKind, productKinds } from '@tressury/schema';
import { IsBoolean, IsIn, IsOptional } from 'class-validator';
import { BooleanQuery } from './boolean-query.js';

export class ListProductsDto {
  /** Only products of this kind. */
  @IsOptional()
  @IsIn(productKinds)
  kind?: ProductKind;

  /** Only active (true) or only withdrawn (false) products; all when left out. */
  @IsOptional()
  @BooleanQuery()
  @IsBoolean()
  active?: boolean;
}
