import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim';

/** Shortest password anyone may choose (the first admin's too). */
export const MIN_PASSWORD_LENGTH = 12;

/** Body of `POST /api/auth/password-reset`. */
export class RequestPasswordResetDto {
  @ApiProperty()
  @Trim()
  @IsEmail({ require_tld: false })
  @MaxLength(254)
  email: string;
}

/** A secret from an e-mailed link. */
export class LinkTokenDto {
  @ApiProperty({ description: 'The `token` from the link.' })
  @IsString()
  @Length(20, 200)
  token: string;
}

/** Body of `POST /api/auth/password-reset/confirm`. */
export class ConfirmPasswordResetDto extends LinkTokenDto {
  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH })
  @IsString()
  @Length(MIN_PASSWORD_LENGTH, 256)
  password: string;
}

/** Body of `POST /api/auth/invitations/accept`. */
export class AcceptInvitationDto extends LinkTokenDto {
  @ApiProperty({ example: 'Robin Vale' })
  @IsString()
  @Length(1, 120)
  displayName: string;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH })
  @IsString()
  @Length(MIN_PASSWORD_LENGTH, 256)
  password: string;
}
