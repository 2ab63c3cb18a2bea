/**
 * What a drawing of the section should dimension, read from the geometry alone (no scale):
 * - holes, the inner loops of the region: a loop of arcs on one circle is a round hole (centre
 *   and diameter), anything else an opening (its extent);
 * - notches: a subtracted shape that is not a whole hole but reaches into the section; a round one
 *   keeps its centre and diameter, any other gives the positions of its edges that lie inside the
 *   section's extent;
 * - plate parts: two straight boundary edges that face each other across material, parallel and
 *   overlapping over at least 1.5 × their distance, with no boundary between them; the thickness is
 *   that distance. One pair of supporting lines gives one feature; a pair made of the section's own
 *   extreme faces is left to the overall dimensions.
 * The clearance tests use the drawing polylines of the outline (accuracy 1e-4 of the section's
 * size): they decide where a dimension goes, never a number. dimensions.ts places the result.
 */
import type { Bounds, Contour, Region } from '../geometry/contour';
import { arcFromChord, contourPolyline, regionBounds } from '../geometry/contour';

export type DimensionFeature =
  /** A round hole, or a round cut that breaks an edge (`notch` true): centre and diameter. */
  | { kind: 'hole'; cx: number; cy: number; diameter: number; notch: boolean }
  /** A hole that is not round: its extent. */
  | { kind: 'opening'; xmin: number; xmax: number; ymin: number; ymax: number }
  /** A cut from an edge: the positions of its edges that lie inside the section's extent. */
  | { kind: 'notch'; x: number[]; y: number[]; xmin: number; xmax: number; ymin: number; ymax: number }
  /**
   * A plate part: from (ax, ay) on one face straight across to (bx, by) on the other; `alternatives`
   * are other places along the same faces where the same measure is clear of the boundary.
   */
  | { kind: 'thickness'; ax: number; ay: number; bx: number; by: number; t: number; alternatives: [number, number, number, number][] };

export type Hole = Extract<DimensionFeature, { kind: 'hole' }>;
export type Plate = Extract<DimensionFeature, { kind: 'thickness' }>;

interface Circle {
  cx: number;
  cy: number;
  r: number;
}

/** The circle a loop runs round, when every segment is an arc of it and they sweep a full turn. */
export function loopCircle(c: Contour): Circle | null {
  const n = c.xy.length >> 1;
  if (!c.bulge || n < 2) return null;
  let first: Circle | null = null;
  let sweep = 0;
  for (let i = 0; i < n; i++) {
    const bulge = c.bulge[i];
    if (bulge === 0) return null;
    const j = (i + 1) % n;
    const phi = 4 * Math.atan(bulge);
    const a = arcFromChord(c.xy[2 * i], c.xy[2 * i + 1], c.xy[2 * j], c.xy[2 * j + 1], phi);
    sweep += phi;
    if (!first) first = { cx: a.cx, cy: a.cy, r: a.r };
    else if (Math.hypot(a.cx - first.cx, a.cy - first.cy) > 1e-9 * first.r || Math.abs(a.r - first.r) > 1e-9 * first.r) return null;
  }
  return first && Math.abs(Math.abs(sweep) - 2 * Math.PI) < 1e-9 ? first : null;
}

/** Signed area of one loop (chords plus circular segments); holes are negative. */
function signedArea(c: Contour): number {
  const n = c.xy.length >> 1;
  let a = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const x0 = c.xy[2 * i], y0 = c.xy[2 * i + 1], x1 = c.xy[2 * j], y1 = c.xy[2 * j + 1];
    a += (x0 * y1 - x1 * y0) / 2;
    const bulge = c.bulge ? c.bulge[i] : 0;
    if (bulge !== 0) {
      const phi = 4 * Math.atan(bulge), al = Math.abs(phi);
      const r = Math.hypot(x1 - x0, y1 - y0) / (2 * Math.sin(al / 2));
      a += (Math.sign(phi) * r * r * (al - Math.sin(al))) / 2;
    }
  }
  return a;
}

const near = (a: number, b: number, tol: number) => Math.abs(a - b) <= tol;

/** Every vertex of the region's loops. */
function regionCorners(region: Region): [number, number][] {
  const out: [number, number][] = [];
  for (const c of region) for (let i = 0; i + 1 < c.xy.length; i += 2) out.push([c.xy[i], c.xy[i + 1]]);
  return out;
}

interface Edge {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  dx: number;
  dy: number;
  len: number;
}

function straightEdges(region: Region): Edge[] {
  const out: Edge[] = [];
  for (const c of region) {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      if (c.bulge && c.bulge[i] !== 0) continue;
      const j = (i + 1) % n;
      const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
      const len = Math.hypot(bx - ax, by - ay);
      if (len > 0) out.push({ ax, ay, bx, by, dx: (bx - ax) / len, dy: (by - ay) / len, len });
    }
  }
  return out;
}

function segmentsCross(ax: number, ay: number, bx: number, by: number, cx: number, cy: number, dx: number, dy: number): boolean {
  const d1 = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
  const d2 = (bx - ax) * (dy - ay) - (by - ay) * (dx - ax);
  const d3 = (dx - cx) * (ay - cy) - (dy - cy) * (ax - cx);
  const d4 = (dx - cx) * (by - cy) - (dy - cy) * (bx - cx);
  return d1 * d2 < 0 && d3 * d4 < 0;
}

/** Nonzero winding of the outline polylines about (x, y): inside the material. */
export function inside(polys: readonly number[][], x: number, y: number): boolean {
  let w = 0;
  for (const p of polys) {
    const n = p.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const x0 = p[2 * i], y0 = p[2 * i + 1], x1 = p[2 * j], y1 = p[2 * j + 1];
      const side = (x1 - x0) * (y - y0) - (x - x0) * (y1 - y0);
      if (y0 <= y) {
        if (y1 > y && side > 0) w++;
      } else if (y1 <= y && side < 0) w--;
    }
  }
  return w !== 0;
}

/** True when the segment p→q (less a sliver at each end) crosses no outline edge. */
function clearAcross(polys: readonly number[][], px: number, py: number, qx: number, qy: number): boolean {
  const ex = (qx - px) * 1e-6, ey = (qy - py) * 1e-6;
  for (const p of polys) {
    const n = p.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      if (segmentsCross(px + ex, py + ey, qx - ex, qy - ey, p[2 * i], p[2 * i + 1], p[2 * j], p[2 * j + 1])) return false;
    }
  }
  return true;
}

/** Above this many straight edges the plate search (pairs of edges) is skipped. */
export const MAX_EDGES_FOR_PLATES = 2000;

function plateThicknesses(region: Region, b: Bounds, size: number, polys: readonly number[][]): Plate[] {
  const edges = straightEdges(region);
  if (edges.length > MAX_EDGES_FOR_PLATES) return [];
  const tol = 1e-9 * size;
  const found = new Map<string, { f: Plate; overlap: number }>();
  const onExtreme = (e: Edge) =>
    (near(e.ay, b.ymin, tol) && near(e.by, b.ymin, tol)) ||
    (near(e.ay, b.ymax, tol) && near(e.by, b.ymax, tol)) ||
    (near(e.ax, b.xmin, tol) && near(e.bx, b.xmin, tol)) ||
    (near(e.ax, b.xmax, tol) && near(e.bx, b.xmax, tol));
  for (let i = 0; i < edges.length; i++) {
    const e = edges[i];
    // Material lies to the left of every edge (outer loops CCW, holes CW).
    const nx = -e.dy, ny = e.dx;
    for (let k = 0; k < edges.length; k++) {
      const g = edges[k];
      if (k === i || e.dx * g.dx + e.dy * g.dy > -(1 - 1e-12)) continue; // antiparallel only
      const t = (g.ax - e.ax) * nx + (g.ay - e.ay) * ny;
      const t2 = (g.bx - e.ax) * nx + (g.by - e.ay) * ny;
      if (!(t > tol) || Math.abs(t - t2) > tol) continue; // g must face e across the material
      if (onExtreme(e) && onExtreme(g)) continue; // the overall dimension shows it
      const s0 = (g.ax - e.ax) * e.dx + (g.ay - e.ay) * e.dy, s1 = (g.bx - e.ax) * e.dx + (g.by - e.ay) * e.dy;
      const lo = Math.max(0, Math.min(s0, s1)), hi = Math.min(e.len, Math.max(s0, s1));
      const overlap = hi - lo;
      if (!(overlap >= 1.5 * t)) continue;
      // One feature per pair of supporting lines (keyed by direction and both offsets).
      const ang = Math.atan2(e.dx < 0 || (e.dx === 0 && e.dy < 0) ? -e.dy : e.dy, Math.abs(e.dx));
      const off = (x: number, y: number) => Math.round((-x * Math.sin(ang) + y * Math.cos(ang)) / (1e-7 * size));
      const key = `${Math.round(ang * 1e7)}:${[off(e.ax, e.ay), off(g.ax, g.ay)].sort((p, q) => p - q).join(':')}`;
      const prev = found.get(key);
      if (prev && prev.overlap >= overlap) continue;
      const places: [number, number, number, number][] = [];
      for (const f of [0.5, 0.3, 0.7, 0.15, 0.85]) {
        const s = lo + f * overlap;
        const ax = e.ax + s * e.dx, ay = e.ay + s * e.dy, bx = ax + t * nx, by = ay + t * ny;
        if (inside(polys, (ax + bx) / 2, (ay + by) / 2) && clearAcross(polys, ax, ay, bx, by)) places.push([ax, ay, bx, by]);
      }
      if (places.length > 0) {
        const [ax, ay, bx, by] = places[0];
        found.set(key, { f: { kind: 'thickness', ax, ay, bx, by, t, alternatives: places.slice(1) }, overlap });
      }
    }
  }
  return [...found.values()].sort((p, q) => q.overlap - p.overlap).map((v) => v.f);
}

/**
 * What to dimension on a section. `region` is the finished section; `cuts` are the regions of
 * the shapes subtracted from it (without them notches are not found; holes still are).
 */
export function findDimensionFeatures(region: Region, cuts: readonly Region[] = []): DimensionFeature[] {
  const b = regionBounds(region);
  if (!b) return [];
  const size = Math.max(b.xmax - b.xmin, b.ymax - b.ymin);
  if (!(size > 0)) return [];
  const tol = 1e-9 * size;
  const out: DimensionFeature[] = [];
  const holes: (Circle | Bounds)[] = [];
  for (const c of region) {
    if (!(signedArea(c) < 0)) continue;
    const circ = loopCircle(c);
    if (circ) {
      out.push({ kind: 'hole', cx: circ.cx, cy: circ.cy, diameter: 2 * circ.r, notch: false });
      holes.push(circ);
      continue;
    }
    const hb = regionBounds([c]);
    if (hb) {
      out.push({ kind: 'opening', ...hb });
      holes.push(hb);
    }
  }
  const knownHole = (circ: Circle | null, cb: Bounds) =>
    holes.some((h) =>
      'r' in h
        ? !!circ && near(h.cx, circ.cx, tol) && near(h.cy, circ.cy, tol) && near(h.r, circ.r, tol)
        : near(h.xmin, cb.xmin, tol) && near(h.xmax, cb.xmax, tol) && near(h.ymin, cb.ymin, tol) && near(h.ymax, cb.ymax, tol),
    );
  const corners = regionCorners(region);
  for (const cut of cuts) {
    const cb = regionBounds(cut);
    // A cut that misses the section leaves nothing to dimension.
    if (!cb || cb.xmin >= b.xmax || cb.xmax <= b.xmin || cb.ymin >= b.ymax || cb.ymax <= b.ymin) continue;
    const circ = cut.length === 1 ? loopCircle(cut[0]) : null;
    if (knownHole(circ, cb)) continue;
    if (circ) {
      out.push({ kind: 'hole', cx: circ.cx, cy: circ.cy, diameter: 2 * circ.r, notch: true });
      continue;
    }
    // An edge of the cut counts where it shapes the section: some corner of the finished outline
    // lies on it, inside the cut's extent (a cut that overhangs the section has edges in the air).
    const shapes = (axis: 0 | 1, v: number) =>
      corners.some((p) => near(p[axis], v, tol) && p[1 - axis] >= (axis ? cb.xmin : cb.ymin) - tol && p[1 - axis] <= (axis ? cb.xmax : cb.ymax) + tol);
    const x = [cb.xmin, cb.xmax].filter((v) => v > b.xmin + tol && v < b.xmax - tol && shapes(0, v));
    const y = [cb.ymin, cb.ymax].filter((v) => v > b.ymin + tol && v < b.ymax - tol && shapes(1, v));
    if (x.length + y.length > 0) out.push({ kind: 'notch', x, y, ...cb });
  }
  const polys = region.map((c) => contourPolyline(c, 1e-4 * size));
  out.push(...plateThicknesses(region, b, size, polys));
  return out;
}
