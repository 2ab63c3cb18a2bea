/**
 * Path: a start point and segments, straight lines `{to}` and three-point arcs `{to, via}` (the
 * arc from the current point through `via` to `to`). The last segment ends on the start. Its
 * outline may cross itself (resolved even-odd).
 */
import { pushArc, sweepThrough, type Contour } from '../geometry/contour';
import type { Point, PointMap, ShapeBase } from './base';
import { checkPoint, dist, isObj, type Issue } from './check';
import { scalePoint, type ShapeKind } from './kind';
import { plural, pointsExtent, pointText, segmentPoints, segmentTable } from './schedule';
import { dropZeroLengthLines } from './loops';
import { chainCornerRules } from './corners';

/** `{to}` is a straight line; `{to, via}` is the circular arc from the current point through via to to. */
export interface PathSegment {
  to: Point;
  via?: Point;
}

export interface PathShape extends ShapeBase {
  type: 'path';
  start: Point;
  segments: PathSegment[];
}

/** Contour of a closed path: lines stay lines, three-point arcs become exact arcs. */
export function pathContour(start: Point, segments: readonly PathSegment[]): Contour {
  const xy: number[] = [start[0], start[1]];
  const bulge: number[] = [];
  let cx = start[0], cy = start[1];
  segments.forEach((g, k) => {
    const [tx, ty] = g.to;
    if (g.via) {
      const phi = sweepThrough(cx, cy, g.via[0], g.via[1], tx, ty);
      if (!Number.isFinite(phi)) throw new Error(`segments[${k}].via: arc points are collinear`);
      pushArc(xy, bulge, cx, cy, tx, ty, phi);
    } else bulge.push(0);
    xy.push(tx, ty);
    cx = tx;
    cy = ty;
  });
  // The last segment ends on the start (validated): drop the repeated vertex.
  xy.length -= 2;
  return dropZeroLengthLines(xy, bulge);
}

/** The segments with every stored point mapped. */
export function mapSegments(segments: readonly PathSegment[], f: PointMap): PathSegment[] {
  return segments.map((g) => (g.via ? { to: f(g.to), via: f(g.via) } : { to: f(g.to) }));
}

/**
 * Check a start point and its segments (lines `{to}`, three-point arcs `{to, via}`): every point,
 * and that no arc is degenerate. Returns the last point and the largest distance from the start
 * (for the closing tolerance), or null when something was wrong. Paths, line elements and strips
 * share it.
 */
export function checkSegments(s: Record<string, unknown>, path: string, out: Issue[]): { last: Point; extent: number } | null {
  if (!checkPoint(s.start, `${path}.start`, out)) return null;
  const segs = s.segments;
  if (!Array.isArray(segs) || segs.length === 0) {
    out.push({ path: `${path}.segments`, message: 'at least one segment is needed' });
    return null;
  }
  const start = s.start as Point;
  let cur: Point | null = start;
  let ext = 0;
  let ok = true;
  segs.forEach((g, k) => {
    const gp = `${path}.segments[${k}]`;
    if (!isObj(g)) {
      out.push({ path: gp, message: 'a segment must be an object {to} or {to, via}' });
      ok = false;
      cur = null;
      return;
    }
    const toOk = checkPoint(g.to, `${gp}.to`, out);
    const viaOk = g.via === undefined || checkPoint(g.via, `${gp}.via`, out);
    if (!toOk || !viaOk) {
      ok = false;
      cur = null;
      return;
    }
    const to = g.to as Point;
    ext = Math.max(ext, dist(to, start));
    if (cur && g.via !== undefined) {
      const via = g.via as Point;
      const a = cur;
      const chord = dist(a, to), scale = Math.max(chord, dist(a, via), dist(via, to));
      if (chord <= 1e-12 * Math.max(scale, 1e-300)) {
        out.push({ path: `${gp}.to`, message: 'arc ends where it starts; draw a full circle as two arcs' });
        ok = false;
      } else {
        const cross = (via[0] - a[0]) * (to[1] - a[1]) - (via[1] - a[1]) * (to[0] - a[0]);
        if (!(Math.abs(cross) > 1e-10 * scale * scale)) {
          out.push({ path: `${gp}.via`, message: 'arc points are collinear' });
          ok = false;
        }
      }
    }
    // A zero-length line is harmless; it is dropped when the outline is built.
    cur = to;
  });
  return ok ? { last: (segs[segs.length - 1] as { to: Point }).to, extent: ext } : null;
}

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const r = checkSegments(s, path, out);
  if (!r) return;
  const start = s.start as Point;
  const segs = s.segments as PathSegment[];
  if (dist(r.last, start) > 1e-9 * Math.max(r.extent, 1e-300)) {
    out.push({
      path: `${path}.segments`,
      message: `path does not close: it ends at (${r.last[0]}, ${r.last[1]}) but starts at (${start[0]}, ${start[1]})`,
    });
  } else if (segs.length < 2 && segs[0].via === undefined) {
    out.push({ path: `${path}.segments`, message: 'a closed path needs at least two segments' });
  }
}

export const pathKind: ShapeKind<PathShape> = {
  type: 'path',
  label: 'Path',
  validate,
  contours: (s) => [pathContour(s.start, s.segments)],
  mayCrossItself: true,
  mapPoints: (s, f) => ({ ...s, start: f(s.start), segments: mapSegments(s.segments, f) }),
  scaled: (s, k) => ({ ...s, start: scalePoint(k)(s.start), segments: mapSegments(s.segments, scalePoint(k)) }),
  corners: chainCornerRules<PathShape>(true),
  schedule: (s, f) => {
    const arcs = s.segments.filter((g) => g.via).length;
    return {
      params: [
        ['Start', pointText(s.start, f)],
        ['Segments', `${s.segments.length} (${plural(s.segments.length - arcs, 'line')}, ${plural(arcs, 'arc')})`],
      ],
      table: segmentTable(s.start, s.segments, f, 'segments'),
      extent: pointsExtent(segmentPoints(s.start, s.segments)),
    };
  },
};
