import { Global, Module } from '@nestjs/common';
import { AuditTrailService } from './audit-trail.service';
import { AuditRepository } from './audit.repository';
import { AuditResolver } from './audit.resolver';
import { AuditService } from './audit.service';

@Global()
@Module({ providers: [AuditRepository, AuditService, AuditTrailService, AuditResolver], exports: [AuditService, AuditRepository] })
export class AuditModule {}
