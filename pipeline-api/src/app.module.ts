import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { AppConfigModule } from './config/app-config.module';
import { DatabaseModule } from './database/database.module';
import { QueuesModule } from './queues/queues.module';
import { StorageModule } from './storage/storage.module';
import { MailModule } from './mail/mail.module';
import { HealthModule } from './health/health.module';
import { DiagnosticsModule } from './diagnostics/diagnostics.module';
import { AccessGuard } from './common/guards/access.guard';
import { AuditModule } from './audit/audit.module';
import { MailOutboxModule } from './mail/mail-outbox.module';
import { AuthModule } from './auth/auth.module';
import { UsersModule } from './users/users.module';
import { ShowsModule } from './shows/shows.module';
import { TokensModule } from './tokens/tokens.module';
import { AssetsModule } from './assets/assets.module';
import { LibraryModule } from './library/library.module';
import { ShotsModule } from './shots/shots.module';
import { TakesModule } from './takes/takes.module';
import { ReviewsModule } from './reviews/reviews.module';
import { EventsModule } from './events/events.module';
import { JobsModule } from './jobs/jobs.module';

/** The HTTP API. Long work is queued for the worker process, never run here. */
@Module({
  imports: [
    AppConfigModule,
    DatabaseModule,
    QueuesModule,
    StorageModule,
    MailModule,
    ThrottlerModule.forRoot([{ ttl: 60_000, limit: 600 }]),
    HealthModule,
    DiagnosticsModule,
    AuditModule,
    MailOutboxModule,
    AuthModule,
    UsersModule,
    ShowsModule,
    TokensModule,
    AssetsModule,
    LibraryModule,
    ShotsModule,
    TakesModule,
    ReviewsModule,
    EventsModule,
    JobsModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useClass: AccessGuard },
  ],
})
export class AppModule {}
