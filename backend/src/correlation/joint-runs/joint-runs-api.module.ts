import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../../age-models/age-models.module';
import { EventHorizonsModule } from '../../event-horizons/event-horizons.module';
import { ProvenanceApiModule } from '../../provenance/provenance-api.module';
import { ProvenanceModule } from '../../provenance/provenance.module';
import { SamplesModule } from '../../samples/samples.module';
import { SitesModule } from '../../sites/sites.module';
import { CorrelationModule } from '../correlation.module';
import { JointRunRefresh } from './joint-run-refresh';
import { JointRunsModule } from './joint-runs.module';
import { HypothesisJointRunsResolver, JointRunsResolver, RegionalEventJointAgeResolver } from './joint-runs.resolver';
import { JointRunsService } from './joint-runs.service';

/** Joint age model runs on the API: start, cancel, read, the joint ages of regional events, and their place in the refresh. */
@Module({
  imports: [JointRunsModule, CorrelationModule, AgeModelsModule, SitesModule, EventHorizonsModule, SamplesModule, ProvenanceModule, ProvenanceApiModule],
  providers: [JointRunsService, JointRunsResolver, HypothesisJointRunsResolver, RegionalEventJointAgeResolver, JointRunRefresh],
})
export class JointRunsApiModule {}
