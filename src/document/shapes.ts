/**
 * One function per shape kind that turns a document record into exact contours (lines and arcs).
 * Profiles go through profiles.ts first. The contours here are raw: a polygon or path may still
 * cross itself; evaluate.ts resolves that with the boolean module.
 */
import { circleContour, contourFrom, pushArc, reverseContour, sweepThrough, type Contour } from '../geometry/contour';
import { regionMomentsAbout } from '../moments/kernel';
import { profileToPaths } from './profiles';
import type { PathShape, Point, Shape } from './types';

/** Contour of a closed path: lines stay lines, three-point arcs become exact arcs. */
export function pathContour(start: Point, segments: PathShape['segments']): Contour {
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

/** Removes straight segments of zero length (repeated points), keeping arcs intact. */
function dropZeroLengthLines(xy: number[], bulge: number[]): Contour {
  const n = bulge.length;
  const oxy: number[] = [], ob: number[] = [];
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    if (bulge[i] === 0 && xy[2 * i] === xy[2 * j] && xy[2 * i + 1] === xy[2 * j + 1]) continue;
    oxy.push(xy[2 * i], xy[2 * i + 1]);
    ob.push(bulge[i]);
  }
  return contourFrom(oxy, ob);
}

/** Raw exact contours of one shape: outer loops and, for hollow profiles, holes (reversed). */
export function shapeContours(shape: Shape): Contour[] {
  switch (shape.type) {
    case 'polygon':
      return [dropZeroLengthLines(shape.points.flat(), shape.points.map(() => 0))];
    case 'circle':
      return [circleContour(shape.center[0], shape.center[1], shape.radius)];
    case 'path':
      return [pathContour(shape.start, shape.segments)];
    default: {
      const { outer, holes } = profileToPaths(shape);
      const out = [orient(pathContour(outer.start, outer.segments), +1)];
      for (const h of holes) out.push(orient(pathContour(h.start, h.segments), -1));
      return out;
    }
  }
}

/** The contour with the requested orientation (+1 CCW, −1 CW). */
export function orient(c: Contour, sign: 1 | -1): Contour {
  const a = regionMomentsAbout([c], c.xy[0], c.xy[1]).m00;
  return Math.sign(a) === sign || a === 0 ? c : reverseContour(c);
}

/** True for shape kinds whose outline can cross itself and so needs resolving. */
export function mayCrossItself(shape: Shape): boolean {
  return shape.type === 'polygon' || shape.type === 'path';
}
