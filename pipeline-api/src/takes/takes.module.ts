import { Module } from '@nestjs/common';
import { MailOutboxModule } from '../mail/mail-outbox.module';
import { StorageModule } from '../storage/storage.module';
import { TakesController } from './takes.controller';
import { TakesService } from './takes.service';

/** Takes: creation from jobs (for the retarget worker), reading, files, the "take ready" e-mail. */
@Module({
  imports: [MailOutboxModule, StorageModule],
  controllers: [TakesController],
  providers: [TakesService],
  exports: [TakesService],
})
export class TakesModule {}
