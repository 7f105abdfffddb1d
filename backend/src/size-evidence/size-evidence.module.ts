import { Module } from '@nestjs/common';
import { SegmentsModule } from '../segments/segments.module';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { EventHorizonSizeResolver, RegionalEventSizeResolver } from './size-evidence.resolver';

/** Event size evidence: bed thickness, the along-strike size profile, Mw from area and displacement. */
@Module({
  imports: [SitesModule, SegmentsModule, UnitsModule],
  providers: [EventHorizonSizeResolver, RegionalEventSizeResolver],
})
export class SizeEvidenceModule {}
