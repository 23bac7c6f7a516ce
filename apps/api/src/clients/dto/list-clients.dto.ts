import { IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim.js';
import { PageQueryDto } from '../../common/page-query.dto.js';

export class ListClientsDto extends PageQueryDto {
  /** Part of a name, phone number or e-mail address, any case; a phone matches on its digits alone. */
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(100)
  search?: string;

  /** Only the clients of this home branch. */
  @IsOptional()
  @IsUUID()
  branchId?: string;
}
