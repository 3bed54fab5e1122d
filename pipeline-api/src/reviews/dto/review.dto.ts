import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsIn,
  IsInt,
  IsObject,
  IsOptional,
  IsString,
  Length,
  Min,
  ValidateIf,
} from 'class-validator';
import { ReviewState } from '../../takes/review-state';

const MARK_DOC = {
  description: 'Drawn mark: `{ strokes: [{ points: [[x, y], …] }] }`, coordinates in [0, 1].',
  example: {
    strokes: [
      {
        points: [
          [0.4, 0.5],
          [0.45, 0.52],
        ],
      },
    ],
  },
};

/** Body of `POST …/takes/:takeId/notes`. */
export class CreateNoteDto {
  @ApiProperty({ description: "A frame inside the shot's range." })
  @IsInt()
  @Min(0)
  frame: number;

  @ApiProperty()
  @IsString()
  @Length(1, 5000)
  text: string;

  @ApiPropertyOptional(MARK_DOC)
  @IsOptional()
  @IsObject()
  mark?: Record<string, unknown>;
}

/** Body of `PATCH …/notes/:noteId` (the author only); `mark: null` removes the mark. */
export class UpdateNoteDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(0)
  frame?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(1, 5000)
  text?: string;

  @ApiPropertyOptional({ ...MARK_DOC, nullable: true })
  @ValidateIf((_, v) => v !== undefined && v !== null)
  @IsObject()
  mark?: Record<string, unknown> | null;
}

/** Body of `POST …/takes/:takeId/decisions`. */
export class DecisionDto {
  @ApiProperty({ enum: [ReviewState.Approved, ReviewState.ChangesRequested] })
  @IsIn([ReviewState.Approved, ReviewState.ChangesRequested])
  decision: ReviewState.Approved | ReviewState.ChangesRequested;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(0, 5000)
  comment?: string;
}
