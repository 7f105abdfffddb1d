import { Module } from '@nestjs/common';
import { JointRunsModule } from '../correlation/joint-runs/joint-runs.module';
import { IntervalNamesService } from './interval-names.service';
import { EventHorizonsModule } from '../event-horizons/event-horizons.module';
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
import { RecurrenceSourceResolver } from './recurrence-source.resolver';

/** Recurrence analyses of a segment or site: renewal fits, conditional probabilities, exports, and their job. */
@Module({
  imports: [EventHorizonsModule, SegmentsModule, SitesModule, AgeModelsModule, ReleasesModule, ProvenanceModule, JointRunsModule],
  controllers: [RecurrenceExportController],
  providers: [IntervalNamesService, RecurrenceRepository, RecurrenceService, RecurrenceJob, RecurrenceResolver, ProjectRecurrenceResolver, RecurrenceSourceResolver],
  exports: [RecurrenceJob, RecurrenceRepository, RecurrenceService],
})
export class RecurrenceModule {}
