import { Module } from '@nestjs/common';
import { CalibrationModule } from '../calibration/calibration.module';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { SamplesRepository } from './samples.repository';
import { SamplesResolver, SiteSamplesResolver } from './samples.resolver';
import { SamplesService } from './samples.service';

@Module({
  imports: [SitesModule, UnitsModule, CalibrationModule],
  providers: [SamplesRepository, SamplesService, SamplesResolver, SiteSamplesResolver],
  exports: [SamplesService, SamplesRepository],
})
export class SamplesModule {}
