import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Matches,
  Max,
  Min,
} from 'class-validator';
import { RenderState } from '../render-state';
import { JobState } from '../../jobs/job-state';
import { ReviewState } from '../../takes/review-state';

/** Fields the shot list sorts by. */
export const SHOT_SORT_FIELDS = [
  'code',
  'sequence',
  'dueDate',
  'frameStart',
  'renderState',
  'reviewState',
  'solveState',
  'createdAt',
  'updatedAt',
] as const;

/** A sort field. */
export type ShotSortField = (typeof SHOT_SORT_FIELDS)[number];

const SORT = new RegExp(
  `^(${SHOT_SORT_FIELDS.join('|')}):(asc|desc)(,(${SHOT_SORT_FIELDS.join('|')}):(asc|desc)){0,3}$`,
);

/** `none` selects shots without a job or take yet. */
const NONE = 'none';

/** Filters of the shot list and its CSV export (the export ignores paging). */
export class ShotFilterQuery {
  @ApiPropertyOptional({ enum: RenderState })
  @IsOptional()
  @IsIn(Object.values(RenderState))
  renderState?: RenderState;

  @ApiPropertyOptional({ enum: [...Object.values(ReviewState), NONE] })
  @IsOptional()
  @IsIn([...Object.values(ReviewState), NONE])
  reviewState?: ReviewState | typeof NONE;

  @ApiPropertyOptional({ enum: [...Object.values(JobState), NONE] })
  @IsOptional()
  @IsIn([...Object.values(JobState), NONE])
  solveState?: JobState | typeof NONE;

  @ApiPropertyOptional({ description: 'Shots this user holds.' })
  @IsOptional()
  @IsUUID()
  assigneeId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @Length(1, 40)
  sequence?: string;

  @ApiPropertyOptional({ description: 'true: due date passed and not approved; false: the rest.' })
  @IsOptional()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean()
  late?: boolean;

  @ApiPropertyOptional({ description: 'Text in the shot or sequence code.' })
  @IsOptional()
  @IsString()
  @Length(1, 80)
  search?: string;

  @ApiPropertyOptional({
    example: 'dueDate:asc,code:asc',
    description: `Up to four of ${SHOT_SORT_FIELDS.join(', ')} with :asc or :desc.`,
  })
  @IsOptional()
  @Matches(SORT, {
    message: `sort must be field:asc|desc[,…] with fields ${SHOT_SORT_FIELDS.join(', ')}`,
  })
  sort?: string;
}

/** Query of `GET /api/shows/:showId/shots`: filters, sort and paging. */
export class ListShotsQuery extends ShotFilterQuery {
  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page?: number;

  @ApiPropertyOptional({ default: 50, maximum: 200 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(200)
  pageSize?: number;
}

/** Query of the throughput chart. */
export class ThroughputQuery {
  @ApiPropertyOptional({ default: 12, maximum: 104 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(104)
  weeks?: number;
}
