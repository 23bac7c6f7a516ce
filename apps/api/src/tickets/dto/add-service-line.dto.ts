import { IsBoolean, IsOptional, IsUUID } from 'class-validator';
import { IsDecimalString } from '../../common/is-decimal-string.js';

export class AddServiceLineDto {
  @IsUUID()
  serviceId: string;

  /** The stylist doing the service; the price is the service's price at their level. */
  @IsUUID()
  staffId: string;

  @IsOptional()
  @IsUUID()
  assistantStaffId?: string;

  /** The assistant's part of the line as a fraction, e.g. "0.25"; required with an assistant. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '1', scale: 4 })
  assistantShare?: string;

  /** Taken off the level price; "0" when left out. */
  @IsOptional()
  @IsDecimalString({ min: '0', max: '100000', scale: 2 })
  discount?: string;

  /** Confirms colour may go ahead although the client has no patch test within the branch's window. */
  @IsOptional()
  @IsBoolean()
  acknowledgePatchTest?: boolean;
}
