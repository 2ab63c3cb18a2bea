/**
 * Pieces → a quality triangle mesh of the section, in the local frame of exactBoundary.
 *
 * The density setting fixes three numbers: the largest element size (a fraction of the square
 * root of the section's area), the number of elements wanted across a wall, and the point budget.
 * Everything else follows from the geometry (local-size.ts) and the quality bound (refine.ts).
 */
import { regionMoments } from '../moments/kernel';
import type { Region } from '../geometry/contour';
import { checkRegion, exactBoundary, type ExactBoundary } from './boundary-edges';
import { localPlace } from './cdt';
import { TorsionError } from './errors';
import { BoundarySizer, type SizeRules } from './local-size';
import { Pslg } from './pslg';
import { refineMesh, type LinearMesh, type RefineRules } from './refine';
import { cutToPositiveSide, flagCuts, mirrorAxes, mirrorMesh, toLocal, type Axis } from './symmetry';

export type TorsionDensity = 'coarse' | 'normal' | 'fine';

/**
 * What each density asks of the coarser mesh (the finer one halves every element): quadratic
 * elements follow the warping of a thin wall closely with one element across it, which the
 * default asks for; about 1e-3 on J and 1 % of the wall thickness on the shear centre for the
 * 50-shape benchmark section, against 'fine'.
 */
interface DensityRule {
  /** Largest element size = √(area) / this. */
  perRootArea: number;
  /** Elements across a wall. */
  across: number;
}

export const DENSITY_RULES: Readonly<Record<TorsionDensity, DensityRule>> = {
  coarse: { perRootArea: 6, across: 0.75 },
  normal: { perRootArea: 10, across: 1 },
  fine: { perRootArea: 16, across: 2 },
};

/** Smallest angle of every triangle (degrees). */
export const MIN_ANGLE_DEG = 25;
/** Chord sagitta as a fraction of the chord, at most. */
export const SAGITTA_RATIO = 0.05;
/** Growth of the element size per unit distance from a small feature. */
export const GRADING_RATE = 0.35;
/** Smallest element size, relative to the section size (keeps tangencies and slivers finite). */
const MIN_SIZE_RATIO = 1e-5;
/**
 * Point budget of the straight-sided mesh: the finer quadratic mesh has about 16 nodes per point,
 * so this caps it near 400 000 nodes (slivers and cusps are the usual reason to reach it).
 */
const MAX_POINTS = 25_000;

export interface SectionMesh {
  mesh: LinearMesh;
  /** The whole section's exact boundary (its frame is the mesh's frame). */
  boundary: ExactBoundary;
  /** Mirror axes the mesh was built with (the mesh is exactly symmetric about them). */
  axes: Axis[];
  /** Area of each piece (exact, from the contours). */
  areas: number[];
}

export function* meshSection(regions: readonly Region[], density: TorsionDensity): Generator<number, SectionMesh> {
  regions.forEach(checkRegion);
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
  const sizeRules = { hMax, hMin, across: rule.across, sagittaRatio: SAGITTA_RATIO };
  const refineRules = { minAngleDeg: MIN_ANGLE_DEG, rate: GRADING_RATE, hMax, hMin, maxPoints: MAX_POINTS };
  const axes = mirrorAxes(boundary);
  if (axes.length > 0) {
    const half = yield* meshMirrored(regions, boundary, axes, sizeRules, refineRules);
    if (half) return { mesh: half, boundary, axes, areas };
  }
  const pslg = new Pslg(boundary, new BoundarySizer(boundary, sizeRules));
  yield 0.05;
  const mesh = yield* refineMesh(pslg, refineRules, localPlace(boundary.originX, boundary.originY));
  return { mesh, boundary, axes: [], areas };
}

/**
 * Mesh the part of a symmetric section on the positive side of its mirror axes, then mirror the
 * mesh into the whole section (symmetry.ts). Returns null if the cut cannot be made, and the
 * caller meshes the whole section instead.
 */
function* meshMirrored(
  regions: readonly Region[],
  whole: ExactBoundary,
  axes: Axis[],
  sizeRules: SizeRules,
  refineRules: RefineRules,
): Generator<number, LinearMesh | null> {
  let part: ExactBoundary;
  try {
    const cut = cutToPositiveSide(toLocal(regions, whole.originX, whole.originY), axes, whole.size, whole.snap);
    if (cut.some((r) => r.length === 0)) return null;
    part = exactBoundary(
      cut.map((region) => ({ region })),
      { originX: 0, originY: 0, size: whole.size },
    );
  } catch {
    return null;
  }
  part.originX = whole.originX;
  part.originY = whole.originY;
  flagCuts(part, axes);
  const pslg = new Pslg(part, new BoundarySizer(part, sizeRules));
  yield 0.05;
  let mesh = yield* refineMesh(pslg, refineRules, localPlace(whole.originX, whole.originY));
  let cut: Uint8Array = Uint8Array.from(part.edges, (e) => (e.cut ? 1 : 0));
  for (const axis of axes) ({ mesh, cut } = mirrorMesh(mesh, axis, cut));
  return mesh;
}
