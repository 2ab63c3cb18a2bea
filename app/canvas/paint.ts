/**
 * Canvas painting in screen space: the palette, hatch patterns and path helpers used by the
 * Konva scene functions. Colours are Kern's own: ink on a pale warm paper.
 */
import type { Op, Region } from '../../src';
import type { ViewTransform } from '../view';
import { regionPolylines } from './geometry';

export const INK = {
  paper: '#f5f4ef',
  gridMinor: '#e7e5dd',
  gridMajor: '#d6d3c8',
  axis: '#8c8a80',
  axisText: '#6d6b63',
  resultFill: 'rgba(52, 92, 104, 0.16)',
  resultLine: '#23414a',
  addLine: '#5f7d86',
  subtractLine: '#a4523c',
  intersectLine: '#8a6c1c',
  selection: '#2c5cc5',
  snap: '#c2410c',
  draft: '#2c5cc5',
  centroid: '#23414a',
  principal: '#6b3fa0',
  fibre: '#3b7d4f',
  cut: '#b03a5b',
  cutFill: 'rgba(176, 58, 91, 0.14)',
  error: '#b3261e',
} as const;

const patternCache = new WeakMap<CanvasRenderingContext2D, Record<string, CanvasPattern | null>>();

function makePattern(ctx: CanvasRenderingContext2D, kind: 'subtract' | 'intersect'): CanvasPattern | null {
  if (typeof document === 'undefined') return null;
  const c = document.createElement('canvas');
  const n = 8;
  c.width = n;
  c.height = n;
  const g = c.getContext('2d');
  if (!g) return null;
  g.strokeStyle = kind === 'subtract' ? 'rgba(164, 82, 60, 0.55)' : 'rgba(138, 108, 28, 0.5)';
  g.lineWidth = 1;
  g.beginPath();
  // Diagonal hatch (subtract); crossed hatch (intersect).
  g.moveTo(-1, n + 1);
  g.lineTo(n + 1, -1);
  if (kind === 'intersect') {
    g.moveTo(-1, -1);
    g.lineTo(n + 1, n + 1);
  }
  g.stroke();
  return ctx.createPattern(c, 'repeat');
}

export function hatch(ctx: CanvasRenderingContext2D, kind: 'subtract' | 'intersect'): CanvasPattern | string {
  let entry = patternCache.get(ctx);
  if (!entry) {
    entry = {};
    patternCache.set(ctx, entry);
  }
  if (!(kind in entry)) entry[kind] = makePattern(ctx, kind);
  return entry[kind] ?? 'rgba(0,0,0,0.08)';
}

/** Add the region's contours to the current path, in screen coordinates. */
export function traceRegion(ctx: CanvasRenderingContext2D, region: Region, v: ViewTransform): void {
  const polys = regionPolylines(region, 0.35 / v.scale);
  for (const p of polys) {
    const n = p.length >> 1;
    if (n < 2) continue;
    ctx.moveTo(v.ox + p[0] * v.scale, v.oy - p[1] * v.scale);
    for (let i = 1; i < n; i++) ctx.lineTo(v.ox + p[2 * i] * v.scale, v.oy - p[2 * i + 1] * v.scale);
    ctx.closePath();
  }
}

export function opStyle(op: Op): { line: string; dash: number[]; fill: 'none' | 'subtract' | 'intersect' } {
  switch (op) {
    case 'add':
      return { line: INK.addLine, dash: [], fill: 'none' };
    case 'subtract':
      return { line: INK.subtractLine, dash: [5, 3], fill: 'subtract' };
    case 'intersect':
      return { line: INK.intersectLine, dash: [8, 3, 2, 3], fill: 'intersect' };
  }
}
