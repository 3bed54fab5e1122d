import { Module } from '@nestjs/common';
import { BullModule } from '@nestjs/bullmq';
import { QUEUES } from '../queues/queue-names';
import { PingProcessor } from './ping.processor';

/** Worker side of diagnostic pings: the processor. */
@Module({
  imports: [BullModule.registerQueue({ name: QUEUES.diagnostics })],
  providers: [PingProcessor],
})
export class DiagnosticsWorkerModule {}
