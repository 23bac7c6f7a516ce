import { IsUUID } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';

export class AddTipDto {
  @IsUUID()
  staffId: string;

  @IsDecimalString({ min: '0.01', max: '100000', scale: 2 })
  amount: string;
}
