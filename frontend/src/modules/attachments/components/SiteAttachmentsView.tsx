import { Callout, Classes, H5, Intent, Section, SectionCard } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { attachmentQueries, useAttachmentMutations } from '@/modules/attachments/hooks/attachmentQueries';
import { attachmentView } from '@/modules/attachments/utils/attachmentFiles';
import { allows } from '@/modules/auth/utils/permissions';
import { fetchObjectUrl } from '@/modules/exchange/utils/authorizedHttp';
import { DeleteAlert } from '@/modules/ui/components/DeleteAlert';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { AttachmentList, type AttachmentRow } from './AttachmentList';
import { AttachmentPreviewDialog } from './AttachmentPreviewDialog';
import { AttachmentUploadForm, type UploadTarget } from './AttachmentUploadForm';
import './attachments.css';

export type SiteAttachmentsViewProps = { projectId: string; siteId: string };

/** Object URLs handed to another tab live a while, then go (the tab has read the file by then). */
const OBJECT_URL_LIFETIME_MS = 5 * 60_000;

/**
 * The files of a site and of its samples (trench logs, core photos, lab reports): listed, viewed
 * (images inline, PDFs in a new tab), uploaded and deleted by those who may change the site.
 */
export function SiteAttachmentsView({ projectId, siteId }: SiteAttachmentsViewProps) {
  const site = useQuery(attachmentQueries.site(projectId, siteId));
  const { remove } = useAttachmentMutations(projectId, siteId);
  const [previewing, setPreviewing] = useState<AttachmentRow | null>(null);
  const [deleting, setDeleting] = useState<AttachmentRow | null>(null);
  const [openError, setOpenError] = useState<unknown>(null);

  const targets = useMemo<UploadTarget[]>(
    () => [
      { key: `site:${siteId}`, label: 'This site', owner: { siteId } },
      ...[...(site.data?.samples ?? [])]
        .sort((a, b) => a.labCode.localeCompare(b.labCode))
        .map((sample) => ({ key: `sample:${sample.id}`, label: `Sample ${sample.labCode}`, owner: { sampleId: sample.id } })),
    ],
    [site.data, siteId],
  );

  if (site.isPending) return <LoadingState />;
  if (site.error) return <Callout intent={Intent.DANGER}>{formErrorOf(site.error, [])}</Callout>;
  const canEdit = allows(site.data.project, 'STRATIGRAPHY_WRITE');
  const samplesWithFiles = site.data.samples.filter((sample) => sample.attachments.length > 0).sort((a, b) => a.labCode.localeCompare(b.labCode));

  const handleOpen = (attachment: AttachmentRow) => {
    setOpenError(null);
    const view = attachmentView(attachment.contentType);
    if (view === 'image') {
      setPreviewing(attachment);
      return;
    }
    // The tab is opened inside the click, before the fetch, so a popup blocker lets it through.
    const tab = view === 'pdf' ? window.open('', '_blank') : null;
    fetchObjectUrl(attachment.url).then(
      (url) => {
        if (tab) tab.location.href = url;
        else {
          const link = document.createElement('a');
          link.href = url;
          link.download = attachment.fileName;
          link.click();
        }
        setTimeout(() => URL.revokeObjectURL(url), tab ? OBJECT_URL_LIFETIME_MS : 0);
      },
      (error: unknown) => {
        tab?.close();
        setOpenError(error);
      },
    );
  };
  const handleDelete = () => {
    if (deleting) remove.mutate({ id: deleting.id }, { onSuccess: () => setDeleting(null) });
  };
  const handleCancelDelete = () => {
    remove.reset();
    setDeleting(null);
  };

  return (
    <div className="sc-files">
      {canEdit && (
        <Section title="Add a file" compact icon={IconNames.UPLOAD}>
          <SectionCard>
            <AttachmentUploadForm projectId={projectId} siteId={siteId} targets={targets} />
          </SectionCard>
        </Section>
      )}
      {openError !== null && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {formErrorOf(openError, [])}
        </Callout>
      )}
      <Section title="Site files" compact icon={IconNames.FOLDER_CLOSE} className="sc-section">
        <SectionCard>
          <AttachmentList
            attachments={site.data.attachments}
            canEdit={canEdit}
            onOpen={handleOpen}
            onDelete={setDeleting}
            emptyText="No files on the site yet (trench logs, core photos, field notes)."
          />
        </SectionCard>
      </Section>
      <Section title="Sample files" compact icon={IconNames.LAB_TEST} className="sc-section">
        <SectionCard>
          {samplesWithFiles.length === 0 ? (
            <p className={Classes.TEXT_MUTED}>No sample has files yet (lab reports, sample photos).</p>
          ) : (
            samplesWithFiles.map((sample) => (
              <div key={sample.id} className="sc-file-group">
                <H5 className="num">{sample.labCode}</H5>
                <AttachmentList attachments={sample.attachments} canEdit={canEdit} onOpen={handleOpen} onDelete={setDeleting} emptyText="" />
              </div>
            ))
          )}
        </SectionCard>
      </Section>
      <AttachmentPreviewDialog attachment={previewing} onClose={() => setPreviewing(null)} />
      <DeleteAlert
        what={deleting ? <>the file <strong>{deleting.fileName}</strong></> : null}
        onConfirm={handleDelete}
        onCancel={handleCancelDelete}
        deleting={remove.isPending}
        error={remove.error}
      />
    </div>
  );
}
