/**
 * The convergence estimate from two meshes, the second with half the element size.
 *
 * J from displacement-type elements converges from above at the rate of the energy error squared:
 * with quadratic elements the energy error is O(h^min(2, λ)), where λ = π/φ for the largest
 * corner angle φ of the boundary (near a corner the warping function behaves like r^λ; Strang &
 * Fix, An Analysis of the Finite Element Method, ch. 8, from memory), so J's error is O(h^p) with
 * p = 2·min(2, λ): 4 for a smooth outline or one whose corners are at most 90°, 3 for 120°
 * corners, 4/3 for a square re-entrant (270°) corner. Richardson extrapolation with that order
 * estimates the error left on the finer mesh: |J_h − J_h/2| / (2^p − 1).
 */
import type { ExactBoundary } from './boundary-edges';
import { edgeShape } from './boundary-edges';
import { edgeTangentFrom } from './edge-geometry';

/** Corners that turn by less than this (radians) count as smooth. */
const SMOOTH_TURN = 1e-3;

/** Largest interior angle (radians) at a sharp corner of the section's outline (0 when it has none). */
export function largestCornerAngle(b: ExactBoundary): number {
  // Only the outline counts (edges with material on one side); interfaces between pieces do not.
  const into = new Map<number, number[]>(), outOf = new Map<number, number[]>();
  b.edges.forEach((e, k) => {
    if ((e.left >= 0) === (e.right >= 0)) return;
    // Orient so the material is on the left.
    const [from, to] = e.left >= 0 ? [e.a, e.b] : [e.b, e.a];
    (outOf.get(from) ?? outOf.set(from, []).get(from)!).push(k);
    (into.get(to) ?? into.set(to, []).get(to)!).push(k);
  });
  let worst = 0;
  for (const [v, ins] of into) {
    const outs = outOf.get(v);
    if (ins.length !== 1 || !outs || outs.length !== 1) continue;
    const ein = b.edges[ins[0]], eout = b.edges[outs[0]];
    const gin = edgeShape(b.xy, ein), gout = edgeShape(b.xy, eout);
    // Direction of travel arriving at v and leaving v (material on the left).
    const [ix, iy] = ein.left >= 0 ? neg(edgeTangentFrom(gin, 'b')) : neg(edgeTangentFrom(gin, 'a'));
    const [ox, oy] = eout.left >= 0 ? edgeTangentFrom(gout, 'a') : edgeTangentFrom(gout, 'b');
    const turn = Math.atan2(ix * oy - iy * ox, ix * ox + iy * oy);
    if (Math.abs(turn) < SMOOTH_TURN) continue;
    worst = Math.max(worst, Math.PI - turn);
  }
  return worst;
}

function neg([x, y]: [number, number]): [number, number] {
  return [-x, -y];
}

/** Expected order of J's error for quadratic elements. */
export function expectedOrder(largestAngle: number): number {
  if (!(largestAngle > 0)) return 4;
  return 2 * Math.min(2, Math.PI / largestAngle);
}

export interface Convergence {
  /** J on the coarse and on the fine mesh. */
  Jcoarse: number;
  Jfine: number;
  /** |J_fine − J_coarse| / J_fine. */
  relativeChange: number;
  /** Order assumed for the extrapolation. */
  order: number;
  /** Estimated relative error left in J_fine. */
  estimatedError: number;
  /** J extrapolated to zero element size. */
  Jextrapolated: number;
  /** Relative change of Cw between the meshes (0 when Cw is 0 on both). */
  CwChange: number;
  /** Movement of the shear centre between the meshes, relative to the section size. */
  shearCentreShift: number;
}

export function convergence(
  Jc: number,
  Jf: number,
  Cwc: number,
  Cwf: number,
  shiftLength: number,
  size: number,
  order: number,
): Convergence {
  const change = Math.abs(Jf - Jc) / Math.abs(Jf);
  const factor = 2 ** order - 1;
  return {
    Jcoarse: Jc,
    Jfine: Jf,
    relativeChange: change,
    order,
    estimatedError: change / factor,
    Jextrapolated: Jf - (Jc - Jf) / factor,
    CwChange: Cwf === 0 && Cwc === 0 ? 0 : Math.abs(Cwf - Cwc) / Math.max(Math.abs(Cwf), Math.abs(Cwc)),
    shearCentreShift: shiftLength / size,
  };
}
