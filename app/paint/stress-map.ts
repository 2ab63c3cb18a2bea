/**
 * The torsion stress map as a picture: |τ| interpolated linearly over every straight triangle of
 * the result's mesh, pixel by pixel, into an image the size of the view (device pixels), coloured
 * through a 256-entry table of the ramp. The image is made once per result and view; each repaint
 * (a drag frame) only copies it.
 *
 * Written by hand because the canvas 2D API fills a path with one colour (a flat colour per
 * triangle shows every element), and no library in the project shades triangles; the loop is the
 * textbook barycentric rasteriser: for each pixel centre in a triangle's box, the three
 * barycentric weights, the pixel drawn when none is negative.
 */
import type { TorsionResult } from '../../src';
import type { ViewTransform } from '../view';
import { rampColour } from './stress-ramp';

export interface StressImage {
  canvas: HTMLCanvasElement;
  /** CSS pixels the image covers (the view's size). */
  width: number;
  height: number;
}

/** Pixels on a shared edge belong to both triangles (no cracks); the later one writes. */
const EDGE = -1e-9;

/** The ramp as 256 RGBA words in the byte order of ImageData on this machine. */
function colourTable(): Uint32Array {
  const bytes = new Uint8ClampedArray(4 * 256);
  for (let k = 0; k < 256; k++) {
    const [r, g, b] = rampColour(k / 255);
    bytes.set([r, g, b, 255], 4 * k);
  }
  return new Uint32Array(bytes.buffer);
}
let table: Uint32Array | null = null;

/**
 * Rasterise the map into `pixels` (W × H words, row-major, top row first). `scale` maps CSS to
 * device pixels. Returns the number of pixels written (for tests).
 */
export function rasteriseStress(pixels: Uint32Array, W: number, H: number, stress: TorsionResult['stress'], v: ViewTransform, scale: number): number {
  const { xy, triangles, magnitude, max } = stress;
  if (!(max > 0)) return 0;
  const lut = (table ??= colourTable());
  const n = magnitude.length;
  const sx = new Float64Array(n), sy = new Float64Array(n), val = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    sx[i] = (v.ox + xy[2 * i] * v.scale) * scale;
    sy[i] = (v.oy - xy[2 * i + 1] * v.scale) * scale;
    val[i] = Math.min(1, Math.max(0, magnitude[i] / max)) * 255;
  }
  let written = 0;
  const nt = triangles.length / 3;
  for (let t = 0; t < nt; t++) {
    const a = triangles[3 * t], b = triangles[3 * t + 1], c = triangles[3 * t + 2];
    const x0 = sx[a], y0 = sy[a], x1 = sx[b], y1 = sy[b], x2 = sx[c], y2 = sy[c];
    const area = (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0);
    if (!(Math.abs(area) > 1e-12)) continue;
    const xmin = Math.max(0, Math.floor(Math.min(x0, x1, x2))), xmax = Math.min(W - 1, Math.ceil(Math.max(x0, x1, x2)));
    const ymin = Math.max(0, Math.floor(Math.min(y0, y1, y2))), ymax = Math.min(H - 1, Math.ceil(Math.max(y0, y1, y2)));
    if (xmin > xmax || ymin > ymax) continue;
    const inv = 1 / area;
    const va = val[a], vb = val[b], vc = val[c];
    for (let py = ymin; py <= ymax; py++) {
      const yc = py + 0.5;
      const row = py * W;
      for (let px = xmin; px <= xmax; px++) {
        const xc = px + 0.5;
        const w0 = ((x1 - xc) * (y2 - yc) - (x2 - xc) * (y1 - yc)) * inv;
        if (w0 < EDGE) continue;
        const w1 = ((x2 - xc) * (y0 - yc) - (x0 - xc) * (y2 - yc)) * inv;
        if (w1 < EDGE) continue;
        const w2 = 1 - w0 - w1;
        if (w2 < EDGE) continue;
        pixels[row + px] = lut[Math.min(255, Math.max(0, Math.round(w0 * va + w1 * vb + w2 * vc)))];
        written++;
      }
    }
  }
  return written;
}

/** The map in an offscreen canvas of the view's size, or null without a DOM. */
export function renderStressImage(stress: TorsionResult['stress'], v: ViewTransform, width: number, height: number, pixelRatio: number): StressImage | null {
  if (typeof document === 'undefined') return null;
  const W = Math.max(1, Math.round(width * pixelRatio)), H = Math.max(1, Math.round(height * pixelRatio));
  const canvas = document.createElement('canvas');
  canvas.width = W;
  canvas.height = H;
  const ctx = canvas.getContext('2d');
  if (!ctx) return null;
  const image = ctx.createImageData(W, H);
  rasteriseStress(new Uint32Array(image.data.buffer), W, H, stress, v, W / width);
  ctx.putImageData(image, 0, 0);
  return { canvas, width, height };
}
