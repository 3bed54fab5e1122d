import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { MailOutboxService } from './mail-outbox.service';
import { OutboxService } from './outbox.service';
import { OutboxController } from './outbox.controller';

/** API side of e-mail: record and queue messages; the development outbox for admins. */
@Module({
  imports: [BullModule.registerQueue({ name: QUEUES.mail })],
  controllers: [OutboxController],
  providers: [MailOutboxService, OutboxService],
  exports: [MailOutboxService],
})
export class MailOutboxModule {}
