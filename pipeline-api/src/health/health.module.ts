import { Module } from '@nestjs/common';
import { StorageModule } from '../storage/storage.module';
import { MailModule } from '../mail/mail.module';
import { HealthController } from './health.controller';
import { HealthService } from './health.service';

/** `GET /api/health`: database, queues, file store and mail, each up or down with latency. */
@Module({
  imports: [StorageModule, MailModule],
  controllers: [HealthController],
  providers: [HealthService],
})
export class HealthModule {}
