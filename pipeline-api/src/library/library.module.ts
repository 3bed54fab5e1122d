import { Module } from '@nestjs/common';
import { StorageModule } from '../storage/storage.module';
import { LibraryController } from './library.controller';
import { CapturesController } from './captures.controller';
import { LibraryService } from './library.service';
import { CapturesService } from './captures.service';

/** The show's library: characters, captures (with consent), clips, profiles. */
@Module({
  imports: [StorageModule],
  controllers: [LibraryController, CapturesController],
  providers: [LibraryService, CapturesService],
  exports: [CapturesService],
})
export class LibraryModule {}
