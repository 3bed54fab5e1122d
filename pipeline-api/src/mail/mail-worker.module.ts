import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { MailModule } from './mail.module';
import { MailProcessor } from './mail.processor';

/** Worker side of e-mail: the processor that sends through SMTP. */
@Module({
  imports: [BullModule.registerQueue({ name: QUEUES.mail }), MailModule],
  providers: [MailProcessor],
})
export class MailWorkerModule {}
