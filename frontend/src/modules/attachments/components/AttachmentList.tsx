import { Button, Classes, HTMLTable, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { SiteAttachmentsQuery } from '@/gql/graphql';
import { attachmentView, contentTypeLabel, formatBytes } from '@/modules/attachments/utils/attachmentFiles';
import { AttachmentThumbnail } from './AttachmentThumbnail';

export type AttachmentRow = SiteAttachmentsQuery['site']['attachments'][number];

export type AttachmentListProps = {
  attachments: readonly AttachmentRow[];
  canEdit: boolean;
  /** Show or open a file (image inline, PDF in a tab, anything else downloaded). */
  onOpen: (attachment: AttachmentRow) => void;
  onDelete: (attachment: AttachmentRow) => void;
  emptyText: string;
};

/** Files with their name, type and size; newest first. */
export function AttachmentList({ attachments, canEdit, onOpen, onDelete, emptyText }: AttachmentListProps) {
  if (attachments.length === 0) return <p className={Classes.TEXT_MUTED}>{emptyText}</p>;
  const newestFirst = [...attachments].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <HTMLTable compact striped className="sc-table sc-table-fill sc-file-table">
      <thead>
        <tr>
          <th aria-label="Preview" />
          <th>File</th>
          <th>Type</th>
          <th className="sc-numeric">Size</th>
          <th>Added</th>
          <th aria-label="Actions" />
        </tr>
      </thead>
      <tbody>
        {newestFirst.map((attachment) => {
          const view = attachmentView(attachment.contentType);
          return (
            <tr key={attachment.id}>
              <td className="sc-file-thumb-cell">
                <AttachmentThumbnail fileName={attachment.fileName} contentType={attachment.contentType} thumbnailUrl={attachment.thumbnailUrl} />
              </td>
              <td>{attachment.fileName}</td>
              <td>{contentTypeLabel(attachment.contentType)}</td>
              <td className="num sc-numeric">{formatBytes(attachment.sizeBytes)}</td>
              <td className="num">{new Date(attachment.createdAt).toLocaleDateString()}</td>
              <td className="sc-actions-cell">
                <Button
                  icon={view === 'image' ? IconNames.EYE_OPEN : view === 'pdf' ? IconNames.SHARE : IconNames.DOWNLOAD}
                  text={view === 'image' ? 'View' : view === 'pdf' ? 'Open' : 'Download'}
                  variant="minimal"
                  size="small"
                  onClick={() => onOpen(attachment)}
                />
                {canEdit && (
                  <Button
                    icon={IconNames.TRASH}
                    variant="minimal"
                    size="small"
                    intent={Intent.DANGER}
                    aria-label={`Delete ${attachment.fileName}`}
                    onClick={() => onDelete(attachment)}
                  />
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </HTMLTable>
  );
}
