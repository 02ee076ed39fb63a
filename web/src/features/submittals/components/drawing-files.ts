import type { Drawing } from 'ligament/draw';
import { toSvg } from 'ligament/draw';
import { saveBlob } from '@/lib/download';

/** Resolution of the PNG download: fine enough to print the sheet at its size. */
export const PNG_DPI = 200;

/** `SP-1` → `SP-1-drawing`; characters a file name should not hold become hyphens. */
export function drawingFileStem(drawing: Drawing): string {
  return `${drawing.memberId.replace(/[^A-Za-z0-9._-]+/g, '-')}-drawing`;
}

/** The drawing as the SVG file `ligament draw` writes (the same serialiser), sized in millimetres. */
export function downloadSvg(drawing: Drawing): void {
  saveBlob(new Blob([toSvg(drawing)], { type: 'image/svg+xml' }), `${drawingFileStem(drawing)}.svg`);
}

/** The pixel size of the PNG: the sheet's millimetres at PNG_DPI. */
export function pngSize(drawing: Drawing): { width: number; height: number } {
  return {
    width: Math.round((drawing.width / 25.4) * PNG_DPI),
    height: Math.round((drawing.height / 25.4) * PNG_DPI),
  };
}

/** The same SVG drawn by the browser onto a canvas, saved as PNG. */
export async function downloadPng(drawing: Drawing): Promise<void> {
  const image = new Image();
  // A data URL: the service's Content-Security-Policy allows data: images, not blob: ones.
  image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(toSvg(drawing))}`;
  await image.decode();
  const { width, height } = pngSize(drawing);
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const context = canvas.getContext('2d');
  if (!context) throw new Error('This browser cannot draw the PNG (no 2D canvas).');
  context.drawImage(image, 0, 0, width, height);
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
  if (!blob) throw new Error('This browser could not encode the PNG.');
  saveBlob(blob, `${drawingFileStem(drawing)}.png`);
}
