import { Module } from '@nestjs/common';
import { CalibrationModule } from '../calibration/calibration.module';
import { EventHorizonsModule } from '../event-horizons/event-horizons.module';
import { SamplesModule } from '../samples/samples.module';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { AgeModelRunsRepository } from './age-model-runs.repository';
import { AgeModelJob } from './age-model.job';
import { AgeModelsResolver, EventHorizonPosteriorResolver, SiteAgeModelsResolver } from './age-models.resolver';
import { AgeModelsService } from './age-models.service';
import { LatestRunsService } from './latest-runs.service';

@Module({
  imports: [SitesModule, UnitsModule, EventHorizonsModule, SamplesModule, CalibrationModule],
  providers: [AgeModelRunsRepository, AgeModelsService, LatestRunsService, AgeModelJob, AgeModelsResolver, SiteAgeModelsResolver, EventHorizonPosteriorResolver],
  exports: [AgeModelsService, AgeModelJob, AgeModelRunsRepository, LatestRunsService],
})
export class AgeModelsModule {}
