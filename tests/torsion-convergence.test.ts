/**
 * Convergence of the finite-element torsion constant as the element size is halved.
 *
 * Theory (Strang & Fix, An Analysis of the Finite Element Method, ch. 1 and 8, from memory):
 * J from the warping (displacement) formulation is the true J plus the energy of the error, so
 * on a polygon it converges from above, at twice the energy-norm rate. Quadratic elements give
 * the energy norm O(h²) when the solution is smooth enough, so J converges as h⁴ (square,
 * corners of 90°; circle, where only the isoparametric boundary differs from the exact one). Near
 * a re-entrant corner of angle φ the warping function behaves like r^(π/φ), which caps the energy
 * rate at π/φ: for an L-shaped section (φ = 3π/2) J converges as h^(4/3).
 *
 * Reference values: the rectangle series of Timoshenko & Goodier, Theory of Elasticity, §109,
 * and J = πr⁴/2 for the circle (Roark Table 10.1 case 1). The L-section has no closed form; its
 * order comes from three meshes (each half the size of the one before).
 */
import { describe, expect, it } from 'vitest';
import { circleContour, polygonContour, type Region } from '../src/geometry/contour';
import { computeRegionTorsion } from '../src/torsion';
import { meshSection } from '../src/torsion/mesh-section';
import { reverseCuthillMcKee } from '../src/torsion/ordering';
import { quadraticMesh, renumberNodes, splitUniformly, type QuadMesh } from '../src/torsion/quad-mesh';
import { elementPattern } from '../src/torsion/sparse';
import { solveWarping } from '../src/torsion/warping';

function run<T>(g: Generator<unknown, T>): T {
  for (;;) {
    const r = g.next();
    if (r.done) return r.value;
  }
}

function rectangleJ(b: number, t: number): number {
  // Timoshenko & Goodier §109.
  let s = 0;
  for (let n = 1; n < 400; n += 2) s += Math.tanh((n * Math.PI * b) / (2 * t)) / n ** 5;
  return ((b * t ** 3) / 3) * (1 - ((192 / Math.PI ** 5) * t * s) / b);
}

/** J on a sequence of uniformly split meshes (each half the element size of the previous). */
function nestedJ(region: Region, levels: number): number[] {
  const { mesh } = run(meshSection([region], 'normal'));
  let q: QuadMesh = quadraticMesh(mesh);
  const out: number[] = [];
  for (let l = 0; l < levels; l++) {
    const ord = reverseCuthillMcKee(elementPattern(q.x.length, q.elem, 6));
    q = renumberNodes(q, ord.order).mesh;
    const sol = run(solveWarping(q, Float64Array.of(1), ord.part, ord.parts, { tol: 1e-12, start: null, mirrors: [] }));
    out.push(sol.J);
    if (l + 1 < levels) q = splitUniformly(q).mesh;
  }
  return out;
}

describe('order of convergence of J', () => {
  it('square: the error falls as h⁴ and J stays above the exact value', () => {
    const a = 10;
    const res = computeRegionTorsion([polygonContour([[0, 0], [a, 0], [a, a], [0, a]])], { density: 'coarse' });
    const exact = rectangleJ(a, a);
    const eCoarse = res.convergence.Jcoarse - exact, eFine = res.convergence.Jfine - exact;
    expect(eCoarse).toBeGreaterThan(0);
    expect(eFine).toBeGreaterThan(0);
    const order = Math.log2(eCoarse / eFine);
    expect(order).toBeGreaterThan(3.3);
    expect(order).toBeLessThan(4.7);
    expect(res.convergence.order).toBe(4);
    // The estimate from the two meshes names the remaining error to within a factor of 2.
    const estimated = res.convergence.estimatedError * res.J;
    expect(estimated / eFine).toBeGreaterThan(0.5);
    expect(estimated / eFine).toBeLessThan(2);
  });

  it('circle: the isoparametric boundary converges as h⁴', () => {
    const r = 5;
    const res = computeRegionTorsion([circleContour(0, 0, r)], { density: 'coarse' });
    const exact = (Math.PI * r ** 4) / 2;
    const order = Math.log2(Math.abs(res.convergence.Jcoarse - exact) / Math.abs(res.convergence.Jfine - exact));
    expect(order).toBeGreaterThan(3.5);
    expect(order).toBeLessThan(4.5);
  });

  it('L-section: the re-entrant corner limits the order to 4/3', () => {
    const L: Region = [polygonContour([[0, 0], [20, 0], [20, 10], [10, 10], [10, 30], [0, 30]])];
    const J = nestedJ(L, 4);
    // Monotone from above, as the energy argument requires.
    for (let k = 1; k < J.length; k++) expect(J[k - 1]).toBeGreaterThan(J[k]);
    // On the coarsest meshes the smooth part of the error (h⁴) still shows; the order settles
    // towards 4/3 on the finer ones (measured 1.43, then 1.36).
    const observed = Math.log2((J[1] - J[2]) / (J[2] - J[3]));
    expect(observed).toBeGreaterThan(1.2);
    expect(observed).toBeLessThan(1.5);
    expect(computeRegionTorsion(L, { density: 'coarse' }).convergence.order).toBeCloseTo(4 / 3, 12);
  });
});
