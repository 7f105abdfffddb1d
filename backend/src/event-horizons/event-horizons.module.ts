import { Module } from '@nestjs/common';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { EventHorizonsRepository } from './event-horizons.repository';
import { EventHorizonsResolver, SiteEventHorizonsResolver } from './event-horizons.resolver';
import { EventHorizonsService } from './event-horizons.service';

@Module({
  imports: [SitesModule, UnitsModule],
  providers: [EventHorizonsRepository, EventHorizonsService, EventHorizonsResolver, SiteEventHorizonsResolver],
  exports: [EventHorizonsService, EventHorizonsRepository],
})
export class EventHorizonsModule {}
