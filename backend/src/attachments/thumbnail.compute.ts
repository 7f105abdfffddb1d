import { computeTask } from '../jobs/compute-task';
import { makeThumbnail, Thumbnail, ThumbnailContentType } from './thumbnail';

/** What a thumbnail's computation thread is given. */
export interface ThumbnailComputeInput {
  bytes: Uint8Array;
  contentType: ThumbnailContentType;
}

/** Decoding and downscaling an image (thumbnail.ts), run in a worker thread. */
export const thumbnailCompute = computeTask(__filename, 'thumbnailCompute', (request: ThumbnailComputeInput): Thumbnail =>
  makeThumbnail(request.bytes, request.contentType),
);
