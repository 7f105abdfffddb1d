import { Module } from '@nestjs/common';
import { SitesModule } from '../sites/sites.module';
import { UnitsModule } from '../units/units.module';
import { CoreLogsRepository } from './core-logs.repository';
import { CoreLogsResolver, SiteCoreLogsResolver } from './core-logs.resolver';
import { CoreLogsService } from './core-logs.service';

/** Physical-property logs of cores: upload (checked row by row), listing and drawing. */
@Module({
  imports: [SitesModule, UnitsModule],
  providers: [CoreLogsRepository, CoreLogsService, CoreLogsResolver, SiteCoreLogsResolver],
  exports: [CoreLogsService],
})
export class CoreLogsModule {}
