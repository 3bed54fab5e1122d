import { Module } from '@nestjs/common';
import { StorageService } from './storage.service';

/** File storage on S3 (s3rver locally). */
@Module({ providers: [StorageService], exports: [StorageService] })
export class StorageModule {}
