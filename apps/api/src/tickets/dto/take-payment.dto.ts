import { IsIn, IsOptional, IsString, Length, Matches, ValidateIf } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';

export class TakePaymentDto {
  @IsIn(['cash', 'card'])
  method: 'cash' | 'card';

  @IsDecimalString({ min: '0.01', max: '100000', scale: 2 })
  amount: string;

  /** Cash only: what the client handed over, when more than the amount. */
  @IsOptional()
  @IsDecimalString({ min: '0.01', max: '100000', scale: 2 })
  tendered?: string;

  /** Card only: the payment method token from the card reader or form. */
  @ValidateIf((dto: TakePaymentDto) => dto.method === 'card')
  @IsString()
  @Length(3, 200)
  paymentMethod?: string;

  /** One per checkout attempt, made by the client app; a repeated submission with it charges once. */
  @IsString()
  @Matches(/^[A-Za-z0-9_-]{8,100}$/)
  idempotencyKey: string;
}
