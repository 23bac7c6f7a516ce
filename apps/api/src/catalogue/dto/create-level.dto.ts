import { IsInt, IsString, Length, Max, Min } from 'class-validator';
import { Trim } from '../../common/trim.js';

export class CreateLevelDto {
  /** The level's name, unique in the organisation. */
  @Trim()
  @IsString()
  @Length(1, 40)
  name: string;

  /** Order from the most junior (1) upwards. */
  @IsInt()
  @Min(1)
  @Max(99)
  rank: number;
}
