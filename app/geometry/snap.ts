/**
 * Snapping: the pointer goes to the nearest vertex, intersection, arc centre or edge midpoint
 * within a few pixels, else to the grid (when on). The orthogonal mode then keeps the point
 * horizontal or vertical from the previous one.
 */
import { chainSegments, regionSegments, segmentBox, segmentIntersections, segmentMidpoint, type Point, type Segment, type ShapeResult } from '../../src';
import type { SnapSettings } from '../store/store';
import type { SnapResult } from '../store/transient';

export type { SnapResult };
import { gridStep } from '../view';

export type SnapKind = 'vertex' | 'midpoint' | 'centre' | 'intersection';
export interface SnapPoint {
  x: number;
  y: number;
  kind: SnapKind;
  shape: string;
}


export const SNAP_RADIUS_PX = 10;

/** Round to the grid and clean the binary noise (0.1 * 3 -> 0.3). */
export function roundTo(v: number, step: number): number {
  return Number((Math.round(v / step) * step).toPrecision(12));
}

const PRIORITY: Record<SnapKind, number> = { vertex: 0, intersection: 0, centre: 1, midpoint: 2 };

export function snapPointer(
  raw: Point,
  opts: {
    shapes: readonly ShapeResult[];
    scale: number;
    settings: SnapSettings;
    from?: Point | null;
    exclude?: ReadonlySet<string>;
    /** Extra vertex candidates, e.g. the points of the outline being drawn. */
    extra?: readonly Point[];
    forceOrtho?: boolean;
  },
): SnapResult {
  const { settings, scale } = opts;
  const r = SNAP_RADIUS_PX / scale;
  let best: { p: Point; kind: SnapKind; d: number; pr: number } | null = null;
  const consider = (x: number, y: number, kind: SnapKind) => {
    const d = Math.hypot(x - raw[0], y - raw[1]);
    if (d > r) return;
    const pr = PRIORITY[kind];
    // A higher-priority point wins unless the other is clearly (3 px) closer.
    if (!best || (pr < best.pr && d < best.d + 3 / scale) || (pr === best.pr && d < best.d) || (pr > best.pr && d + 3 / scale < best.d)) {
      best = { p: [x, y], kind, d, pr };
    }
  };
  const anyGeometry = settings.vertex || settings.midpoint || settings.centre || settings.intersection;
  if (anyGeometry) {
    for (const s of snapPoints(opts.shapes, settings.intersection)) {
      if (opts.exclude?.has(s.shape)) continue;
      if (s.kind === 'vertex' && !settings.vertex) continue;
      if (s.kind === 'midpoint' && !settings.midpoint) continue;
      if (s.kind === 'centre' && !settings.centre) continue;
      if (s.kind === 'intersection' && !settings.intersection) continue;
      consider(s.x, s.y, s.kind);
    }
    if (settings.vertex) for (const q of opts.extra ?? []) consider(q[0], q[1], 'vertex');
  }
  let out: SnapResult;
  const b = best as { p: Point; kind: SnapKind } | null;
  if (b) out = { p: b.p, kind: b.kind, ortho: false };
  else if (settings.grid) {
    const { minor } = gridStep(scale);
    out = { p: [roundTo(raw[0], minor), roundTo(raw[1], minor)], kind: 'grid', ortho: false };
  } else out = { p: [raw[0], raw[1]], kind: 'free', ortho: false };
  const from = opts.from;
  if (from && (settings.ortho || opts.forceOrtho)) {
    const dx = out.p[0] - from[0], dy = out.p[1] - from[1];
    const p: Point = Math.abs(dx) >= Math.abs(dy) ? [out.p[0], from[1]] : [from[0], out.p[1]];
    if (p[0] !== out.p[0] || p[1] !== out.p[1]) out = { p, kind: out.kind, ortho: true };
  }
  return out;
}

const snapCache = new WeakMap<readonly ShapeResult[], { points: SnapPoint[]; withIntersections: boolean }>();

/**
 * Every snap point of the shapes' own outlines, from the engine's exact segments: vertices, the
 * midpoints of lines and arcs, arc centres, and the crossings between different shapes.
 */
export function snapPoints(shapes: readonly ShapeResult[], intersections: boolean): SnapPoint[] {
  const hit = snapCache.get(shapes);
  if (hit && (hit.withIntersections || !intersections)) return hit.points;
  const points: SnapPoint[] = [];
  const segsByShape: { id: string; segs: Segment[]; boxes: [number, number, number, number][] }[] = [];
  for (const s of shapes) {
    const segs = s.chains ? s.chains.flatMap(chainSegments) : regionSegments(s.region);
    segsByShape.push({ id: s.id, segs, boxes: segs.map(segmentBox) });
    for (const g of segs) {
      points.push({ x: g.ax, y: g.ay, kind: 'vertex', shape: s.id });
      // An open line's last end is a vertex too (a closed loop's is its first).
      if (s.chains && g === segs[segs.length - 1]) points.push({ x: g.bx, y: g.by, kind: 'vertex', shape: s.id });
      const [mx, my] = segmentMidpoint(g);
      points.push({ x: mx, y: my, kind: 'midpoint', shape: s.id });
      if (g.kind === 'arc') points.push({ x: g.cx, y: g.cy, kind: 'centre', shape: s.id });
    }
  }
  if (intersections) {
    for (let i = 0; i < segsByShape.length; i++) {
      for (let j = i + 1; j < segsByShape.length; j++) {
        const A = segsByShape[i], B = segsByShape[j];
        for (let a = 0; a < A.segs.length; a++) {
          const ba = A.boxes[a];
          for (let b = 0; b < B.segs.length; b++) {
            const bb = B.boxes[b];
            if (ba[0] > bb[2] || bb[0] > ba[2] || ba[1] > bb[3] || bb[1] > ba[3]) continue;
            for (const [x, y] of segmentIntersections(A.segs[a], B.segs[b])) points.push({ x, y, kind: 'intersection', shape: A.id });
          }
        }
      }
    }
  }
  snapCache.set(shapes, { points, withIntersections: intersections });
  return points;
}
