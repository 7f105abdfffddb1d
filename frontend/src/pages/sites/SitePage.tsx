import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { paths, type SiteTab } from '@/app/paths';
import { SiteWorkspace } from '@/modules/sites/components/SiteWorkspace';
import { siteQueries } from '@/modules/sites/hooks/siteQueries';
import { PageBreadcrumbs } from '@/modules/ui/components/PageBreadcrumbs';

const TABS: readonly SiteTab[] = ['column', 'samples', 'calibration', 'logs', 'files'];

export function SitePage() {
  const { projectId = '', siteId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const { data: site } = useSuspenseQuery(siteQueries.column(projectId, siteId));
  const tab = TABS.find((candidate) => candidate === search.get('tab')) ?? 'column';
  const handleTabChange = (next: SiteTab) => setSearch(next === 'column' ? {} : { tab: next }, { replace: true });
  return (
    <div className="sc-page">
      <PageBreadcrumbs
        crumbs={[
          { text: 'Projects', to: paths.projects() },
          { text: site.project.name, to: paths.project(projectId) },
          { text: site.name },
        ]}
      />
      <SiteWorkspace site={site} tab={tab} onTabChange={handleTabChange} />
    </div>
  );
}
