import { Module } from '@nestjs/common';
import { AppConfigModule } from './config/app-config.module';
import { DatabaseModule } from './database/database.module';
import { QueuesModule } from './queues/queues.module';
import { StorageModule } from './storage/storage.module';
import { MailModule } from './mail/mail.module';
import { DiagnosticsWorkerModule } from './diagnostics/diagnostics-worker.module';
import { MailWorkerModule } from './mail/mail-worker.module';
import { IngestWorkerModule } from './assets/ingest-worker.module';
import { AuditModule } from './audit/audit.module';
import { JobsWorkerModule } from './jobs/jobs-worker.module';

/** The worker process: queue processors only, no HTTP. */
@Module({
  imports: [
    AppConfigModule,
    DatabaseModule,
    QueuesModule,
    StorageModule,
    MailModule,
    DiagnosticsWorkerModule,
    MailWorkerModule,
    IngestWorkerModule,
    AuditModule,
    JobsWorkerModule,
  ],
})
export class WorkerModule {}
