/**
 * Robustness of the torsion engine: touching loops, slivers, tiny holes, parts far from the
 * origin, random outlines, bad input, cancellation, progress, and the shape of the result.
 *
 * Checks of values name their source: the rectangle series of Timoshenko & Goodier, Theory of
 * Elasticity, §109; thin-wall torsion J ≈ ∫ t³/3 ds (Roark's Formulas, Table 10.1, thin-walled
 * open sections; for a thin triangle of height L and base t this is L t³/12); and Saint-Venant's
 * inequality J ≤ A²/(2π), the circle being the stiffest section of a given area (Pólya & Szegő,
 * Isoperimetric Inequalities in Mathematical Physics, 1951, from memory). J ≤ Ip holds by
 * construction (J = Ip − ∫|∇ω|² dA) and needs no source.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { circleContour, contourFrom, polygonContour, reverseContour, type Region } from '../src/geometry/contour';
import { sectionProperties } from '../src/properties/section';
import {
  computeRegionTorsion,
  computeTorsion,
  computeTorsionAsync,
  isTorsionCancelled,
  TorsionCancelled,
  TorsionError,
  type TorsionStage,
} from '../src/torsion';

const square = (x: number, y: number, a: number) =>
  polygonContour([
    [x, y],
    [x + a, y],
    [x + a, y + a],
    [x, y + a],
  ]);
/** Timoshenko & Goodier §109: J of the square of side a is 0.140577·a⁴ (series). */
function squareJ(a: number): number {
  let s = 0;
  for (let n = 1; n < 400; n += 2) s += Math.tanh((n * Math.PI) / 2) / n ** 5;
  return (a ** 4 / 3) * (1 - (192 / Math.PI ** 5) * s);
}

describe('awkward geometry', () => {
  it('two squares touching at a corner twist as two squares', () => {
    // Series for each square; a point contact carries no torque.
    const res = computeRegionTorsion([square(0, 0, 10), square(10, 10, 10)]);
    expect(Math.abs(res.J / (2 * squareJ(10)) - 1)).toBeLessThan(0.005);
  });

  it('a hole lying along the outline cancels it there, as signed moments do', () => {
    // Exact identity: the square less a corner square equals the L-shaped outline drawn directly.
    const L = computeRegionTorsion([polygonContour([[0, 0], [10, 0], [10, 6], [6, 6], [6, 10], [0, 10]])]);
    const cut = computeRegionTorsion([square(0, 0, 10), reverseContour(square(6, 6, 4))]);
    expect(Math.abs(cut.J / L.J - 1)).toBeLessThan(1e-4);
  });

  it('a 100 : 1 sliver triangle: thin-wall J = L t³/12 within 2 %', () => {
    // Roark, thin-walled open sections (∫ t³/3 ds).
    const L = 100;
    const res = computeRegionTorsion([polygonContour([[0, -0.5], [L, 0], [0, 0.5]])]);
    expect(Math.abs(res.J / (L / 12) - 1)).toBeLessThan(0.02);
    expect(res.mesh.nodes).toBeLessThan(60_000);
  });

  it('a hole of radius 1e-4 of the section changes J by almost nothing', () => {
    const res = computeRegionTorsion([square(0, 0, 100), reverseContour(circleContour(37, 52, 0.01))]);
    expect(Math.abs(res.J / squareJ(100) - 1)).toBeLessThan(1e-4);
  });

  it('a hole touching the outline from inside (a cusp) still gives a result', () => {
    const res = computeRegionTorsion([circleContour(0, 0, 10), reverseContour(circleContour(9.9, 0, 0.1))]);
    // Between the full disc and the disc less the hole's polar moment about the centre.
    expect(res.J).toBeLessThan((Math.PI * 1e4) / 2);
    expect(res.J).toBeGreaterThan(0.99 * ((Math.PI * 1e4) / 2));
  });

  it('a section 1e8 away from the origin gives the same J and a shear centre in place', () => {
    const near = computeRegionTorsion([square(0, 0, 10)]);
    const far = computeRegionTorsion([square(1e8, -1e8, 10)]);
    expect(Math.abs(far.J / near.J - 1)).toBeLessThan(1e-6);
    expect(Math.abs(far.shearCentre.x - (1e8 + 5))).toBeLessThan(1e-6);
    expect(Math.abs(far.shearCentre.y - (-1e8 + 5))).toBeLessThan(1e-6);
  });

  it('random star-shaped outlines: finite results, J ≤ Ip and J ≤ A²/(2π)', () => {
    // J ≤ Ip by construction; Saint-Venant's inequality (Pólya & Szegő).
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.3, max: 1, noNaN: true }), { minLength: 5, maxLength: 14 }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), (radii, shift) => {
        const n = radii.length;
        const xy: number[] = [];
        radii.forEach((r, k) => xy.push(shift + 50 * r * Math.cos((2 * Math.PI * k) / n), 50 * r * Math.sin((2 * Math.PI * k) / n)));
        const region: Region = [contourFrom(xy)];
        const res = computeRegionTorsion(region, { density: 'coarse' });
        const p = sectionProperties(region);
        for (const v of [res.J, res.Cw, res.shearCentre.x, res.shearCentre.y, res.stress.max]) expect(Number.isFinite(v)).toBe(true);
        expect(res.J).toBeGreaterThan(0);
        expect(res.J).toBeLessThanOrEqual(p.J0 * (1 + 1e-9));
        expect(res.J).toBeLessThanOrEqual(((p.area * p.area) / (2 * Math.PI)) * (1 + 1e-6));
      }),
      { numRuns: 6, seed: 14 },
    );
  });
});

describe('bad input is refused with a clear message', () => {
  const cases: [string, () => unknown, RegExp][] = [
    ['no pieces', () => computeTorsion([]), /no pieces/],
    ['an empty region', () => computeRegionTorsion([]), /empty|no area/],
    ['a shear modulus of zero', () => computeTorsion([{ region: [square(0, 0, 1)], G: 0 }]), /G must be a positive/],
    ['a coordinate that is not a number', () => computeRegionTorsion([polygonContour([[0, 0], [1, NaN], [0, 1]])]), /not a finite number/],
    ['an outer loop that runs clockwise', () => computeRegionTorsion([reverseContour(square(0, 0, 1))]), /no area|wrong way/],
    ["Poisson's ratio of 0.5", () => computeRegionTorsion([square(0, 0, 1)], { poisson: 0.5 }), /Poisson/],
    ['an outline that crosses itself', () => computeRegionTorsion([polygonContour([[0, 0], [2, 2], [2, 0], [0, 2]])]), /cross|no area|wrong way|overlap/],
  ];
  for (const [name, run, message] of cases)
    it(name, () => {
      expect(run).toThrow(TorsionError);
      expect(run).toThrow(message);
    });
});

describe('progress, cancellation and the result record', () => {
  it('reports progress from 0 to 1, stage by stage, never going back', () => {
    const seen: [number, TorsionStage][] = [];
    computeRegionTorsion([square(0, 0, 10)], { onProgress: (f, s) => seen.push([f, s]) });
    expect(seen.length).toBeGreaterThan(5);
    for (let k = 1; k < seen.length; k++) expect(seen[k][0]).toBeGreaterThanOrEqual(seen[k - 1][0]);
    expect(seen[seen.length - 1][0]).toBe(1);
    const order: TorsionStage[] = ['mesh', 'solve-coarse', 'refine', 'solve-fine', 'results'];
    const stages = seen.map(([, s]) => order.indexOf(s));
    for (let k = 1; k < stages.length; k++) expect(stages[k]).toBeGreaterThanOrEqual(stages[k - 1]);
  });

  it('stops with TorsionCancelled when asked to', () => {
    let calls = 0;
    const run = () => computeRegionTorsion([square(0, 0, 10)], { shouldCancel: () => ++calls > 3 });
    expect(run).toThrow(TorsionCancelled);
    try {
      run();
    } catch (e) {
      expect(isTorsionCancelled(e)).toBe(true);
      expect(e instanceof TorsionError).toBe(false);
    }
    expect(isTorsionCancelled({ name: 'TorsionCancelled', message: 'from a worker' })).toBe(true);
  });

  it('the asynchronous run gives the same result and can be cancelled', async () => {
    const region: Region = [square(0, 0, 10), reverseContour(circleContour(5, 5, 2))];
    const sync = computeRegionTorsion(region);
    const res = await computeTorsionAsync([{ region, G: 1 }]);
    expect(res.J).toBe(sync.J);
    expect(res.Cw).toBe(sync.Cw);
    let cancel = false;
    const pending = computeTorsionAsync([{ region, G: 1 }], { shouldCancel: () => cancel, onProgress: (f) => (cancel = f > 0.2) });
    await expect(pending).rejects.toThrow(TorsionCancelled);
  });

  it('density: finer settings use more elements and all meet the series within 0.5 %', () => {
    const region: Region = [square(0, 0, 10)];
    const runs = (['coarse', 'normal', 'fine'] as const).map((density) => computeRegionTorsion(region, { density }));
    expect(runs[0].mesh.elements).toBeLessThan(runs[1].mesh.elements);
    expect(runs[1].mesh.elements).toBeLessThan(runs[2].mesh.elements);
    for (const r of runs) expect(Math.abs(r.J / squareJ(10) - 1)).toBeLessThan(0.005);
  });

  it('the stress map is a consistent triangle mesh in the section’s coordinates', () => {
    const res = computeRegionTorsion([square(100, 200, 10), reverseContour(circleContour(105, 205, 2))]);
    const { xy, triangles, magnitude, max, at } = res.stress;
    const n = res.mesh.nodes;
    expect(xy.length).toBe(2 * n);
    expect(magnitude.length).toBe(n);
    expect(triangles.length % 3).toBe(0);
    expect(triangles.length / 3).toBe(4 * res.mesh.elements);
    for (const v of triangles) expect(v).toBeLessThan(n);
    let big = 0;
    for (let i = 0; i < n; i++) {
      expect(xy[2 * i]).toBeGreaterThanOrEqual(100 - 1e-9);
      expect(xy[2 * i]).toBeLessThanOrEqual(110 + 1e-9);
      expect(Number.isFinite(magnitude[i])).toBe(true);
      big = Math.max(big, magnitude[i]);
    }
    expect(big).toBe(max);
    expect(at.x).toBeGreaterThanOrEqual(100 - 1e-9);
    expect(res.mesh.minSide).toBeGreaterThan(0);
    expect(res.mesh.maxSide).toBeGreaterThanOrEqual(res.mesh.minSide);
  });
});
