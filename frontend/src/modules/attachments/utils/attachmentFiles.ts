/** What an attachment belongs to: the upload route takes exactly one of these. */
export type AttachmentOwner = { siteId: string } | { unitId: string } | { sampleId: string };

/** The most the server takes (backend attachments.service.ts MAX_ATTACHMENT_BYTES). */
export const MAX_ATTACHMENT_BYTES = 20 * 1024 * 1024;

/** The types the server accepts, judged by content (backend attachments/content-type.ts). */
export const ACCEPTED_FILE_TYPES = '.png,.jpg,.jpeg,.pdf,.csv,.txt,image/png,image/jpeg,application/pdf,text/csv,text/plain';

/**
 * The upload URL: `POST /api/attachments?<owner>=<id>&fileName=<name>` with the raw bytes as the
 * body (backend attachments.controller.ts).
 */
export function attachmentUploadUrl(owner: AttachmentOwner, fileName: string): string {
  const [key, id] = Object.entries(owner)[0] ?? ['siteId', ''];
  const query = new URLSearchParams({ [key]: id, fileName });
  return `/api/attachments?${query.toString()}`;
}

/** A size in bytes as people read it, in binary multiples (1 KB = 1024 bytes, as the server's limit). */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  const units = ['KB', 'MB', 'GB'];
  let value = bytes / 1024;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${value < 10 ? value.toFixed(1) : Math.round(value)} ${units[unit]}`;
}

export type AttachmentView = 'image' | 'pdf' | 'download';

/** How the app shows a file: images inline, PDFs in a new tab, anything else as a download. */
export function attachmentView(contentType: string): AttachmentView {
  const type = contentType.split(';')[0]?.trim().toLowerCase() ?? '';
  if (type === 'image/png' || type === 'image/jpeg') return 'image';
  if (type === 'application/pdf') return 'pdf';
  return 'download';
}

/** A short label for a content type ("PNG image", "PDF", "CSV table"). */
export function contentTypeLabel(contentType: string): string {
  const type = contentType.split(';')[0]?.trim().toLowerCase() ?? '';
  switch (type) {
    case 'image/png':
      return 'PNG image';
    case 'image/jpeg':
      return 'JPEG image';
    case 'application/pdf':
      return 'PDF';
    case 'text/csv':
      return 'CSV table';
    case 'text/plain':
      return 'Text';
    default:
      return type || 'unknown';
  }
}

/** A refusal to give before sending anything: only the size can be judged here, the type is the server's to judge. */
export function uploadProblem(file: { size: number }): string | null {
  if (file.size === 0) return 'the file is empty';
  if (file.size > MAX_ATTACHMENT_BYTES) return `the file is ${formatBytes(file.size)}, larger than the ${formatBytes(MAX_ATTACHMENT_BYTES)} accepted`;
  return null;
}

/** How long after an upload the page keeps looking for an image's thumbnail, which a worker makes. */
export const THUMBNAIL_WAIT_MS = 2 * 60_000;

type ListedAttachment = { contentType: string; createdAt: string; thumbnailUrl?: string | null };

/** True while an image uploaded less than THUMBNAIL_WAIT_MS ago still has no thumbnail. */
export function awaitsThumbnail(attachments: readonly ListedAttachment[], now = Date.now()): boolean {
  return attachments.some(
    (a) => attachmentView(a.contentType) === 'image' && !a.thumbnailUrl && now - new Date(a.createdAt).getTime() < THUMBNAIL_WAIT_MS,
  );
}
