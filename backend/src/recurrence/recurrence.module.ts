import { Module } from '@nestjs/common';
import { ProvenanceModule } from '../provenance/provenance.module';
import { ReleasesModule } from '../releases/releases.module';
import { AgeModelsModule } from '../age-models/age-models.module';
import { SegmentsModule } from '../segments/segments.module';
import { SitesModule } from '../sites/sites.module';
import { RecurrenceExportController } from './recurrence-export.controller';
import { RecurrenceJob } from './recurrence.job';
import { RecurrenceRepository } from './recurrence.repository';
import { ProjectRecurrenceResolver, RecurrenceResolver } from './recurrence.resolver';
import { RecurrenceService } from './recurrence.service';

/** Recurrence analyses of a segment or site: renewal fits, conditional probabilities, exports, and their job. */
@Module({
  imports: [SegmentsModule, SitesModule, AgeModelsModule, ReleasesModule, ProvenanceModule],
  controllers: [RecurrenceExportController],
  providers: [RecurrenceRepository, RecurrenceService, RecurrenceJob, RecurrenceResolver, ProjectRecurrenceResolver],
  exports: [RecurrenceJob, RecurrenceRepository, RecurrenceService],
})
export class RecurrenceModule {}
