import { Module } from '@nestjs/common';
import { SitesModule } from '../sites/sites.module';
import { SegmentsModule } from '../segments/segments.module';
import { RequestLoadersFactory } from './request-loaders';

@Module({ imports: [SitesModule, SegmentsModule], providers: [RequestLoadersFactory], exports: [RequestLoadersFactory] })
export class LoadersModule {}
