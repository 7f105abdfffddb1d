import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module';
import { CalibrationCurvesRepository } from './calibration-curves.repository';
import { CalibrationResolver } from './calibration.resolver';
import { CalibrationService } from './calibration.service';
import { CurveRegistryService } from './curve-registry.service';

@Module({
  imports: [UsersModule],
  providers: [CalibrationCurvesRepository, CurveRegistryService, CalibrationService, CalibrationResolver],
  exports: [CalibrationService, CurveRegistryService],
})
export class CalibrationModule {}
