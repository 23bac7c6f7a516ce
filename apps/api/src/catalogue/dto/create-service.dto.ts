import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min, ValidateNested } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

export class ServicePriceInput {
  /** A level of the organisation. */
  @IsUUID()
  levelId: string;

  /** Menu price at that level, decimal string ("65.00"). */
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  price: string;
}

export class CreateServiceDto {
  /** Unique on the organisation's menu. */
  @Trim()
  @IsString()
  @Length(1, 80)
  name: string;

  /** The organisation's own grouping, e.g. "Cuts" or "Colour". */
  @Trim()
  @IsString()
  @Length(1, 40)
  category: string;

  /** Time booked for the service. */
  @IsInt()
  @Min(1)
  @Max(720)
  durationMinutes: number;

  /** Colour services need a bowl before the ticket closes; false when left out. */
  @IsOptional()
  @IsBoolean()
  isColour?: boolean;

  /** One price per level that offers the service; each level at most once. */
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(50)
  @ValidateNested({ each: true })
  @Type(() => ServicePriceInput)
  prices?: ServicePriceInput[];
}
