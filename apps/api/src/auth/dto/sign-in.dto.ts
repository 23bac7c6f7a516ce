import { IsEmail, IsString, Length } from 'class-validator';
import { Trim } from '../../common/trim.js';

export class SignInDto {
  @Trim()
  @IsEmail()
  email: string;

  @IsString()
  @Length(1, 200)
  password: string;
}
