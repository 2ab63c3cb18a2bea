/**
 * The canvas palette and hatch patterns, and a text label on a pale plate. Colours are Kern's
 * own: ink on a pale warm paper.
 */
import type { Op } from '../../src';

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
  lineElement: '#7a4e12',
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

/** A ringed cross at (x, y): a circle of radius r and arms reaching `arm` each way, stroked. */
export function crosshair(ctx: CanvasRenderingContext2D, x: number, y: number, r: number, arm: number): void {
  ctx.beginPath();
  ctx.arc(x, y, r, 0, 2 * Math.PI);
  ctx.moveTo(x - arm, y);
  ctx.lineTo(x + arm, y);
  ctx.moveTo(x, y - arm);
  ctx.lineTo(x, y + arm);
  ctx.stroke();
}

/** Text on a pale plate so it reads over hatching and grid. */
export function label(ctx: CanvasRenderingContext2D, text: string, x: number, y: number, color: string): void {
  ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
  const w = ctx.measureText(text).width;
  ctx.fillStyle = 'rgba(245, 244, 239, 0.88)';
  ctx.fillRect(x - 3, y - 11, w + 6, 15);
  ctx.fillStyle = color;
  ctx.fillText(text, x, y);
}
