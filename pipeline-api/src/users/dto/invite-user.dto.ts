import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsEmail, IsEnum, IsUUID, MaxLength } from 'class-validator';
import { Trim } from '../../common/trim';
import { Role } from '../entities/role';

/** Body of `POST /api/admin/invitations`. */
export class InviteUserDto {
  @ApiProperty({ example: 'animator@studio.example' })
  @Trim()
  @IsEmail({ require_tld: false })
  @MaxLength(254)
  email: string;

  @ApiProperty({ enum: Role })
  @IsEnum(Role)
  role: Role;

  @ApiProperty({ type: [String], description: 'Shows the new user becomes a member of.' })
  @IsArray()
  @ArrayMaxSize(100)
  @IsUUID('all', { each: true })
  showIds: string[];
}
