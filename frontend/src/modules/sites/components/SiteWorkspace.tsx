import { Tab, Tabs, type TabId } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { SiteTab } from '@/app/paths';
import { SiteAttachmentsView } from '@/modules/attachments/components/SiteAttachmentsView';
import { CoreLogsView } from '@/modules/core-logs/components/CoreLogsView';
import { allows } from '@/modules/auth/utils/permissions';
import { SiteCalibrationView } from '@/modules/calibration/components/SiteCalibrationView';
import { SiteDialog } from '@/modules/projects/components/SiteDialog';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { SamplesView } from '@/modules/samples/components/SamplesView';
import type { SiteDetail } from '@/modules/sites/utils/siteTypes';
import { SiteColumnView } from './SiteColumnView';
import { SiteHeader } from './SiteHeader';

export type SiteWorkspaceProps = {
  site: SiteDetail;
  tab: SiteTab;
  onTabChange: (tab: SiteTab) => void;
};

/** A site's page body: its facts, then the column, samples and calibration tabs. */
export function SiteWorkspace({ site, tab, onTabChange }: SiteWorkspaceProps) {
  const canEdit = allows(site.project, 'STRATIGRAPHY_WRITE');
  const [editingSite, setEditingSite] = useState(false);
  const { data: project } = useQuery({ ...projectQueries.overview(site.project.id), enabled: editingSite });
  const handleTabChange = (next: TabId) => onTabChange(next as SiteTab);

  return (
    <>
      <SiteHeader site={site} canEdit={canEdit} onEdit={() => setEditingSite(true)} />
      <Tabs id="site-tabs" selectedTabId={tab} onChange={handleTabChange} renderActiveTabPanelOnly large className="sc-tabs">
        <Tab id="column" icon={IconNames.LAYERS} title="Column" panel={<SiteColumnView site={site} canEdit={canEdit} />} />
        <Tab
          id="samples"
          icon={IconNames.LAB_TEST}
          title="Samples"
          tagContent={site.samples.length}
          tagProps={{ minimal: true, round: true }}
          panel={<SamplesView site={site} canEdit={canEdit} />}
        />
        <Tab
          id="calibration"
          icon={IconNames.TIMELINE_AREA_CHART}
          title="Calibration"
          panel={<SiteCalibrationView projectId={site.project.id} siteId={site.id} />}
        />
        {(site.kind === 'CORE' || site.kind === 'LAKE') && (
          <Tab id="logs" icon={IconNames.TIMELINE_LINE_CHART} title="Logs" panel={<CoreLogsView projectId={site.project.id} siteId={site.id} canEdit={canEdit} />} />
        )}
        <Tab id="files" icon={IconNames.PAPERCLIP} title="Files" panel={<SiteAttachmentsView projectId={site.project.id} siteId={site.id} />} />
      </Tabs>
      {editingSite && project && (
        <SiteDialog projectId={site.project.id} segments={project.segments} site={site} onClose={() => setEditingSite(false)} />
      )}
    </>
  );
}
