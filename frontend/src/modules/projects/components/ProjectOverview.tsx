import { Button, Classes, H2, Intent, Section, SectionCard, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState } from 'react';
import { allows, ROLE_LABELS } from '@/modules/auth/utils/permissions';
import { SiteMap } from '@/modules/map/components/SiteMap';
import { useSegmentMutations, useSiteMutations } from '@/modules/projects/hooks/projectMutations';
import type { ProjectOverview as ProjectOverviewData, SegmentRow, SiteRow } from '@/modules/projects/utils/projectTypes';
import { DeleteAlert } from '@/modules/ui/components/DeleteAlert';
import { SegmentDialog } from './SegmentDialog';
import { SegmentsTable } from './SegmentsTable';
import { SiteDialog } from './SiteDialog';
import { SitesTable } from './SitesTable';

export type ProjectOverviewProps = {
  project: ProjectOverviewData;
};

/** A project at a glance: its segments, the map of its sites and the sites table, with their forms. */
export function ProjectOverview({ project }: ProjectOverviewProps) {
  const canEdit = allows(project, 'STRATIGRAPHY_WRITE');
  const [editingSegment, setEditingSegment] = useState<SegmentRow | 'new' | null>(null);
  const [deletingSegment, setDeletingSegment] = useState<SegmentRow | null>(null);
  const [editingSite, setEditingSite] = useState<SiteRow | 'new' | null>(null);
  const [deletingSite, setDeletingSite] = useState<SiteRow | null>(null);
  const segmentMutations = useSegmentMutations(project.id);
  const siteMutations = useSiteMutations(project.id);

  const handleDeleteSegment = () => {
    if (!deletingSegment) return;
    segmentMutations.remove.mutate({ id: deletingSegment.id }, { onSuccess: () => setDeletingSegment(null) });
  };
  const handleDeleteSite = () => {
    if (!deletingSite) return;
    siteMutations.remove.mutate({ id: deletingSite.id }, { onSuccess: () => setDeletingSite(null) });
  };
  const handleCancelSegmentDelete = () => {
    segmentMutations.remove.reset();
    setDeletingSegment(null);
  };
  const handleCancelSiteDelete = () => {
    siteMutations.remove.reset();
    setDeletingSite(null);
  };

  return (
    <div className="sc-page">
      <header className="sc-page-header">
        <div>
          <H2 className="sc-page-title">{project.name}</H2>
          <div className="sc-tag-row">
            <Tag minimal className="sc-role-tag">
              Your role: {ROLE_LABELS[project.myRole]}
            </Tag>
            {!canEdit && (
              <Tag minimal icon={IconNames.EYE_OPEN}>
                Read only
              </Tag>
            )}
          </div>
          {project.description && <p className={`${Classes.TEXT_MUTED} sc-lead`}>{project.description}</p>}
        </div>
      </header>

      <div className="sc-overview-grid">
        <SiteMap projectId={project.id} sites={project.sites} segments={project.segments} />
        <Section
          title="Segments"
          compact
          rightElement={
            canEdit ? (
              <Button icon={IconNames.ADD} text="Add segment" variant="minimal" intent={Intent.PRIMARY} onClick={() => setEditingSegment('new')} />
            ) : undefined
          }
        >
          <SectionCard padded={false}>
            <SegmentsTable
              segments={project.segments}
              sites={project.sites}
              canEdit={canEdit}
              onEdit={setEditingSegment}
              onDelete={setDeletingSegment}
            />
          </SectionCard>
        </Section>
      </div>

      <Section
        title="Sites"
        compact
        className="sc-section"
        rightElement={
          canEdit ? <Button icon={IconNames.ADD} text="Add site" variant="minimal" intent={Intent.PRIMARY} onClick={() => setEditingSite('new')} /> : undefined
        }
      >
        <SectionCard>
          <SitesTable projectId={project.id} sites={project.sites} canEdit={canEdit} onEdit={setEditingSite} onDelete={setDeletingSite} />
        </SectionCard>
      </Section>

      {editingSegment && (
        <SegmentDialog projectId={project.id} segment={editingSegment === 'new' ? null : editingSegment} onClose={() => setEditingSegment(null)} />
      )}
      {editingSite && (
        <SiteDialog
          projectId={project.id}
          segments={project.segments}
          site={editingSite === 'new' ? null : editingSite}
          onClose={() => setEditingSite(null)}
        />
      )}
      <DeleteAlert
        what={deletingSegment ? <>segment <strong>{deletingSegment.name}</strong></> : null}
        onConfirm={handleDeleteSegment}
        onCancel={handleCancelSegmentDelete}
        deleting={segmentMutations.remove.isPending}
        error={segmentMutations.remove.error}
      />
      <DeleteAlert
        what={deletingSite ? <>site <strong>{deletingSite.name}</strong></> : null}
        onConfirm={handleDeleteSite}
        onCancel={handleCancelSiteDelete}
        deleting={siteMutations.remove.isPending}
        error={siteMutations.remove.error}
      >
        {deletingSite && (deletingSite.samples.length > 0 || deletingSite.eventHorizons.length > 0) && (
          <p>
            It holds <span className="num">{deletingSite.eventHorizons.length}</span> event horizons and{' '}
            <span className="num">{deletingSite.samples.length}</span> samples.
          </p>
        )}
      </DeleteAlert>
    </div>
  );
}
