import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsString,
  Length,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';

/** Body of `POST …/uploads/:assetId/parts`: the parts to (re)sign, e.g. to resume. */
export class PartUrlsDto {
  @ApiProperty({ type: [Number] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(10_000)
  @IsInt({ each: true })
  @Min(1, { each: true })
  @Max(10_000, { each: true })
  partNumbers: number[];
}

/** One part the client uploaded and the ETag the S3 store answered. */
export class UploadedPartDto {
  @ApiProperty()
  @IsInt()
  @Min(1)
  @Max(10_000)
  partNumber: number;

  @ApiProperty()
  @IsString()
  @Length(1, 200)
  etag: string;
}

/** Body of `POST …/uploads/:assetId/complete`. */
export class CompleteUploadDto {
  @ApiProperty({ type: [UploadedPartDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(10_000)
  @ValidateNested({ each: true })
  @Type(() => UploadedPartDto)
  parts: UploadedPartDto[];
}
