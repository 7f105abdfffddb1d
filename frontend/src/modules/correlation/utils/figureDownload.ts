import { figureDocument, figureFileName } from '@/modules/correlation/utils/figureExport';

function downloadBlob(fileName: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

function svgText(svg: SVGSVGElement, title: string, caption?: string): { text: string; width: number; height: number } {
  const { width, height } = svg.getBoundingClientRect();
  let drawn: { x: number; y: number; width: number; height: number } | null = null;
  try {
    drawn = svg.getBBox();
  } catch {
    drawn = null; // not rendered (hidden): keep the chart's own size
  }
  return figureDocument(svg.outerHTML, { width: Math.round(width), height: Math.round(height), title, caption, drawn });
}

/** Save a chart as an SVG file: title above, caption (units, marks) beneath, nothing cut. */
export function downloadSvgFigure(svg: SVGSVGElement, title: string, caption?: string): void {
  const { text } = svgText(svg, title, caption);
  downloadBlob(figureFileName(title, 'svg'), new Blob([text], { type: 'image/svg+xml;charset=utf-8' }));
}

/**
 * Save a chart as a PNG: the serialised SVG is drawn on a canvas at `pixelRatio` times its
 * size (2 gives print-friendly sharpness) and the canvas encoded.
 */
export async function downloadPngFigure(svg: SVGSVGElement, title: string, caption?: string, pixelRatio = 2): Promise<void> {
  const { text, width, height } = svgText(svg, title, caption);
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml;charset=utf-8' }));
  try {
    const image = new Image();
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the figure could not be drawn as an image'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * pixelRatio);
    canvas.height = Math.round(height * pixelRatio);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('this browser cannot draw on a canvas');
    context.scale(pixelRatio, pixelRatio);
    context.drawImage(image, 0, 0, width, height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (!blob) throw new Error('the figure could not be encoded as PNG');
    downloadBlob(figureFileName(title, 'png'), blob);
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Fetch a file from the API with the session's bearer token and offer it as a download. */
export async function downloadWithToken(url: string, fileName: string, token: string | undefined): Promise<void> {
  const response = await fetch(url, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  if (!response.ok) throw new Error(`the export failed (${response.status} ${response.statusText})`);
  downloadBlob(fileName, await response.blob());
}
