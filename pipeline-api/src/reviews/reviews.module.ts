import { Module } from '@nestjs/common';
import { MailOutboxModule } from '../mail/mail-outbox.module';
import { TakesModule } from '../takes/takes.module';
import { ReviewsController } from './reviews.controller';
import { NotesService } from './notes.service';
import { DecisionsService } from './decisions.service';

/** Review: notes and decisions. */
@Module({
  imports: [MailOutboxModule, TakesModule],
  controllers: [ReviewsController],
  providers: [NotesService, DecisionsService],
})
export class ReviewsModule {}
