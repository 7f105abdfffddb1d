import { Classes, H2 } from '@blueprintjs/core';
import { useSuspenseQuery } from '@tanstack/react-query';
import { ProjectList } from '@/modules/projects/components/ProjectList';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';

export function ProjectListPage() {
  const { data: projects } = useSuspenseQuery(projectQueries.list());
  return (
    <div className="sc-page">
      <header className="sc-page-header">
        <div>
          <H2 className="sc-page-title">Your projects</H2>
          <p className={`${Classes.TEXT_MUTED} sc-lead`}>Each project keeps its own sites, samples and analyses; your role is set per project.</p>
        </div>
      </header>
      <ProjectList projects={projects} />
    </div>
  );
}
