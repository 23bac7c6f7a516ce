import { IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';

export class AddRetailLineDto {
  @IsUUID()
  productId: string;

  @IsInt()
  @Min(1)
  @Max(99)
  quantity: number;

  /** Who sold it (earns the retail commission). */
  @IsUUID()
  sellerStaffId: string;

  /** The product's retail price when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  unitPrice?: string;
}
