import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsEnum, IsIn, IsOptional, IsUUID } from 'class-validator';
import { JobState } from '../job-state';

/** Query of `GET /api/shows/:showId/jobs`. */
export class ListJobsQuery {
  @ApiPropertyOptional({ description: "Only this shot's retarget jobs." })
  @IsOptional()
  @IsUUID()
  shotId?: string;

  @ApiPropertyOptional({ enum: ['learn', 'retarget'] })
  @IsOptional()
  @IsIn(['learn', 'retarget'])
  kind?: 'learn' | 'retarget';

  @ApiPropertyOptional({ enum: JobState })
  @IsOptional()
  @IsEnum(JobState)
  state?: JobState;
}
