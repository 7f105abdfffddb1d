import { Module } from '@nestjs/common';
import { ExchangeModule } from '../exchange/exchange.module';
import { ReleasesRepository } from './releases.repository';
import { ProjectReleasesResolver, ReleasesResolver } from './releases.resolver';
import { ReleasesService } from './releases.service';

@Module({
  imports: [ExchangeModule],
  providers: [ReleasesRepository, ReleasesService, ReleasesResolver, ProjectReleasesResolver],
  exports: [ReleasesService],
})
export class ReleasesModule {}
