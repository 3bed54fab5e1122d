import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsString, Length } from 'class-validator';
import { Trim } from '../../common/trim';

const toBool = ({ value }: { value: unknown }) =>
  value === 'true' ? true : value === 'false' ? false : value;

/** Query of the character and clip lists: `?includeRejected=true` lists refused uploads too. */
export class LibraryListQuery {
  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @Transform(toBool)
  @IsBoolean()
  includeRejected?: boolean;
}

/** Query of the capture list: `?includeDeleted=true` lists the records of deleted captures. */
export class CaptureListQuery {
  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @Transform(toBool)
  @IsBoolean()
  includeDeleted?: boolean;
}

/** Body of a capture deletion: why (kept in the record and the audit trail). */
export class DeleteCaptureDto {
  @ApiProperty({ example: 'Performer withdrew consent' })
  @Trim()
  @IsString()
  @Length(3, 500)
  reason: string;
}
