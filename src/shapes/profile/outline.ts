/**
 * Parametric profiles as exact path geometry (lines and circular arcs), placed in world
 * coordinates.
 *
 * Each outline is first built in the profile's local frame, as described beside its type in
 * types.ts, as a loop of corners with an optional fillet radius per corner. A rounded corner
 * becomes the tangent circular arc of that radius; its `via` point is the arc's midpoint,
 * computed from the arc centre. The placement is applied after that: mirror about the local y axis
 * (x -> -x), rotate `rotation` degrees CCW about the local origin, then translate by `at`.
 *
 * Orientation: the outer boundary always runs CCW and holes run CW (a mirror reverses the
 * traversal, so mirrored paths are written backwards). Every path ends exactly at its start.
 */
import { lengthOf, sweepThrough } from '../../geometry/contour';
import type { Point } from '../base';
import type { PathSegment, PathShape } from '../path';
import { validateProfile, type ProfileIssue } from './fields';
import type { ProfileShape } from './types';

export interface ProfilePaths {
  /** The outer boundary, CCW, carrying the profile's id, op and name. */
  outer: PathShape;
  /** Holes, CW, with ids `<id>:hole<k>` and the same op and name as the outer path. */
  holes: PathShape[];
}

/** Thrown by profileToPaths for a profile that fails validateProfile. */
export class ProfileError extends Error {
  readonly issues: ProfileIssue[];
  constructor(issues: ProfileIssue[]) {
    super(`invalid profile: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
    this.name = 'ProfileError';
    this.issues = issues;
  }
}

// ---------------------------------------------------------------------------------------------
// Local outlines

/** A polygon corner; r > 0 rounds it with the tangent arc of that radius. */
interface Corner {
  x: number;
  y: number;
  r: number;
}

/** A closed loop in local coordinates: start point and segments, the last ending at start. */
interface Loop {
  start: Point;
  segments: PathSegment[];
}

/**
 * Round the corners of a polygon (given CCW or CW) with tangent arcs. Radii at or below
 * `1e-9 * scale` count as sharp corners; straight pieces shorter than `1e-12 * scale` (where two
 * fillets or a fillet and a corner meet) are dropped. Radii must already be known to fit.
 */
function roundedLoop(corners: readonly Corner[], scale: number): Loop {
  const n = corners.length;
  const minRadius = 1e-9 * scale;
  const minLength = 1e-12 * scale;
  type Rounded = { tin: Point; tout: Point; via?: Point };
  const rounded: Rounded[] = corners.map((c, i) => {
    const prev = corners[(i + n - 1) % n], next = corners[(i + 1) % n];
    const p: Point = [c.x, c.y];
    if (!(c.r > minRadius)) return { tin: p, tout: p };
    const [d1x, d1y] = unit(c.x - prev.x, c.y - prev.y);
    const [d2x, d2y] = unit(next.x - c.x, next.y - c.y);
    const cross = d1x * d2y - d1y * d2x;
    const dot = d1x * d2x + d1y * d2y;
    if (cross === 0) return { tin: p, tout: p };
    // Tangent length r·tan(θ/2) with θ the turn angle; exactly r for a right angle.
    const t = (c.r * Math.abs(cross)) / (1 + dot);
    const tin: Point = [c.x - d1x * t, c.y - d1y * t];
    const tout: Point = [c.x + d2x * t, c.y + d2y * t];
    // Centre: from the entry tangent point, r along the normal on the side the loop turns to.
    const nx = cross > 0 ? -d1y : d1y, ny = cross > 0 ? d1x : -d1x;
    const cx = tin[0] + nx * c.r, cy = tin[1] + ny * c.r;
    const [ux, uy] = unit(c.x - cx, c.y - cy);
    return { tin, tout, via: [cx + ux * c.r, cy + uy * c.r] };
  });
  const start = rounded[0].tout;
  const segments: PathSegment[] = [];
  let cur = start;
  for (let k = 1; k <= n; k++) {
    const r = rounded[k % n];
    const q = r.tin;
    if (lengthOf(q[0] - cur[0], q[1] - cur[1]) > minLength) {
      segments.push({ to: q });
      cur = q;
    }
    if (r.via) {
      segments.push({ to: r.tout, via: r.via });
      cur = r.tout;
    }
  }
  // Close exactly on the start point (a dropped tiny piece may leave `cur` a rounding error off).
  if (segments.length > 0) segments[segments.length - 1].to = start;
  return { start, segments };
}

function unit(x: number, y: number): [number, number] {
  const L = lengthOf(x, y);
  return [x / L, y / L];
}

/** Axis-aligned rectangle [x0, x0+w] × [y0, y0+h] with all four corners rounded by r, CCW. */
function rectCorners(x0: number, y0: number, w: number, h: number, r: number): Corner[] {
  return [
    { x: x0, y: y0, r },
    { x: x0 + w, y: y0, r },
    { x: x0 + w, y: y0 + h, r },
    { x: x0, y: y0 + h, r },
  ];
}

/** Full circle about (cx, cy) as two half arcs, CCW (or CW), starting on the +x side. */
function circleLoop(cx: number, cy: number, r: number, ccw: boolean): Loop {
  const s = ccw ? 1 : -1;
  const start: Point = [cx + r, cy];
  return {
    start,
    segments: [
      { to: [cx - r, cy], via: [cx, cy + s * r] },
      { to: start, via: [cx, cy - s * r] },
    ],
  };
}

function reverseLoop(loop: Loop): Loop {
  // Points P0 = start, P1..Pn = segment ends (Pn = P0). Segment k runs P(k-1) -> Pk via Vk.
  const pts: Point[] = [loop.start, ...loop.segments.map((s) => s.to)];
  const segments: PathSegment[] = [];
  for (let k = loop.segments.length; k >= 1; k--) {
    const via = loop.segments[k - 1].via;
    segments.push(via ? { to: pts[k - 1], via } : { to: pts[k - 1] });
  }
  return { start: pts[pts.length - 1], segments };
}

/** The local outline: outer loop CCW, holes CCW as well (reversed later). */
function localOutline(p: ProfileShape): { outer: Loop; holes: Loop[] } {
  switch (p.type) {
    case 'rectangle': {
      const s = Math.max(p.width, p.height);
      return { outer: roundedLoop(rectCorners(0, 0, p.width, p.height, p.cornerRadius ?? 0), s), holes: [] };
    }
    case 'i-beam': {
      const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r } = p;
      const xl = b / 2 - tw / 2, xr = b / 2 + tw / 2;
      const corners: Corner[] = [
        { x: 0, y: 0, r: 0 },
        { x: b, y: 0, r: 0 },
        { x: b, y: tf, r: 0 },
        { x: xr, y: tf, r },
        { x: xr, y: d - tf, r },
        { x: b, y: d - tf, r: 0 },
        { x: b, y: d, r: 0 },
        { x: 0, y: d, r: 0 },
        { x: 0, y: d - tf, r: 0 },
        { x: xl, y: d - tf, r },
        { x: xl, y: tf, r },
        { x: 0, y: tf, r: 0 },
      ];
      return { outer: roundedLoop(corners, Math.max(b, d)), holes: [] };
    }
    case 'channel': {
      const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r } = p;
      const corners: Corner[] = [
        { x: 0, y: 0, r: 0 },
        { x: b, y: 0, r: 0 },
        { x: b, y: tf, r: 0 },
        { x: tw, y: tf, r },
        { x: tw, y: d - tf, r },
        { x: b, y: d - tf, r: 0 },
        { x: b, y: d, r: 0 },
        { x: 0, y: d, r: 0 },
      ];
      return { outer: roundedLoop(corners, Math.max(b, d)), holes: [] };
    }
    case 'angle': {
      const { legVertical: lv, legHorizontal: lh, thickness: t, rootRadius: r } = p;
      const corners: Corner[] = [
        { x: 0, y: 0, r: 0 },
        { x: lh, y: 0, r: 0 },
        { x: lh, y: t, r: 0 },
        { x: t, y: t, r },
        { x: t, y: lv, r: 0 },
        { x: 0, y: lv, r: 0 },
      ];
      return { outer: roundedLoop(corners, Math.max(lh, lv)), holes: [] };
    }
    case 'tee': {
      const { depth: d, flangeWidth: b, flangeThickness: tf, stemThickness: ts, rootRadius: r } = p;
      const xl = b / 2 - ts / 2, xr = b / 2 + ts / 2;
      const corners: Corner[] = [
        { x: xl, y: 0, r: 0 },
        { x: xr, y: 0, r: 0 },
        { x: xr, y: d - tf, r },
        { x: b, y: d - tf, r: 0 },
        { x: b, y: d, r: 0 },
        { x: 0, y: d, r: 0 },
        { x: 0, y: d - tf, r: 0 },
        { x: xl, y: d - tf, r },
      ];
      return { outer: roundedLoop(corners, Math.max(b, d)), holes: [] };
    }
    case 'rect-tube': {
      const { width: w, height: h, wall: t, outerRadius: ro } = p;
      const s = Math.max(w, h);
      const ri = Math.max(ro - t, 0);
      return {
        outer: roundedLoop(rectCorners(0, 0, w, h, ro), s),
        holes: [roundedLoop(rectCorners(t, t, w - 2 * t, h - 2 * t, ri), s)],
      };
    }
    case 'round-tube': {
      const R = p.outerDiameter / 2;
      return { outer: circleLoop(0, 0, R, true), holes: [circleLoop(0, 0, R - p.wall, true)] };
    }
    case 'bent-plate': {
      const { legHorizontal: lh, legVertical: lv, thickness: t, insideRadius: ri } = p;
      const corners: Corner[] = [
        { x: 0, y: 0, r: ri + t },
        { x: lh, y: 0, r: 0 },
        { x: lh, y: t, r: 0 },
        { x: t, y: t, r: ri },
        { x: t, y: lv, r: 0 },
        { x: 0, y: lv, r: 0 },
      ];
      return { outer: roundedLoop(corners, Math.max(lh, lv)), holes: [] };
    }
  }
}

// ---------------------------------------------------------------------------------------------
// Placement

/** cos and sin of an angle in degrees, exact for multiples of 90. */
function cosSinDegrees(deg: number): [number, number] {
  const q = deg / 90;
  if (Number.isInteger(q)) {
    const k = ((q % 4) + 4) % 4;
    return ([[1, 0], [0, 1], [-1, 0], [0, -1]] as const)[k] as [number, number];
  }
  const t = (deg * Math.PI) / 180;
  return [Math.cos(t), Math.sin(t)];
}

function placeLoop(loop: Loop, mirror: boolean, cs: number, sn: number, ax: number, ay: number): Loop {
  const start = placePoint(loop.start, mirror, cs, sn, ax, ay);
  const segments: PathSegment[] = [];
  let lp = loop.start, wp = start;
  for (const g of loop.segments) {
    const to = placePoint(g.to, mirror, cs, sn, ax, ay);
    if (g.via) {
      // Far from the origin a tiny arc may lose its shape in rounding; then a chord is as exact
      // as the coordinates allow. The placed arc must keep the local sweep (sign flipped by a mirror).
      const want = sweepThrough(lp[0], lp[1], g.via[0], g.via[1], g.to[0], g.to[1]) * (mirror ? -1 : 1);
      const via = placePoint(g.via, mirror, cs, sn, ax, ay);
      const got = sweepThrough(wp[0], wp[1], via[0], via[1], to[0], to[1]);
      segments.push(Math.abs(got - want) <= 1e-6 ? { to, via } : { to });
    } else segments.push({ to });
    lp = g.to;
    wp = to;
  }
  // A mirror reverses the traversal; write it backwards so the orientation is kept.
  return mirror ? reverseLoop({ start, segments }) : { start, segments };
}

/** A local point placed: mirrored (if so), turned by (cs, sn), moved by (ax, ay). */
function placePoint(q: Point, mirror: boolean, cs: number, sn: number, ax: number, ay: number): Point {
  const x = mirror ? -q[0] : q[0], y = q[1];
  return [cs * x - sn * y + ax, sn * x + cs * y + ay];
}

function toPathShape(p: ProfileShape, id: string, loop: Loop): PathShape {
  const out: PathShape = { id, type: 'path', start: loop.start, segments: loop.segments };
  if (p.name !== undefined) out.name = p.name;
  if (p.op !== undefined) out.op = p.op;
  return out;
}

/**
 * The exact boundary of a profile in world coordinates: the outer path (CCW) and its holes (CW;
 * only rect-tube and round-tube have one). Throws ProfileError when validateProfile finds
 * problems, so a caller that validates first never sees an exception.
 */
export function profileToPaths(shape: ProfileShape): ProfilePaths {
  const issues = validateProfile(shape);
  if (issues.length > 0) throw new ProfileError(issues);
  const local = localOutline(shape);
  const [cs, sn] = cosSinDegrees(shape.rotation ?? 0);
  const mirror = shape.mirror === true;
  const [ax, ay] = shape.at;
  const outer = placeLoop(local.outer, mirror, cs, sn, ax, ay);
  const holes = local.holes.map((h) => placeLoop(reverseLoop(h), mirror, cs, sn, ax, ay));
  return {
    outer: toPathShape(shape, shape.id, outer),
    holes: holes.map((h, k) => toPathShape(shape, `${shape.id}:hole${k}`, h)),
  };
}
