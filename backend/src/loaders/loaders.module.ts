import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { SitesModule } from '../sites/sites.module';
import { SegmentsModule } from '../segments/segments.module';
import { RequestLoadersFactory } from './request-loaders';

@Module({ imports: [SitesModule, SegmentsModule, AgeModelsModule], providers: [RequestLoadersFactory], exports: [RequestLoadersFactory] })
export class LoadersModule {}
