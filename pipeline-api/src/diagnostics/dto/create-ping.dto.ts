import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

/** Body of `POST /api/diagnostics/pings`. */
export class CreatePingDto {
  @ApiPropertyOptional({
    minimum: 1,
    maximum: 20,
    default: 5,
    description: 'Progress steps the worker reports.',
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(20)
  steps?: number;
}
