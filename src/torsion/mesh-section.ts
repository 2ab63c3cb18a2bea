/**
 * Pieces → a quality triangle mesh of the section, in the local frame of exactBoundary.
 *
 * The density setting fixes three numbers: the largest element size (a fraction of the square
 * root of the section's area), the number of elements wanted across a wall, and the point budget.
 * Everything else follows from the geometry (local-size.ts) and the quality bound (refine.ts).
 */
import { regionMoments } from '../moments/kernel';
import type { Region } from '../geometry/contour';
import { exactBoundary, type ExactBoundary } from './boundary-edges';
import { localPlace } from './cdt';
import { TorsionError } from './errors';
import { BoundarySizer } from './local-size';
import { Pslg } from './pslg';
import { refineMesh, type LinearMesh } from './refine';

export type TorsionDensity = 'coarse' | 'normal' | 'fine';

interface DensityRule {
  /** Largest element size = √(area) / this. */
  perRootArea: number;
  /** Elements across a wall. */
  across: number;
}

export const DENSITY_RULES: Readonly<Record<TorsionDensity, DensityRule>> = {
  coarse: { perRootArea: 6, across: 1 },
  normal: { perRootArea: 10, across: 1.5 },
  fine: { perRootArea: 16, across: 2.5 },
};

/** Smallest angle of every triangle (degrees). */
export const MIN_ANGLE_DEG = 25;
/** Chord sagitta as a fraction of the chord, at most. */
export const SAGITTA_RATIO = 0.05;
/** Growth of the element size per unit distance from a small feature. */
export const GRADING_RATE = 0.35;
/** Smallest element size, relative to the section size (keeps tangencies and slivers finite). */
const MIN_SIZE_RATIO = 1e-5;
const MAX_POINTS = 250_000;

export interface SectionMesh {
  mesh: LinearMesh;
  boundary: ExactBoundary;
  /** Area of each piece (exact, from the contours). */
  areas: number[];
}

export function* meshSection(regions: readonly Region[], density: TorsionDensity): Generator<number, SectionMesh> {
  const areas = regions.map((r, k) => {
    const a = regionMoments(r).m00;
    if (!(a > 0)) throw new TorsionError(`pieces[${k}] has no area (an empty region, or loops that run the wrong way)`);
    return a;
  });
  const boundary = exactBoundary(regions.map((region) => ({ region })));
  const rule = DENSITY_RULES[density];
  const total = areas.reduce((s, a) => s + a, 0);
  const hMax = Math.sqrt(total) / rule.perRootArea;
  const hMin = MIN_SIZE_RATIO * boundary.size;
  const sizer = new BoundarySizer(boundary, { hMax, hMin, across: rule.across, sagittaRatio: SAGITTA_RATIO });
  const pslg = new Pslg(boundary, sizer);
  yield 0.05;
  const place = localPlace(boundary.originX, boundary.originY);
  const mesh = yield* refineMesh(pslg, { minAngleDeg: MIN_ANGLE_DEG, rate: GRADING_RATE, hMax, hMin, maxPoints: MAX_POINTS }, place);
  return { mesh, boundary, areas };
}
