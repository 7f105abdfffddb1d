import { Icon, Spinner, SpinnerSize } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useAttachmentObjectUrl } from '@/modules/attachments/hooks/useAttachmentObjectUrl';
import { attachmentView } from '@/modules/attachments/utils/attachmentFiles';

export type AttachmentThumbnailProps = { fileName: string; contentType: string; thumbnailUrl: string | null | undefined };

/** A small picture of an image file (fetched with the token); other files show their kind's icon. */
export function AttachmentThumbnail({ fileName, contentType, thumbnailUrl }: AttachmentThumbnailProps) {
  const view = attachmentView(contentType);
  const { url, error } = useAttachmentObjectUrl(view === 'image' && thumbnailUrl ? thumbnailUrl : null);
  if (view !== 'image' || !thumbnailUrl || error) {
    return <Icon icon={view === 'pdf' ? IconNames.DOCUMENT : view === 'image' ? IconNames.MEDIA : IconNames.TH} size={20} className="sc-file-icon" />;
  }
  if (!url) return <Spinner size={SpinnerSize.SMALL} />;
  return <img src={url} alt={fileName} className="sc-file-thumb" />;
}
