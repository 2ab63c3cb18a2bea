/** Polygon: a closed list of corner points. Its outline may cross itself (resolved even-odd). */
import type { Point, ShapeBase } from './base';
import { checkPoint, dist, type Issue } from './check';
import { scalePoint, type ShapeKind } from './kind';
import { pointsExtent, vertexTable } from './schedule';
import { dropZeroLengthLines } from './loops';
import { roundedChain } from './corners';
import { filletPolygonCorner } from '../geometry/fillet';

export interface PolygonShape extends ShapeBase {
  type: 'polygon';
  points: Point[];
}

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const pts = s.points;
  if (!Array.isArray(pts)) {
    out.push({ path: `${path}.points`, message: 'a polygon needs a list of points' });
    return;
  }
  if (pts.length < 3) {
    out.push({ path: `${path}.points`, message: `a polygon needs at least 3 points, got ${pts.length}` });
    return;
  }
  let ok = true;
  pts.forEach((p, k) => {
    ok = checkPoint(p, `${path}.points[${k}]`, out) && ok;
  });
  if (!ok) return;
  // Degenerate: every point on one line (a self-crossing outline may have zero net area and is
  // still valid: it is resolved by the even-odd rule).
  const P = pts as Point[];
  let far = P[0], fd = 0;
  for (const q of P) {
    if (dist(q, P[0]) > fd) {
      far = q;
      fd = dist(q, P[0]);
    }
  }
  let maxCross = 0;
  for (const q of P) maxCross = Math.max(maxCross, Math.abs((q[0] - P[0][0]) * (far[1] - P[0][1]) - (q[1] - P[0][1]) * (far[0] - P[0][0])));
  if (!(maxCross > 1e-12 * fd * fd)) out.push({ path: `${path}.points`, message: 'the points enclose no area (they are collinear or repeated)' });
}

export const polygonKind: ShapeKind<PolygonShape> = {
  type: 'polygon',
  label: 'Polygon',
  validate,
  contours: (s) => [dropZeroLengthLines(s.points.flat(), s.points.map(() => 0))],
  mayCrossItself: true,
  mapPoints: (s, f) => ({ ...s, points: s.points.map(f) }),
  // A reflection reverses the winding; keep it counter-clockwise as drawn.
  mirrored: (s) => ({ ...s, points: s.points.slice().reverse() }),
  scaled: (s, k) => ({ ...s, points: s.points.map(scalePoint(k)) }),
  corners: {
    list: (s) => s.points.map((p, index) => ({ index, label: `Vertex ${index + 1}`, p })),
    // The outline gains an arc, so the polygon becomes a path (everything else kept).
    round: (s, index, radius) => {
      if (!(index >= 0 && index < s.points.length)) return `there is no corner ${index + 1} to round`;
      const r = roundedChain(filletPolygonCorner(s.points, index, radius));
      if (!r.ok) return r.message;
      const { points: _points, ...rest } = s;
      void _points;
      return { ...rest, type: 'path', start: r.start, segments: r.segments };
    },
  },
  schedule: (s, f) => ({ params: [['Corners', String(s.points.length)]], table: vertexTable(s.points, f, 'vertices'), extent: pointsExtent(s.points) }),
};
