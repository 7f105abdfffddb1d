import { describe, expect, it } from 'vitest';
import { attachmentUploadUrl, attachmentView, awaitsThumbnail, contentTypeLabel, formatBytes, MAX_ATTACHMENT_BYTES, THUMBNAIL_WAIT_MS, uploadProblem } from './attachmentFiles';

describe(attachmentUploadUrl.name, () => {
  it('names the owner and the file in the query, encoded (WHATWG URLSearchParams form encoding)', () => {
    expect(attachmentUploadUrl({ siteId: 'a1' }, 'Trench log & wall B.png')).toBe('/api/attachments?siteId=a1&fileName=Trench+log+%26+wall+B.png');
    expect(attachmentUploadUrl({ sampleId: 's9' }, 'report.pdf')).toBe('/api/attachments?sampleId=s9&fileName=report.pdf');
    expect(attachmentUploadUrl({ unitId: 'u3' }, 'x.csv')).toBe('/api/attachments?unitId=u3&fileName=x.csv');
  });
});

describe(formatBytes.name, () => {
  it('writes bytes, then binary kilo- and megabytes', () => {
    expect(formatBytes(0)).toBe('0 B');
    expect(formatBytes(1023)).toBe('1023 B');
    expect(formatBytes(1536)).toBe('1.5 KB');
    expect(formatBytes(300 * 1024)).toBe('300 KB');
    expect(formatBytes(MAX_ATTACHMENT_BYTES)).toBe('20 MB');
    expect(formatBytes(5 * 1024 * 1024 * 1024)).toBe('5.0 GB');
  });
});

describe(attachmentView.name, () => {
  it('shows images inline, PDFs in a tab and the rest as downloads', () => {
    expect(['image/png', 'image/jpeg', 'application/pdf', 'text/csv', 'text/plain; charset=utf-8'].map(attachmentView)).toEqual([
      'image',
      'image',
      'pdf',
      'download',
      'download',
    ]);
  });
});

describe(contentTypeLabel.name, () => {
  it('labels the accepted types and passes others through', () => {
    expect(contentTypeLabel('application/pdf')).toBe('PDF');
    expect(contentTypeLabel('text/csv; charset=utf-8')).toBe('CSV table');
    expect(contentTypeLabel('application/zip')).toBe('application/zip');
  });
});

describe(uploadProblem.name, () => {
  it('refuses empty and oversized files before sending, and leaves the type to the server', () => {
    expect(uploadProblem({ size: 0 })).toBe('the file is empty');
    expect(uploadProblem({ size: 25 * 1024 * 1024 })).toBe('the file is 25 MB, larger than the 20 MB accepted');
    expect(uploadProblem({ size: MAX_ATTACHMENT_BYTES + 1 })).not.toBeNull();
    expect(uploadProblem({ size: MAX_ATTACHMENT_BYTES })).toBeNull();
  });
});

describe('awaitsThumbnail', () => {
  const now = Date.parse('2026-12-02T10:00:00Z');
  const at = (secondsAgo: number) => new Date(now - secondsAgo * 1000).toISOString();

  it('waits for a fresh image without a thumbnail, and for nothing else', () => {
    expect(awaitsThumbnail([{ contentType: 'image/png', createdAt: at(5), thumbnailUrl: null }], now)).toBe(true);
    expect(awaitsThumbnail([{ contentType: 'image/png', createdAt: at(5), thumbnailUrl: '/api/attachments/a/thumbnail' }], now)).toBe(false);
    expect(awaitsThumbnail([{ contentType: 'application/pdf', createdAt: at(5), thumbnailUrl: null }], now)).toBe(false);
    expect(awaitsThumbnail([], now)).toBe(false);
  });

  it('gives up on an image that got no thumbnail within the wait', () => {
    expect(awaitsThumbnail([{ contentType: 'image/jpeg', createdAt: at(THUMBNAIL_WAIT_MS / 1000 + 1), thumbnailUrl: null }], now)).toBe(false);
  });
});
