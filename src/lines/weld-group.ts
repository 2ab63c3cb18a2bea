/**
 * Weld groups by the elastic vector method (the weld treated as a line of unit throat;
 * Blodgett, Design of Welded Structures, Sect. 7.4).
 *
 * A force F = (Fx, Fy) applied at a point P, plus an optional moment M0 (CCW positive), acts on a
 * group of length L, centroid G and polar line moment J. Moved to G it is F and the moment
 *   M = M0 + (P − G) × F = M0 + (Px − Gx)·Fy − (Py − Gy)·Fx.
 * At a point q of the group the force per unit length is the direct part F / L plus the
 * torsional part (M / J)·k × (q − G), perpendicular to the radius (k the unit normal to the plane):
 *   f(q) = F / L + (M / J)·(−(qy − Gy), qx − Gx).
 *
 * The most stressed point is found exactly. f is affine in q, so |f|² is convex along a straight
 * segment and its maximum lies at an end. On an arc, in the chord frame q(θ) = M + u·h(cosθ −
 * cosα)/sinα + e·h sinθ/sinα, |f(θ)|² is a constant plus a multiple of a sinusoid in θ, stationary
 * where tanθ = B sinα / (A sinα − κ h cosα) (A, B the components of f at the chord midpoint along
 * k × u and k × e, κ = M / J); both stationary angles inside the sweep are candidates, with the ends.
 *
 * Caution: the elastic vector method only. Weld strength, throat size and a code's directional
 * rules are for the designer (see WELD_GROUP_CAUTION in cautions.ts).
 */
import type { Vec2 } from '../geometry/contour';
import { arcPointAtAngle } from '../geometry/contour';
import { chainSegment, LineError, segmentCount, type LineGroup } from './chain';
import { lineProperties, type LineProperties } from './line-properties';

export interface WeldLoad {
  /** Force components, in force units. */
  Fx: number;
  Fy: number;
  /** Where the force acts. */
  at: Vec2;
  /** Added moment, CCW positive (force × length). */
  M?: number;
}

export interface WeldForce {
  /** The point of the group. */
  x: number;
  y: number;
  /** Resultant force per unit length and its magnitude. */
  fx: number;
  fy: number;
  f: number;
  /** The direct part F / L and the torsional part (M / J)·k × r. */
  direct: { fx: number; fy: number };
  torsion: { fx: number; fy: number };
}

/** A point of the group, with the chain and segment it lies on. */
export interface WeldPoint extends WeldForce {
  chain: number;
  segment: number;
}

export interface WeldGroupResult {
  properties: LineProperties;
  /** Moment about the centroid, CCW positive. */
  M: number;
  /** The direct force per unit length, F / L (the same everywhere). */
  direct: { fx: number; fy: number };
  /** The most stressed point (the first found when several tie). */
  critical: WeldPoint;
  /** Other distinct points within 1e-9 of the largest force (e.g. a symmetric group's mirror point). */
  alsoCritical: WeldPoint[];
  /** True when there is no moment about the centroid (to round-off): every point carries F / L. */
  uniform: boolean;
}

/** The part of a weld-group result that fixes the force at any point. */
export type WeldState = Pick<WeldGroupResult, 'properties' | 'M' | 'direct'>;

/** Force per unit length at (x, y), a point of the group. */
export function weldForceAt(state: WeldState, x: number, y: number): WeldForce {
  const { centroid } = state.properties;
  return forceRelative(state, x - centroid.x, y - centroid.y, x, y);
}

function forceRelative(state: WeldState, rx: number, ry: number, x: number, y: number): WeldForce {
  const k = state.M / state.properties.J;
  const tx = -k * ry, ty = k * rx;
  const fx = state.direct.fx + tx, fy = state.direct.fy + ty;
  return { x, y, fx, fy, f: Math.hypot(fx, fy), direct: { ...state.direct }, torsion: { fx: tx, fy: ty } };
}

/** Forces in a weld group under one load, and its most stressed point. */
export function weldGroupForces(group: LineGroup, load: WeldLoad): WeldGroupResult {
  const { Fx, Fy, at } = load;
  const M0 = load.M ?? 0;
  if (![Fx, Fy, M0].every(Number.isFinite)) throw new LineError('The weld load must be finite numbers (Fx, Fy and the moment).');
  if (!Array.isArray(at) || !Number.isFinite(at[0]) || !Number.isFinite(at[1])) {
    throw new LineError('The point where the force acts must be two finite numbers.');
  }
  const properties = lineProperties(group);
  const { centroid: G, length: L } = properties;
  const M = M0 + (at[0] - G.x) * Fy - (at[1] - G.y) * Fx;
  const state: WeldState = { properties, M, direct: { fx: Fx / L, fy: Fy / L } };
  const candidates = candidatePoints(group, state);
  let best = candidates[0];
  for (const c of candidates) if (c.f > best.f) best = c;
  const extent = Math.max(properties.bounds.xmax - properties.bounds.xmin, properties.bounds.ymax - properties.bounds.ymin);
  const alsoCritical: WeldPoint[] = [];
  for (const c of candidates) {
    if (c === best || !(c.f >= best.f * (1 - 1e-9))) continue;
    const seen = [best, ...alsoCritical].some((p) => Math.hypot(p.x - c.x, p.y - c.y) <= 1e-9 * extent);
    if (!seen) alsoCritical.push(c);
  }
  // Uniform when the torsional part at the farthest point is lost in the direct part's round-off.
  const b = properties.bounds;
  const rmax = Math.max(Math.hypot(b.xmin - G.x, b.ymin - G.y), Math.hypot(b.xmax - G.x, b.ymax - G.y), Math.hypot(b.xmin - G.x, b.ymax - G.y), Math.hypot(b.xmax - G.x, b.ymin - G.y));
  const uniform = (Math.abs(M) * rmax) / properties.J <= 1e-12 * Math.hypot(state.direct.fx, state.direct.fy);
  return { properties, M, direct: state.direct, critical: best, alsoCritical, uniform };
}

/** Segment ends and, on arcs, the stationary points of |f| inside the sweep. */
function candidatePoints(group: LineGroup, state: WeldState): WeldPoint[] {
  const G = state.properties.centroid;
  const kappa = state.M / state.properties.J;
  const out: WeldPoint[] = [];
  const push = (ci: number, si: number, rx: number, ry: number) => {
    out.push({ ...forceRelative(state, rx, ry, G.x + rx, G.y + ry), chain: ci, segment: si });
  };
  group.forEach((chain, ci) => {
    const m = segmentCount(chain);
    for (let si = 0; si < m; si++) {
      const s = chainSegment(chain, si);
      const ax = s.ax - G.x, ay = s.ay - G.y, bx = s.bx - G.x, by = s.by - G.y;
      push(ci, si, ax, ay);
      push(ci, si, bx, by);
      if (s.sweep === 0) continue;
      const c = Math.hypot(bx - ax, by - ay);
      if (!(c > 0)) continue;
      const h = c / 2, alpha = Math.abs(s.sweep) / 2;
      const sa = Math.sin(alpha), ca = Math.cos(alpha);
      const ex = (bx - ax) / c, ey = (by - ay) / c;
      const sg = s.sweep > 0 ? 1 : -1;
      const ux = sg * ey, uy = -sg * ex;
      // f at the chord midpoint, resolved along k × u = (−uy, ux) and k × e = (−ey, ex).
      const f0 = forceRelative(state, (ax + bx) / 2, (ay + by) / 2, 0, 0);
      const A = -f0.fx * uy + f0.fy * ux;
      const B = -f0.fx * ey + f0.fy * ex;
      const th = Math.atan2(B * sa, A * sa - kappa * h * ca);
      for (const t of [th, th > 0 ? th - Math.PI : th + Math.PI]) {
        if (Math.abs(t) < alpha) {
          const [px, py] = arcPointAtAngle(ax, ay, bx, by, s.sweep, t);
          push(ci, si, px, py);
        }
      }
    }
  });
  return out;
}
