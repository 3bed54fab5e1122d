import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { Public } from '../common/decorators/public.decorator';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CreatePingDto } from './dto/create-ping.dto';
import { DiagnosticsService, type PingView } from './diagnostics.service';

/** A round trip through the job queue and a worker, for the status page and pipeline checks. */
@ApiTags('diagnostics')
@Public()
@Controller('diagnostics/pings')
export class DiagnosticsController {
  constructor(private readonly diagnostics: DiagnosticsService) {}

  /** Enqueues a ping that a worker answers with progress. */
  @Post()
  @Throttle({ default: { limit: 30, ttl: 60_000 } })
  @ApiErrors('VALIDATION_FAILED', 'TOO_MANY_REQUESTS')
  create(@Body() body: CreatePingDto): Promise<PingView> {
    return this.diagnostics.create(body.steps ?? 5);
  }

  /** State, progress and result of a ping. */
  @Get(':id')
  @ApiErrors('PING_NOT_FOUND')
  get(@Param('id') id: string): Promise<PingView> {
    return this.diagnostics.get(id);
  }
}
