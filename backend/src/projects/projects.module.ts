import { Module } from '@nestjs/common';
import { SegmentsModule } from '../segments/segments.module';
import { SitesModule } from '../sites/sites.module';
import { PROJECT_FIELD_RESOLVERS } from './project-parent.resolver';
import { ProjectsRepository } from './projects.repository';
import { ProjectsResolver } from './projects.resolver';
import { ProjectsService } from './projects.service';

@Module({
  imports: [SegmentsModule, SitesModule],
  providers: [ProjectsRepository, ProjectsService, ProjectsResolver, ...PROJECT_FIELD_RESOLVERS],
  exports: [ProjectsService, ProjectsRepository],
})
export class ProjectsModule {}
