import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { paths } from '@/app/paths';
import { ADMIN_TABS, ProjectAdminView, type AdminTab } from '@/modules/team/components/ProjectAdminView';
import { teamQueries } from '@/modules/team/hooks/teamQueries';
import { PageBreadcrumbs } from '@/modules/ui/components/PageBreadcrumbs';

export function ProjectAdminPage() {
  const { projectId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const { data: project } = useSuspenseQuery(teamQueries.team(projectId));
  const tab = ADMIN_TABS.find((candidate) => candidate === search.get('tab')) ?? 'members';
  const handleTabChange = (next: AdminTab) => setSearch(next === 'members' ? {} : { tab: next }, { replace: true });
  return (
    <>
      <PageBreadcrumbs
        crumbs={[{ text: 'Projects', to: paths.projects() }, { text: project.name, to: paths.project(projectId) }, { text: 'Team and records' }]}
      />
      <ProjectAdminView project={project} tab={tab} onTabChange={handleTabChange} />
    </>
  );
}
