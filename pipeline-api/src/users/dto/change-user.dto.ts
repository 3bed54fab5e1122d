import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEnum, IsOptional } from 'class-validator';
import { Role } from '../entities/role';

/** Body of `PATCH /api/admin/users/:userId`: a new role, and/or disable (true) or enable (false). */
export class ChangeUserDto {
  @ApiPropertyOptional({ enum: Role })
  @IsOptional()
  @IsEnum(Role)
  role?: Role;

  @ApiPropertyOptional({ description: 'true disables the account and ends its sessions.' })
  @IsOptional()
  @IsBoolean()
  disabled?: boolean;
}
