import { ApolloServerPluginCacheControlDisabled } from '@apollo/server/plugin/disabled';
import { ApolloDriver, ApolloDriverConfig } from '@nestjs/apollo';
import { Module } from '@nestjs/common';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { GraphQLModule } from '@nestjs/graphql';
import { join } from 'node:path';
import { AccessModule } from './access/access.module';
import { AgeModelsModule } from './age-models/age-models.module';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { CalibrationModule } from './calibration/calibration.module';
import { formatGraphqlError } from './common/errors/format-graphql-error';
import { GraphqlExceptionFilter } from './common/errors/graphql-exception.filter';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { compiledExecutionPlugin } from './common/compiled-execution';
import { answerJson } from './common/answer-json';
import { costLimitPlugin } from './common/graphql-cost';
import { inputScreeningPlugin } from './common/graphql-input-screen';
import { depthLimitRule } from './common/graphql-limits';
import { repositoryRoot } from './common/repo-paths';
import { DateTimeScalar, JsonScalar, NumberListScalar } from './common/scalars/scalars';
import { APP_CONFIG, AppConfig } from './config/config';
import { ConfigModule } from './config/config.module';
import { DatabaseModule } from './database/database.module';
import { DemoModule } from './demo/demo.module';
import { EventHorizonsModule } from './event-horizons/event-horizons.module';
import { HealthModule } from './health/health.module';
import { CoreLogsModule } from './core-logs/core-logs.module';
import { CorrelationModule } from './correlation/correlation.module';
import { JointRunsApiModule } from './correlation/joint-runs/joint-runs-api.module';
import { JobsModule } from './jobs/jobs.module';
import { LoadersModule } from './loaders/loaders.module';
import { RequestLoadersFactory } from './loaders/request-loaders';
import { EventLadderCache } from './correlation/ladder-cache/event-ladder-cache';
import { ProjectsModule } from './projects/projects.module';
import { ProvenanceApiModule } from './provenance/provenance-api.module';
import { RecurrenceModule } from './recurrence/recurrence.module';
import { SizeEvidenceModule } from './size-evidence/size-evidence.module';
import { SampleImportModule } from './sample-import/sample-import.module';
import { SamplesModule } from './samples/samples.module';
import { SegmentsModule } from './segments/segments.module';
import { SitesModule } from './sites/sites.module';
import { TeamModule } from './team/team.module';
import { UnitsModule } from './units/units.module';
import { UsersModule } from './users/users.module';
import { AttachmentsModule } from './attachments/attachments.module';
import { ExchangeModule } from './exchange/exchange.module';
import { ReleasesModule } from './releases/releases.module';

@Module({
  imports: [
    ConfigModule,
    DatabaseModule,
    AccessModule,
    AuditModule,
    AuthModule,
    GraphQLModule.forRootAsync<ApolloDriverConfig>({
      driver: ApolloDriver,
      imports: [LoadersModule, CorrelationModule],
      inject: [APP_CONFIG, RequestLoadersFactory, EventLadderCache],
      useFactory: (config: AppConfig, loaders: RequestLoadersFactory, ladderCache: EventLadderCache) => ({
        typePaths: [join(repositoryRoot(), 'schema.graphql')],
        path: '/graphql',
        resolvers: { DateTime: DateTimeScalar, JSON: JsonScalar, NumberList: NumberListScalar },
        playground: false,
        validationRules: [depthLimitRule()],
        // No field carries cache hints, and the default cache-control plugin's per-field hook
        // cost ~10 % of executing a large answer such as the event ladder.
        // Inputs are screened (ids, NUL) and the operation priced before any resolver runs.
        // Compiled execution last: its answer replaces execution once the others have run.
        plugins: [ApolloServerPluginCacheControlDisabled(), inputScreeningPlugin(), costLimitPlugin(), ladderCache.plugin(), compiledExecutionPlugin(config.graphqlCompileAfter)],
        // One serialisation per answer, shared with the answer-size cap and the ladder cache.
        stringifyResult: answerJson,
        introspection: config.nodeEnv !== 'production',
        includeStacktraceInErrorResponses: false,
        context: ({ req }: { req: unknown }) => ({ req, loaders: loaders.create() }),
        formatError: (formatted) => formatGraphqlError(formatted, config.nodeEnv === 'production'),
      }),
    }),
    HealthModule,
    UsersModule,
    ProjectsModule,
    ProvenanceApiModule,
    SegmentsModule,
    SitesModule,
    UnitsModule,
    EventHorizonsModule,
    CalibrationModule,
    SamplesModule,
    SampleImportModule,
    DemoModule,
    JobsModule,
    AgeModelsModule,
    RecurrenceModule,
    SizeEvidenceModule,
    CorrelationModule,
    JointRunsApiModule,
    CoreLogsModule,
    AttachmentsModule,
    ExchangeModule,
    ReleasesModule,
    TeamModule,
  ],
  providers: [
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_FILTER, useClass: GraphqlExceptionFilter },
  ],
})
export class AppModule {}
