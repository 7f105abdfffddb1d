import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ProjectOverview } from '@/modules/projects/components/ProjectOverview';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { PageBreadcrumbs } from '@/modules/ui/components/PageBreadcrumbs';

export function ProjectOverviewPage() {
  const { projectId = '' } = useParams();
  const { data: project } = useSuspenseQuery(projectQueries.overview(projectId));
  return (
    <>
      <PageBreadcrumbs crumbs={[{ text: 'Projects', to: paths.projects() }, { text: project.name }]} />
      <ProjectOverview project={project} />
    </>
  );
}
