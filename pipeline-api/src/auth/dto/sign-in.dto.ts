import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim';

/** Body of `POST /api/auth/sign-in`. */
export class SignInDto {
  @ApiProperty({ example: 'admin@overshoot.localhost' })
  @Trim()
  @IsEmail({ require_tld: false })
  @MaxLength(254)
  email: string;

  @ApiProperty()
  @IsString()
  @Length(1, 256)
  password: string;
}
