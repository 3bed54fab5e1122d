import { ApiProperty } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';

/** Body of `POST /api/admin/shows/:showId/members`. */
export class AddMemberDto {
  @ApiProperty()
  @IsUUID()
  userId: string;
}
