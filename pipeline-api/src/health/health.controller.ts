import { Controller, Get, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { HealthService, type HealthReport } from './health.service';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  /** 200 when every service is up, 503 when any is down; the body says which. */
  @Public()
  @Get()
  @ApiOkResponse({ description: 'Every service is up.' })
  @ApiServiceUnavailableResponse({
    description: 'At least one service is down; the body says which.',
  })
  async get(@Res({ passthrough: true }) res: Response): Promise<HealthReport> {
    const report = await this.health.check();
    res.status(report.status === 'up' ? 200 : 503);
    res.setHeader('Cache-Control', 'no-store');
    return report;
  }
}
