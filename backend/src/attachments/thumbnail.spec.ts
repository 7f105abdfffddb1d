import { decode as decodeJpeg, encode as encodeJpeg } from 'jpeg-js';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { downscale, makeThumbnail, pngDimensions, RgbaImage, THUMBNAIL_MAX_SIDE, thumbnailSize, ThumbnailRefused } from './thumbnail';

function image(width: number, height: number, pixel: (x: number, y: number) => [number, number, number, number]): RgbaImage {
  const data = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) data.set(pixel(x, y), (y * width + x) * 4);
  }
  return { width, height, data };
}

function pngOf(source: RgbaImage): Uint8Array {
  const png = new PNG({ width: source.width, height: source.height });
  png.data = Buffer.from(source.data);
  return new Uint8Array(PNG.sync.write(png));
}

const pixelAt = (img: RgbaImage, x: number, y: number) => Array.from(img.data.slice((y * img.width + x) * 4, (y * img.width + x) * 4 + 4));

describe(downscale.name, () => {
  // Area averaging [analytic]: 3 -> 2 pixels gives each target 1.5 source pixels, so values
  // [0, 90, 180] become (0 x 1 + 90 x 0.5) / 1.5 = 30 and (90 x 0.5 + 180 x 1) / 1.5 = 150.
  it('averages the source area each target pixel covers, fractional edges included', () => {
    const source = image(3, 1, (x) => [x * 90, x * 90, x * 90, 255]);
    const small = downscale(source, 2, 1);
    expect(pixelAt(small, 0, 0)).toEqual([30, 30, 30, 255]);
    expect(pixelAt(small, 1, 0)).toEqual([150, 150, 150, 255]);
  });

  it('keeps a uniform image uniform and halves a two-colour split exactly', () => {
    const split = image(4, 2, (x) => (x < 2 ? [0, 0, 0, 255] : [255, 255, 255, 255]));
    const small = downscale(split, 2, 1);
    expect(pixelAt(small, 0, 0)).toEqual([0, 0, 0, 255]);
    expect(pixelAt(small, 1, 0)).toEqual([255, 255, 255, 255]);
    const uniform = downscale(image(640, 480, () => [12, 140, 200, 255]), 320, 240);
    expect(new Set(Array.from({ length: 320 * 240 }, (_, i) => pixelAt(uniform, i % 320, Math.floor(i / 320)).join()))).toEqual(new Set(['12,140,200,255']));
  });

  // Premultiplied averaging [analytic]: a transparent red pixel beside an opaque blue one gives
  // blue at half alpha; averaging straight RGBA would give purple.
  it('lends no colour from transparent pixels', () => {
    const source = image(2, 1, (x) => (x === 0 ? [255, 0, 0, 0] : [0, 0, 255, 255]));
    expect(pixelAt(downscale(source, 1, 1), 0, 0)).toEqual([0, 0, 255, 128]);
  });
});

describe(thumbnailSize.name, () => {
  it('fits the longest side to the limit, keeps the aspect and never enlarges', () => {
    expect(thumbnailSize(4000, 3000)).toEqual({ width: THUMBNAIL_MAX_SIDE, height: 240 });
    expect(thumbnailSize(300, 9000)).toEqual({ width: 11, height: THUMBNAIL_MAX_SIDE });
    expect(thumbnailSize(120, 80)).toEqual({ width: 120, height: 80 });
  });
});

describe(makeThumbnail.name, () => {
  it('makes a PNG thumbnail of a PNG with the shrunk pixels', () => {
    const source = image(800, 600, (x) => (x < 400 ? [200, 30, 30, 255] : [30, 30, 200, 255]));
    const thumbnail = makeThumbnail(pngOf(source), 'image/png');
    expect(thumbnail).toMatchObject({ contentType: 'image/png', width: 320, height: 240 });
    const decoded = PNG.sync.read(Buffer.from(thumbnail.bytes));
    expect([decoded.width, decoded.height]).toEqual([320, 240]);
    expect(Array.from(decoded.data.subarray(0, 4))).toEqual([200, 30, 30, 255]);
    expect(Array.from(decoded.data.subarray((320 * 240 - 1) * 4))).toEqual([30, 30, 200, 255]);
  });

  it('makes a JPEG thumbnail of a JPEG', () => {
    const source = image(1000, 500, (x) => [Math.round((x / 999) * 255), 128, 64, 255]);
    const jpeg = new Uint8Array(encodeJpeg({ width: 1000, height: 500, data: source.data }, 90).data);
    const thumbnail = makeThumbnail(jpeg, 'image/jpeg');
    expect(thumbnail).toMatchObject({ contentType: 'image/jpeg', width: 320, height: 160 });
    const decoded = decodeJpeg(thumbnail.bytes, { useTArray: true });
    expect([decoded.width, decoded.height]).toEqual([320, 160]);
    // The red channel still runs from dark at the left edge to bright at the right, within JPEG's loss.
    expect(decoded.data[((80 * 320) + 2) * 4]).toBeLessThan(30);
    expect(decoded.data[((80 * 320) + 317) * 4]).toBeGreaterThan(225);
  });

  it('refuses, without decoding, a PNG that declares more pixels than the limit', () => {
    const header = pngOf(image(1, 1, () => [0, 0, 0, 255]));
    const view = new DataView(header.buffer, header.byteOffset);
    view.setUint32(16, 50_000);
    view.setUint32(20, 50_000);
    expect(pngDimensions(header)).toEqual({ width: 50_000, height: 50_000 });
    expect(() => makeThumbnail(header, 'image/png')).toThrow(ThumbnailRefused);
  });

  it('refuses bytes that do not decode', () => {
    expect(() => makeThumbnail(Uint8Array.of(0xff, 0xd8, 0xff, 0xe0, 1, 2, 3), 'image/jpeg')).toThrow(ThumbnailRefused);
  });
});
