import { type ContainerUnitName, containerUnits, type ProductKind, productKinds } from '@tressury/schema';
import { IsIn, IsOptional, IsString, Length } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';
import { Trim } from '../../common/trim.js';

// Cost per gram is not a field: it is derived from the container (libs/domain costPerGram).
export class CreateProductDto {
  /** The organisation's own product code, unique in the organisation. */
  @Trim()
  @IsString()
  @Length(1, 40)
  code: string;

  @Trim()
  @IsString()
  @Length(1, 120)
  name: string;

  @IsIn(productKinds)
  kind: ProductKind;

  /**
   * Developer strength in volumes, required for a developer and refused for anything else.
   * 10, 15, 20, 25, 30 and 40 are the usual strengths; any value from 0 to 40 is accepted.
   */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '40', scale: 3 })
  developerVolume?: string | null;

  /** Amount in one container, decimal string, in `containerUnit`. */
  @IsDecimalString({ min: '0.001', max: '1000000', scale: 3 })
  containerSize: string;

  /** g, oz (avoirdupois), mL or fl oz (US). */
  @IsIn(containerUnits)
  containerUnit: ContainerUnitName;

  /** Grams per millilitre (from the safety data sheet) for products sold by volume; without it 1 g/mL is assumed. */
  @IsOptional()
  @IsDecimalString({ min: '0.1', max: '5', scale: 4 })
  densityGramsPerMl?: string | null;

  /** What the salon pays for one container, decimal string. */
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  containerCost: string;

  /** Shelf price; required for a retail product. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  retailPrice?: string | null;
}
