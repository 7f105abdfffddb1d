import { Module } from '@nestjs/common';
import { SitesModule } from '../sites/sites.module';
import { SiteUnitsResolver, UnitsResolver } from './units.resolver';
import { UnitsRepository } from './units.repository';
import { UnitsService } from './units.service';

@Module({
  imports: [SitesModule],
  providers: [UnitsRepository, UnitsService, UnitsResolver, SiteUnitsResolver],
  exports: [UnitsService, UnitsRepository],
})
export class UnitsModule {}
