import { Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { ProjectRow, ProjectsRepository } from './projects.repository';

interface HasProject {
  projectId: string;
}

/** `project` on every type that belongs to one; the parent was already authorised. */
function projectFieldResolver(typeName: string) {
  @Resolver(typeName)
  class ProjectFieldResolver {
    constructor(readonly projects: ProjectsRepository) {}

    @ResolveField('project')
    project(@Parent() parent: HasProject): Promise<ProjectRow | undefined> {
      return this.projects.findById(parent.projectId);
    }
  }
  Object.defineProperty(ProjectFieldResolver, 'name', { value: `${typeName}ProjectResolver` });
  return ProjectFieldResolver;
}

export const PROJECT_FIELD_RESOLVERS = ['Segment', 'Site', 'Hypothesis', 'RecurrenceAnalysis', 'Release'].map(projectFieldResolver);
