import { ApiProperty } from '@nestjs/swagger';
import { adjustmentCategories } from '@tressury/schema';
import { IsIn, IsOptional, IsString, IsUUID, Length } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class AddAdjustmentDto {
  @IsUUID()
  branchId: string;

  /** The ticket of a closed day that this corrects, if any. */
  @IsOptional()
  @IsUUID()
  ticketId?: string;

  /** Whose figures it changes, for service, retail, tip and product-charge corrections. */
  @IsOptional()
  @IsUUID()
  staffId?: string;

  @ApiProperty({ enum: adjustmentCategories })
  @IsIn(adjustmentCategories)
  category: (typeof adjustmentCategories)[number];

  /** Positive adds, negative takes away; not zero. */
  @IsDecimalString({ min: '-1000000', max: '1000000', scale: 2 })
  amount: string;

  @Trim()
  @IsString()
  @Length(3, 300)
  reason: string;
}
