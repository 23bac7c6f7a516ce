import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsInt, IsString, IsUUID, Length, Matches, Min, ValidateNested } from 'class-validator';
import { Trim } from '../../common/trim.js';

export class RefundRetailInput {
  @IsUUID()
  retailLineId: string;

  /** How many of the line's items come back. */
  @IsInt()
  @Min(1)
  quantity: number;
}

export class RefundTicketDto {
  /** Service lines refunded in full. */
  @IsArray()
  @ArrayMaxSize(50)
  @IsUUID('all', { each: true })
  serviceLineIds: string[];

  @ValidateNested({ each: true })
  @Type(() => RefundRetailInput)
  @IsArray()
  @ArrayMaxSize(50)
  retail: RefundRetailInput[];

  /** How the money goes back: to the card it was paid with, or in cash from the drawer. */
  @IsIn(['cash', 'card'])
  method: 'cash' | 'card';

  @Trim()
  @IsString()
  @Length(3, 300)
  reason: string;

  @IsString()
  @Matches(/^[A-Za-z0-9_-]{8,100}$/)
  idempotencyKey: string;
}
