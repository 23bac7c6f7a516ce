import { PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateProductDto } from './create-product.dto.js';

/** Only the fields sent change; null clears an optional figure. The cost per gram is derived again. */
export class UpdateProductDto extends PartialType(CreateProductDto) {
  /** Withdraw the product (false) or bring it back (true). */
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
