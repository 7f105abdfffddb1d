import { Module } from '@nestjs/common';
import { AgeModelsModule } from '../age-models/age-models.module';
import { SegmentsModule } from '../segments/segments.module';
import { RequestLoadersFactory } from './request-loaders';

@Module({ imports: [AgeModelsModule, SegmentsModule], providers: [RequestLoadersFactory], exports: [RequestLoadersFactory] })
export class LoadersModule {}
