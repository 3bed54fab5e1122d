import { Module } from '@nestjs/common';
import { MailOutboxModule } from '../mail/mail-outbox.module';
import { TakesController } from './takes.controller';
import { TakesService } from './takes.service';

/** Takes: creation from jobs (for the retarget worker), reading, the "take ready" e-mail. */
@Module({
  imports: [MailOutboxModule],
  controllers: [TakesController],
  providers: [TakesService],
  exports: [TakesService],
})
export class TakesModule {}
