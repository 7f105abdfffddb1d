import { Button, Callout, Dialog, DialogBody, DialogFooter, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { formErrorOf } from '@/modules/api/utils/apiError';
import { useAttachmentObjectUrl } from '@/modules/attachments/hooks/useAttachmentObjectUrl';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import type { AttachmentRow } from './AttachmentList';

export type AttachmentPreviewDialogProps = { attachment: AttachmentRow | null; onClose: () => void };

/** An image attachment at full width, fetched with the token. */
export function AttachmentPreviewDialog({ attachment, onClose }: AttachmentPreviewDialogProps) {
  const { url, error } = useAttachmentObjectUrl(attachment?.url ?? null);
  return (
    <Dialog isOpen={attachment !== null} onClose={onClose} title={attachment?.fileName} icon={IconNames.MEDIA} style={{ width: 'min(1100px, 94vw)' }}>
      <DialogBody>
        {error ? (
          <Callout intent={Intent.DANGER}>{formErrorOf(error, [])}</Callout>
        ) : url ? (
          <img src={url} alt={attachment?.fileName} className="sc-file-preview" />
        ) : (
          <LoadingState label="Loading the image" />
        )}
      </DialogBody>
      <DialogFooter actions={<Button text="Close" onClick={onClose} />} />
    </Dialog>
  );
}
