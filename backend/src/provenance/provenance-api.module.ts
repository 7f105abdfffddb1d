import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { CorrelationModule } from '../correlation/correlation.module';
import { JointRunsModule } from '../correlation/joint-runs/joint-runs.module';
import { RecurrenceModule } from '../recurrence/recurrence.module';
import { ReleasesModule } from '../releases/releases.module';
import { SitesModule } from '../sites/sites.module';
import { ProvenanceModule } from './provenance.module';
import { AuditNamesResolver } from './audit-names.resolver';
import { AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver } from './provenance.resolver';
import { RefreshRepository } from './refresh.repository';
import { ProjectRefreshResolver, RefreshResolver } from './refresh.resolver';
import { RefreshService } from './refresh.service';
import { RefreshTicker } from './refresh.ticker';
import { ResultTablesController } from './result-tables.controller';
import { ResultTablesService } from './result-tables.service';

/** Stale flags and inputs on the API, the downloadable result tables, and the refresh of stale results. */
@Module({
  imports: [ProvenanceModule, AgeModelsModule, SitesModule, CorrelationModule, JointRunsModule, RecurrenceModule, ReleasesModule],
  controllers: [ResultTablesController],
  providers: [AuditNamesResolver, AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver, ResultTablesService, RefreshRepository, RefreshService, RefreshResolver, ProjectRefreshResolver, RefreshTicker],
  exports: [RefreshService],
})
export class ProvenanceApiModule {}
