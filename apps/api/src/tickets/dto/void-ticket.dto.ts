import { IsString, Length } from 'class-validator';
import { Trim } from '../../common/trim.js';

export class VoidTicketDto {
  @Trim()
  @IsString()
  @Length(3, 300)
  reason: string;
}
