import { Global, Module } from '@nestjs/common';
import { AuditService } from './audit.service';

/** The audit trail, available to every feature. */
@Global()
@Module({ providers: [AuditService], exports: [AuditService] })
export class AuditModule {}
