import { ApiProperty } from '@nestjs/swagger';
import { ArrayMinSize, ArrayUnique, IsArray, IsEnum, IsString, Length } from 'class-validator';
import { TokenScope } from '../token-scope';

/** Body of `POST /api/admin/shows/:showId/tokens`. */
export class CreateTokenDto {
  @ApiProperty({ example: 'render farm' })
  @IsString()
  @Length(1, 80)
  name: string;

  @ApiProperty({ enum: TokenScope, isArray: true })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayUnique()
  @IsEnum(TokenScope, { each: true })
  scopes: TokenScope[];
}
