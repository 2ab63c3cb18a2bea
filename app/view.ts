/**
 * The view transform: world (document units, y up) to screen pixels (y down).
 * sx = ox + x·scale, sy = oy − y·scale.
 */
import { regionsBounds, type Bounds, type ShapeResult } from '../src';

export interface ViewTransform {
  scale: number;
  ox: number;
  oy: number;
}

export function toScreen(v: ViewTransform, x: number, y: number): [number, number] {
  return [v.ox + x * v.scale, v.oy - y * v.scale];
}

/** Screen x of world x, and screen y of world y (for painters that map many points). */
export function screenX(v: ViewTransform, x: number): number {
  return v.ox + x * v.scale;
}
export function screenY(v: ViewTransform, y: number): number {
  return v.oy - y * v.scale;
}

export function toWorld(v: ViewTransform, sx: number, sy: number): [number, number] {
  return [(sx - v.ox) / v.scale, (v.oy - sy) / v.scale];
}

/** Zoom by `factor` keeping the world point under (sx, sy) fixed. */
export function zoomAt(v: ViewTransform, sx: number, sy: number, factor: number): ViewTransform {
  const scale = clamp(v.scale * factor, 1e-6, 1e7);
  const k = scale / v.scale;
  return { scale, ox: sx - (sx - v.ox) * k, oy: sy - (sy - v.oy) * k };
}

function clamp(v: number, lo: number, hi: number) {
  return Math.min(hi, Math.max(lo, v));
}

/** Height of the proposals strip across the top of the canvas (px; app/ui/cutout.css). */
export const STRIP_PX = 28;

/**
 * A view that shows `b` centred in a width × height viewport with a margin, below a band of
 * `top` pixels that something else covers (the proposals strip).
 */
export function fitBounds(b: Bounds, width: number, height: number, margin = 48, top = 0): ViewTransform {
  const w = Math.max(b.xmax - b.xmin, 1e-9), h = Math.max(b.ymax - b.ymin, 1e-9);
  const scale = Math.min((width - 2 * margin) / w, (height - top - 2 * margin) / h);
  const s = Number.isFinite(scale) && scale > 0 ? scale : 1;
  const cx = (b.xmin + b.xmax) / 2, cy = (b.ymin + b.ymax) / 2;
  return { scale: s, ox: width / 2 - cx * s, oy: top + (height - top) / 2 + cy * s };
}

/** Bounds of every shape's own outline (so subtracted or empty results still fit). */
export function evaluationBounds(ev: { shapes: readonly ShapeResult[] }): Bounds | null {
  return regionsBounds(ev.shapes.map((s) => s.region));
}

/** Grid spacing in world units: 1, 2 or 5 × 10^k, at least `minPx` pixels apart. */
export function gridStep(scale: number, minPx = 14): { minor: number; major: number } {
  const raw = minPx / scale;
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / p;
  const f = m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10;
  const minor = f * p;
  return { minor, major: minor * (f === 2 ? 5 : 10) };
}
