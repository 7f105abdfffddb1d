import { Module } from '@nestjs/common';
import { SegmentsModule } from '../segments/segments.module';
import { SitesRepository } from './sites.repository';
import { SegmentSitesResolver, SitesResolver } from './sites.resolver';
import { SitesService } from './sites.service';

@Module({
  imports: [SegmentsModule],
  providers: [SitesRepository, SitesService, SitesResolver, SegmentSitesResolver],
  exports: [SitesService, SitesRepository],
})
export class SitesModule {}
