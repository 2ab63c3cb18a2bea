/**
 * Plastic neutral axes and plastic moments of a section of several materials, each at its own fy.
 *
 * Every fibre is taken at +fy in tension on one side of the axis and −fy in compression on the
 * other (rigid-plastic, the same strength both ways). With no axial force, the plastic neutral axis
 * is where the forces balance: Σ fy_i A_i,above(c) = Σ fy_i A_i / 2, and the plastic moment is
 * Mp = Σ fy_i (Q_i,above − Q_i,below) about that axis (Gere & Goodno, Sec. 6.10, plastic moment,
 * extended to several materials by weighting each area with its fy, as in the composite plastic
 * analysis of EN 1994-1-1, §6.2.1.2, from memory).
 *
 * The axis is found like the single-material one in src/properties/section.ts: safeguarded Newton
 * on f(c) = Σ w_i A_i,above(c) − W/2, whose derivative is −Σ w_i b_i(c), falling back to bisection
 * when a step leaves the bracket. The weights are w_i = fy_i / max fy, so one material has w = 1
 * and gives the equal-area axis and Z of sectionProperties with the very same arithmetic
 * (Mp = fy · Z).
 */
import { regionBounds, rotateRegion, type Region } from '../geometry/contour';
import { momentsAbove } from '../moments/cut';
import { regionMoments, type RawMoments } from '../moments/kernel';
import { SectionError } from '../properties/section';
import { assertMaterial } from './material';
import type { MaterialPart } from './mixed';

export interface PlasticAxis {
  /** Position of the plastic neutral axis: y of the horizontal one, x of the vertical one. */
  at: number;
  /** Plastic moment in stress unit × length³ (see units.ts, resistanceMomentFactor, for force × length). */
  Mp: number;
}

export interface CompositePlastic {
  /** Bending about a horizontal axis (moment vector along x). */
  x: PlasticAxis;
  /** Bending about a vertical axis (moment vector along y). */
  y: PlasticAxis;
  /** What the plastic moment assumes (PLASTIC_CAUTION). */
  caution: string;
}

interface Weighted {
  region: Region;
  w: number;
  m: RawMoments;
}

/** Σ w_i (moments above y = c) and Σ w_i b_i(c). */
function weightedAbove(parts: readonly Weighted[], c: number) {
  let A = 0, Q = 0, width = 0;
  parts.forEach((p, k) => {
    const h = momentsAbove(p.region, c);
    if (k === 0) {
      A = p.w * h.m00;
      Q = p.w * h.m01;
      width = p.w * h.width;
    } else {
      A += p.w * h.m00;
      Q += p.w * h.m01;
      width += p.w * h.width;
    }
  });
  return { A, Q, width };
}

/** The c where the weighted area above equals `half` (the cut of section.ts, weighted). */
function equalForceCut(parts: readonly Weighted[], lo: number, hi: number, half: number): number {
  let a = lo, b = hi;
  let c = (a + b) / 2;
  const tol = 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b), b - a);
  for (let k = 0; k < 200; k++) {
    const h = weightedAbove(parts, c);
    const f = h.A - half;
    if (f > 0) a = c;
    else b = c;
    if (f === 0 || b - a <= tol) break;
    const step = h.width > 0 ? f / h.width : NaN;
    let next = c + step;
    if (!(next > a && next < b)) next = (a + b) / 2;
    if (Math.abs(next - c) <= tol) break;
    c = next;
  }
  return c;
}

/** Weighted plastic modulus about the horizontal equal-force axis: Σ w_i ∫|y − c| dA. */
function aboutHorizontal(parts: readonly Weighted[], ymin: number, ymax: number): { Z: number; at: number } {
  let W = 0, WQ = 0;
  parts.forEach((p, k) => {
    W = k === 0 ? p.w * p.m.m00 : W + p.w * p.m.m00;
    WQ = k === 0 ? p.w * p.m.m01 : WQ + p.w * p.m.m01;
  });
  const yp = equalForceCut(parts, ymin, ymax, W / 2);
  const above = weightedAbove(parts, yp);
  const Aa = above.A, Ab = W - Aa;
  const Qa = above.Q - yp * Aa;
  const Qb = WQ - above.Q - yp * Ab;
  return { Z: Qa - Qb, at: yp };
}

export const PLASTIC_CAUTION =
  'The plastic moment takes every material as rigid-plastic at its fy, in tension and in compression alike, with full composite action and no axial force. It does not apply to concrete, timber or glass, and it ignores local buckling.';

/** Plastic neutral axes and plastic moments about horizontal and vertical axes. */
export function compositePlastic(parts: readonly MaterialPart[]): CompositePlastic {
  const live = parts.filter((p) => regionBounds(p.region));
  if (live.length === 0) throw new SectionError('The section is empty: it has no area.');
  live.forEach((p) => assertMaterial(p.material));
  const fyMax = Math.max(...live.map((p) => p.material.fy));
  const weighted: Weighted[] = live.map((p) => ({ region: p.region, w: p.material.fy / fyMax, m: regionMoments(p.region) }));
  const bs = live.map((p) => regionBounds(p.region)!);
  const xmin = Math.min(...bs.map((b) => b.xmin)), xmax = Math.max(...bs.map((b) => b.xmax));
  const ymin = Math.min(...bs.map((b) => b.ymin)), ymax = Math.max(...bs.map((b) => b.ymax));
  const px = aboutHorizontal(weighted, ymin, ymax);
  // Vertical axis: turn by −90° ((x, y) -> (y, −x)), as section.ts does; the regions keep their sense.
  const turned: Weighted[] = weighted.map((p) => ({
    region: rotateRegion(p.region, -Math.PI / 2),
    w: p.w,
    m: { m00: p.m.m00, m10: p.m.m01, m01: -p.m.m10, m20: p.m.m02, m02: p.m.m20, m11: -p.m.m11 },
  }));
  const py = aboutHorizontal(turned, -xmax, -xmin);
  const out: CompositePlastic = {
    x: { at: px.at, Mp: fyMax * px.Z },
    y: { at: -py.at, Mp: fyMax * py.Z },
    caution: PLASTIC_CAUTION,
  };
  if (![out.x.at, out.x.Mp, out.y.at, out.y.Mp].every(Number.isFinite)) throw new SectionError('The plastic moment could not be computed: a strength or coordinate is too large or too small.');
  return out;
}
