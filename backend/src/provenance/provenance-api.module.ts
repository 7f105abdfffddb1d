import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { CorrelationModule } from '../correlation/correlation.module';
import { RecurrenceModule } from '../recurrence/recurrence.module';
import { ReleasesModule } from '../releases/releases.module';
import { SitesModule } from '../sites/sites.module';
import { ProvenanceModule } from './provenance.module';
import { AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver } from './provenance.resolver';
import { ResultTablesController } from './result-tables.controller';
import { ResultTablesService } from './result-tables.service';

/** Stale flags and inputs on the API, and the downloadable result tables. */
@Module({
  imports: [ProvenanceModule, AgeModelsModule, SitesModule, CorrelationModule, RecurrenceModule, ReleasesModule],
  controllers: [ResultTablesController],
  providers: [AgeModelRunProvenanceResolver, RecurrenceProvenanceResolver, ResultTablesService],
})
export class ProvenanceApiModule {}
