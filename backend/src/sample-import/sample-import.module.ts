import { Module } from '@nestjs/common';
import { CalibrationModule } from '../calibration/calibration.module';
import { SamplesModule } from '../samples/samples.module';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { ColumnChoicesRepository } from './column-choices.repository';
import { SampleImportResolver } from './sample-import.resolver';
import { SampleImportService } from './sample-import.service';

/** Lab-sheet import: `importSamples`. */
@Module({
  imports: [SitesModule, UnitsModule, SamplesModule, CalibrationModule],
  providers: [SampleImportService, SampleImportResolver, ColumnChoicesRepository],
})
export class SampleImportModule {}
