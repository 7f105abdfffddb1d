import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { CalibrationModule } from '../calibration/calibration.module';
import { SitesModule } from '../sites/sites.module';
import { DemoSeeder } from './demo-seeder';

@Module({ imports: [CalibrationModule, AgeModelsModule, SitesModule], providers: [DemoSeeder], exports: [DemoSeeder] })
export class DemoModule {}
