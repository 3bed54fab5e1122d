import { Controller, Get } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { Role } from '../users/entities/role';
import { OutboxService, type OutboxMessage } from './outbox.service';

/** `GET /api/admin/outbox`: what the local mail sink received (development only). */
@ApiTags('admin')
@Controller('admin/outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  /** Newest first, at most 100. */
  @Get()
  @Allow(Role.Admin)
  @ApiOperation({ summary: 'E-mails the local mail sink received (not in production)' })
  @ApiErrors('OUTBOX_DISABLED', 'OUTBOX_UNAVAILABLE')
  list(): Promise<OutboxMessage[]> {
    return this.outbox.list();
  }
}
