import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length, Matches } from 'class-validator';

/** Body of `POST /api/admin/shows`. */
export class CreateShowDto {
  @ApiProperty({
    example: 'HARBOR',
    description: '2–16 letters, digits, - or _; stored upper case.',
  })
  @IsString()
  @Matches(/^\s*[A-Za-z0-9][A-Za-z0-9_-]{1,15}\s*$/, {
    message: 'code must be 2 to 16 letters, digits, - or _, starting with a letter or digit',
  })
  code: string;

  @ApiProperty({ example: 'Harbor Lights' })
  @IsString()
  @Length(1, 120)
  name: string;
}
