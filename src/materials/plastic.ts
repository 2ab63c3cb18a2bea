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
 * The axis is found by the same function as the single-material one (src/properties/
 * plastic-axis.ts), with weights w_i = fy_i / max fy, so one material has w = 1 and gives the
 * equal-area axis and Z of sectionProperties with the very same arithmetic (Mp = fy · Z).
 */
import { regionBounds } from '../geometry/contour';
import { planCuts } from '../moments/cut';
import { centralMoments } from '../moments/kernel';
import { plasticAxes, type PlasticPart } from '../properties/plastic-axis';
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

export const PLASTIC_CAUTION =
  'The plastic moment takes every material as rigid-plastic at its fy, in tension and in compression alike, with full composite action and no axial force. It does not apply to concrete, timber or glass, and it ignores local buckling.';

/** Plastic neutral axes and plastic moments about horizontal and vertical axes. */
export function compositePlastic(parts: readonly MaterialPart[]): CompositePlastic {
  const live = parts.filter((p) => regionBounds(p.region));
  if (live.length === 0) throw new SectionError('The section is empty: it has no area.');
  live.forEach((p) => assertMaterial(p.material));
  const fyMax = Math.max(...live.map((p) => p.material.fy));
  const weighted: PlasticPart[] = live.map((p) => ({ plan: planCuts(p.region), cm: centralMoments(p.region), w: p.material.fy / fyMax }));
  const bs = live.map((p) => regionBounds(p.region)!);
  const bounds = { xmin: Math.min(...bs.map((b) => b.xmin)), xmax: Math.max(...bs.map((b) => b.xmax)), ymin: Math.min(...bs.map((b) => b.ymin)), ymax: Math.max(...bs.map((b) => b.ymax)) };
  const { x: px, y: py } = plasticAxes(weighted, bounds);
  const out: CompositePlastic = {
    x: { at: px.at, Mp: fyMax * px.Z },
    y: { at: py.at, Mp: fyMax * py.Z },
    caution: PLASTIC_CAUTION,
  };
  if (![out.x.at, out.x.Mp, out.y.at, out.y.Mp].every(Number.isFinite)) throw new SectionError('The plastic moment could not be computed: a strength or coordinate is too large or too small.');
  return out;
}
