/**
 * Thumbnails of image attachments (PNG and JPEG): decode with pngjs or jpeg-js (pure
 * JavaScript codecs), shrink by area averaging, encode in the original format. Plain functions
 * of bytes, so a worker thread can run them. No I/O here.
 */
import { decode as decodeJpeg, encode as encodeJpeg } from 'jpeg-js';
import { PNG } from 'pngjs';

/** Longest side of a thumbnail, pixels; smaller images keep their size. */
export const THUMBNAIL_MAX_SIDE = 320;
/** Images with more pixels than this are not decoded (a small file can declare a huge image). */
export const MAX_THUMBNAIL_SOURCE_MEGAPIXELS = 64;
/** JPEG quality of thumbnails (0-100) [common practice for previews]. */
const JPEG_QUALITY = 80;

export type ThumbnailContentType = 'image/png' | 'image/jpeg';

export interface Thumbnail {
  bytes: Uint8Array;
  contentType: ThumbnailContentType;
  width: number;
  height: number;
}

/** An image that gets no thumbnail (too large, or not decodable); the attachment stays usable. */
export class ThumbnailRefused extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ThumbnailRefused';
  }
}

/** RGBA pixels, 4 bytes per pixel, rows top to bottom. */
export interface RgbaImage {
  width: number;
  height: number;
  data: Uint8Array;
}

/** Width and height from a PNG's IHDR chunk (RFC 2083 section 4.1.1: bytes 16-23, big-endian). */
export function pngDimensions(bytes: Uint8Array): { width: number; height: number } {
  if (bytes.length < 24) throw new ThumbnailRefused('the PNG is too short to hold its header');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

function decode(bytes: Uint8Array, contentType: ThumbnailContentType): RgbaImage {
  const limitPixels = MAX_THUMBNAIL_SOURCE_MEGAPIXELS * 1e6;
  try {
    if (contentType === 'image/png') {
      const { width, height } = pngDimensions(bytes);
      if (width * height > limitPixels) {
        throw new ThumbnailRefused(`the image is ${width} x ${height} pixels, more than ${MAX_THUMBNAIL_SOURCE_MEGAPIXELS} megapixels`);
      }
      const png = PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      return { width: png.width, height: png.height, data: png.data };
    }
    const jpeg = decodeJpeg(bytes, { useTArray: true, formatAsRGBA: true, maxResolutionInMP: MAX_THUMBNAIL_SOURCE_MEGAPIXELS, maxMemoryUsageInMB: 1024 });
    return { width: jpeg.width, height: jpeg.height, data: jpeg.data };
  } catch (error) {
    if (error instanceof ThumbnailRefused) throw error;
    throw new ThumbnailRefused(`the image could not be decoded: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/**
 * Source spans of each target pixel along one axis: target pixel t covers source [t r, (t+1) r)
 * with r = source / target; each source pixel it touches weighs by its overlap.
 */
function spans(source: number, target: number): { first: Int32Array; weights: Float64Array[] } {
  const ratio = source / target;
  const first = new Int32Array(target);
  const weights: Float64Array[] = [];
  for (let t = 0; t < target; t++) {
    const start = t * ratio;
    const end = Math.min(source, (t + 1) * ratio);
    const from = Math.floor(start);
    const to = Math.min(source, Math.ceil(end));
    const w = new Float64Array(to - from);
    for (let s = from; s < to; s++) w[s - from] = (Math.min(end, s + 1) - Math.max(start, s)) / ratio;
    first[t] = from;
    weights.push(w);
  }
  return { first, weights };
}

/**
 * Shrink by area averaging: each target pixel is the mean of the source area it covers (the
 * box filter, exact for any ratio), on premultiplied alpha so transparent pixels lend no colour.
 */
export function downscale(image: RgbaImage, width: number, height: number): RgbaImage {
  const { width: sw, height: sh, data } = image;
  const xs = spans(sw, width);
  const ys = spans(sh, height);
  // Horizontal pass into premultiplied floats: sw x sh -> width x sh.
  const row = new Float64Array(width * sh * 4);
  for (let y = 0; y < sh; y++) {
    for (let x = 0; x < width; x++) {
      let r = 0, g = 0, b = 0, a = 0;
      const w = xs.weights[x];
      for (let k = 0; k < w.length; k++) {
        const i = (y * sw + xs.first[x] + k) * 4;
        const alpha = data[i + 3] * w[k];
        r += data[i] * alpha;
        g += data[i + 1] * alpha;
        b += data[i + 2] * alpha;
        a += alpha;
      }
      const o = (y * width + x) * 4;
      row[o] = r;
      row[o + 1] = g;
      row[o + 2] = b;
      row[o + 3] = a;
    }
  }
  // Vertical pass, then back to straight alpha.
  const out = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) {
    const w = ys.weights[y];
    for (let x = 0; x < width; x++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let k = 0; k < w.length; k++) {
        const i = ((ys.first[y] + k) * width + x) * 4;
        r += row[i] * w[k];
        g += row[i + 1] * w[k];
        b += row[i + 2] * w[k];
        a += row[i + 3] * w[k];
      }
      const o = (y * width + x) * 4;
      if (a > 0) {
        out[o] = Math.round(r / a);
        out[o + 1] = Math.round(g / a);
        out[o + 2] = Math.round(b / a);
      }
      out[o + 3] = Math.round(a);
    }
  }
  return { width, height, data: out };
}

/** The size a thumbnail of `width` x `height` gets: the longest side at most THUMBNAIL_MAX_SIDE, never enlarged. */
export function thumbnailSize(width: number, height: number, maxSide = THUMBNAIL_MAX_SIDE): { width: number; height: number } {
  const scale = Math.min(1, maxSide / Math.max(width, height));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}

/** A thumbnail in the image's own format. Throws ThumbnailRefused for an image that gets none. */
export function makeThumbnail(bytes: Uint8Array, contentType: ThumbnailContentType, maxSide = THUMBNAIL_MAX_SIDE): Thumbnail {
  const image = decode(bytes, contentType);
  const size = thumbnailSize(image.width, image.height, maxSide);
  const small = size.width === image.width && size.height === image.height ? image : downscale(image, size.width, size.height);
  if (contentType === 'image/png') {
    const encoded = PNG.sync.write({ width: small.width, height: small.height, data: Buffer.from(small.data.buffer, small.data.byteOffset, small.data.byteLength) } as PNG);
    return { bytes: new Uint8Array(encoded), contentType, width: small.width, height: small.height };
  }
  const encoded = encodeJpeg({ width: small.width, height: small.height, data: small.data }, JPEG_QUALITY);
  return { bytes: new Uint8Array(encoded.data), contentType, width: small.width, height: small.height };
}
