/**
 * Snapping: the pointer goes to the nearest vertex, intersection, arc centre or edge midpoint
 * within a few pixels, else to the grid (when on). The orthogonal mode then keeps the point
 * horizontal or vertical from the previous one.
 */
import { chainSegments, regionSegments, segmentBox, segmentIntersections, segmentMidpoint, type Point, type Segment, type ShapeResult } from '../../src';
import Flatbush from 'flatbush';
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

interface OwnSnap {
  segs: Segment[];
  boxes: [number, number, number, number][];
  points: SnapPoint[];
}

/** One shape's segments and its own snap points, kept by the shape's result (unchanged shapes keep theirs during a drag). */
const ownCache = new WeakMap<ShapeResult, OwnSnap>();

function ownSnap(s: ShapeResult): OwnSnap {
  const hit = ownCache.get(s);
  if (hit) return hit;
  const segs = s.chains ? s.chains.flatMap(chainSegments) : regionSegments(s.region);
  const points: SnapPoint[] = [];
  for (const g of segs) {
    points.push({ x: g.ax, y: g.ay, kind: 'vertex', shape: s.id });
    // An open line's last end is a vertex too (a closed loop's is its first).
    if (s.chains && g === segs[segs.length - 1]) points.push({ x: g.bx, y: g.by, kind: 'vertex', shape: s.id });
    const [mx, my] = segmentMidpoint(g);
    points.push({ x: mx, y: my, kind: 'midpoint', shape: s.id });
    if (g.kind === 'arc') points.push({ x: g.cx, y: g.cy, kind: 'centre', shape: s.id });
  }
  const out = { segs, boxes: segs.map(segmentBox), points };
  ownCache.set(s, out);
  return out;
}

/**
 * Every snap point of the shapes' own outlines, from the engine's exact segments: vertices, the
 * midpoints of lines and arcs, arc centres, and the crossings between different shapes. The
 * crossings come from an R-tree of the segments' boxes (flatbush), so a plate of 4000 holes costs
 * about one query per segment, not one test per pair of shapes.
 */
export function snapPoints(shapes: readonly ShapeResult[], intersections: boolean): SnapPoint[] {
  const hit = snapCache.get(shapes);
  if (hit && (hit.withIntersections || !intersections)) return hit.points;
  const own = shapes.map(ownSnap);
  const points: SnapPoint[] = own.flatMap((o) => o.points);
  const total = own.reduce((n, o) => n + o.segs.length, 0);
  if (intersections && total > 0) {
    const shapeOf = new Int32Array(total), segOf = new Int32Array(total);
    const index = new Flatbush(total);
    // Boxes widened by more than the tangency tolerance of segmentIntersections (1e-9 of a
    // segment's size): a circle that grazes an edge meets it a rounding error outside its box.
    const padded = new Float64Array(4 * total);
    own.forEach((o, i) =>
      o.boxes.forEach((b, k) => {
        const pad = 1e-8 * Math.max(b[2] - b[0], b[3] - b[1]);
        const x0 = b[0] - pad, y0 = b[1] - pad, x1 = b[2] + pad, y1 = b[3] + pad;
        const id = index.add(x0, y0, x1, y1);
        padded[4 * id] = x0;
        padded[4 * id + 1] = y0;
        padded[4 * id + 2] = x1;
        padded[4 * id + 3] = y1;
        shapeOf[id] = i;
        segOf[id] = k;
      }),
    );
    index.finish();
    for (let id = 0; id < total; id++) {
      const i = shapeOf[id];
      for (const other of index.search(padded[4 * id], padded[4 * id + 1], padded[4 * id + 2], padded[4 * id + 3])) {
        const j = shapeOf[other];
        // Each pair of shapes once, the earlier shape naming the point.
        if (j <= i) continue;
        for (const [x, y] of segmentIntersections(own[i].segs[segOf[id]], own[j].segs[segOf[other]])) points.push({ x, y, kind: 'intersection', shape: shapes[i].id });
      }
    }
  }
  snapCache.set(shapes, { points, withIntersections: intersections });
  return points;
}
