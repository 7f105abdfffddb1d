import { Module } from '@nestjs/common';
import { CalibrationModule } from '../calibration/calibration.module';
import { EventHorizonsModule } from '../event-horizons/event-horizons.module';
import { SamplesModule } from '../samples/samples.module';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { UsersModule } from '../users/users.module';
import { AgeModelRunsRepository } from './age-model-runs.repository';
import { AgeModelJob } from './age-model.job';
import { AgeModelsResolver, EventHorizonPosteriorResolver, SiteAgeModelsResolver } from './age-models.resolver';
import { AgeModelsService } from './age-models.service';
import { DownstreamRunChoiceResolver, ProjectDownstreamRunChoicesResolver, RunUsedDownstreamResolver, SiteDownstreamRunResolver } from './downstream-run.resolver';
import { LatestRunsService } from './latest-runs.service';

@Module({
  imports: [SitesModule, UnitsModule, EventHorizonsModule, SamplesModule, CalibrationModule, UsersModule],
  providers: [AgeModelRunsRepository, AgeModelsService, LatestRunsService, AgeModelJob, AgeModelsResolver, SiteAgeModelsResolver, EventHorizonPosteriorResolver,
    SiteDownstreamRunResolver, RunUsedDownstreamResolver, ProjectDownstreamRunChoicesResolver, DownstreamRunChoiceResolver],
  exports: [AgeModelsService, AgeModelJob, AgeModelRunsRepository, LatestRunsService],
})
export class AgeModelsModule {}
