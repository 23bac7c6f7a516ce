import { IsString, Length } from 'class-validator';
import { Trim } from '../../common/trim.js';

export class RenameOrganisationDto {
  /** The salon group's name as it appears on statements and exports. */
  @Trim()
  @IsString()
  @Length(1, 120)
  name: string;
}
