import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsIn, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min, ValidateNested } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class BowlComponentInput {
  @IsUUID()
  productId: string;

  /** The weight put in the bowl. */
  @IsDecimalString({ min: '0.001', max: '5000', scale: 3 })
  amount: string;

  /** Grams are the unit of record; ounces (avoirdupois) are converted by their exact definition. */
  @IsIn(['g', 'oz'])
  unit: 'g' | 'oz';
}

export class RecordBowlDto {
  @IsUUID()
  serviceLineId: string;

  /** Who mixed it; the line's stylist when left out. */
  @IsOptional()
  @IsUUID()
  mixedByStaffId?: string;

  @ValidateNested({ each: true })
  @Type(() => BowlComponentInput)
  @ArrayMinSize(1)
  @ArrayMaxSize(12)
  components: BowlComponentInput[];

  /** Weighed back after the service, in grams. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '5000', scale: 3 })
  leftoverGrams?: string;

  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(240)
  processingMinutes?: number;

  @IsOptional()
  @Trim()
  @IsString()
  @Length(0, 500)
  note?: string;
}
