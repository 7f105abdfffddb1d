import { MiddlewareConsumer, Module, NestModule, RequestMethod } from '@nestjs/common';
import { EventLadderCache } from './ladder-cache/event-ladder-cache';
import { EventLadderCacheMiddleware } from './ladder-cache/event-ladder-cache.middleware';
import { LadderRevisionRepository } from './ladder-cache/ladder-revision.repository';
import { AgeModelsModule } from '../age-models/age-models.module';
import { ProjectsModule } from '../projects/projects.module';
import { SitesModule } from '../sites/sites.module';
import { UsersModule } from '../users/users.module';
import { CoreLogsModule } from '../core-logs/core-logs.module';
import { EventHorizonsModule } from '../event-horizons/event-horizons.module';
import { UnitsModule } from '../units/units.module';
import { TieSuggestionsResolver } from './tie-suggestions.resolver';
import { TieSuggestionsService } from './tie-suggestions.service';
import { CorrelationDataService } from './correlation-data.service';
import { EventLadderService } from './event-ladder.service';
import { HypothesesRepository } from './hypotheses.repository';
import { EventLadderResolver, HypothesesResolver, LadderEventResolver, ProjectHypothesesResolver } from './hypotheses.resolver';
import { HypothesesService } from './hypotheses.service';

/** Correlation hypotheses, their ties and checks, and the event ladder. */
@Module({
  imports: [ProjectsModule, SitesModule, UsersModule, AgeModelsModule, CoreLogsModule, UnitsModule, EventHorizonsModule],
  providers: [
    EventLadderCache,
    LadderRevisionRepository,
    HypothesesRepository,
    CorrelationDataService,
    HypothesesService,
    EventLadderService,
    HypothesesResolver,
    ProjectHypothesesResolver,
    EventLadderResolver,
    LadderEventResolver,
    TieSuggestionsService,
    TieSuggestionsResolver,
  ],
  exports: [HypothesesService, CorrelationDataService, EventLadderCache],
})
export class CorrelationModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(EventLadderCacheMiddleware).forRoutes({ path: 'graphql', method: RequestMethod.POST });
  }
}
