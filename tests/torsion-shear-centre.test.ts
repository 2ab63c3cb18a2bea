/**
 * Shear centre, centre of twist and warping constant by finite elements against thin-walled
 * beam theory, and the exact results of symmetry.
 *
 * Sources: Gere & Goodno, Mechanics of Materials, the section on shear centres of thin-walled
 * open sections (channel: e = 3b²t_f/(6b·t_f + h·t_w), measured from the web centreline; angle:
 * at the intersection of the legs' centrelines); Pilkey, Formulas for Stress, Strain, and
 * Structural Matrices, the table of thin-walled section properties (I-section Cw = I_y·h²/4),
 * the same value as AISC Design Guide 9 (Torsional Analysis of Structural Steel Members), which
 * also gives Cw = (t³/36)(b'³ + d'³) for angles and t_f³b_f³/144 + t_s³d'³/36 for tees (legs to
 * the centreline intersection; the angle and tee formulas from memory). Thin-wall theory is
 * approached as the walls get thinner, so the sections here are thin (t/b ≈ 1/25 to 1/50).
 */
import { describe, expect, it } from 'vitest';
import { circleContour, contourFrom, polygonContour, type Region } from '../src/geometry/contour';
import { pathContour } from '../src';
import { profileToPaths } from '../src';
import type { ProfileShape } from '../src/document/types';
import { computeRegionTorsion } from '../src/torsion';
import { meshSection } from '../src/torsion/mesh-section';
import { Multigrid } from '../src/torsion/multigrid';
import { reverseCuthillMcKee } from '../src/torsion/ordering';
import { ElementGeometry, NQ, QN } from '../src/torsion/p2-element';
import { conjugateGradients } from '../src/torsion/pcg';
import { linearEmbedding, quadraticMesh, renumberNodes, splitUniformly } from '../src/torsion/quad-mesh';
import { centres } from '../src/torsion/shear-centre';
import { elementPattern } from '../src/torsion/sparse';
import { assembleWarping, meshSectionProperties, solveWarping } from '../src/torsion/warping';

function profileRegion(shape: ProfileShape): Region {
  const { outer, holes } = profileToPaths(shape);
  return [pathContour(outer.start, outer.segments), ...holes.map((h) => pathContour(h.start, h.segments))];
}

describe('thin-walled open sections', () => {
  it('channel: shear centre e = 3b²t_f/(6b·t_f + h·t_w) from the web centreline, within 3 %', () => {
    // Gere & Goodno, shear centre of a channel section.
    const d = 100, bf = 50, t = 2;
    const res = computeRegionTorsion(profileRegion({ id: 'c', type: 'channel', at: [0, 0], depth: d, flangeWidth: bf, flangeThickness: t, webThickness: t, rootRadius: 0 }));
    const b = bf - t / 2, h = d - t;
    const e = (3 * b * b * t) / (6 * b * t + h * t);
    // The web's outer face is at x = 0 and the flanges point to +x: the shear centre lies on the
    // other side of the web, at x = t/2 − e.
    const eFE = t / 2 - res.shearCentre.x;
    expect(Math.abs(eFE / e - 1)).toBeLessThan(0.03);
    // Symmetry about the horizontal axis: on the axis to round-off.
    expect(Math.abs(res.shearCentre.y - d / 2)).toBeLessThan(1e-12 * d);
  });

  it('I-section: Cw = I_y·h²/4 within 2 %', () => {
    // Pilkey, thin-walled sections table; AISC Design Guide 9 (doubly symmetric I).
    const d = 200, bf = 100, t = 3;
    const res = computeRegionTorsion(profileRegion({ id: 'i', type: 'i-beam', at: [0, 0], depth: d, flangeWidth: bf, flangeThickness: t, webThickness: t, rootRadius: 0 }));
    const h = d - t;
    const Iy = (2 * t * bf ** 3) / 12 + ((d - 2 * t) * t ** 3) / 12;
    expect(Math.abs(res.Cw / ((Iy * h * h) / 4) - 1)).toBeLessThan(0.02);
  });

  it('angle: shear centre at the legs’ centreline intersection, Cw = (t³/36)(b′³ + d′³)', () => {
    // Gere & Goodno (angle section shear centre); AISC Design Guide 9 (angle Cw, from memory).
    const t = 2, dv = 100, bh = 60;
    const res = computeRegionTorsion(profileRegion({ id: 'a', type: 'angle', at: [0, 0], legVertical: dv, legHorizontal: bh, thickness: t, rootRadius: 0 }));
    // Thin-wall theory places it at (t/2, t/2); the finite wall moves it by a fraction of t.
    expect(Math.hypot(res.shearCentre.x - t / 2, res.shearCentre.y - t / 2)).toBeLessThan(0.1 * t);
    const cw = (t ** 3 / 36) * ((dv - t / 2) ** 3 + (bh - t / 2) ** 3);
    expect(Math.abs(res.Cw / cw - 1)).toBeLessThan(0.02);
  });

  it('tee: shear centre at the flange centreline on the axis, Cw within 2 %', () => {
    // Gere & Goodno (a section of two intersecting walls shears through the intersection);
    // AISC Design Guide 9 (tee Cw, from memory).
    const d = 100, bf = 80, t = 4;
    const res = computeRegionTorsion(profileRegion({ id: 'tee', type: 'tee', at: [0, 0], depth: d, flangeWidth: bf, flangeThickness: t, stemThickness: t, rootRadius: 0 }));
    expect(Math.abs(res.shearCentre.x - bf / 2)).toBeLessThan(1e-12 * d);
    expect(Math.abs(res.shearCentre.y - (d - t / 2))).toBeLessThan(0.1 * t);
    const cw = (t ** 3 * bf ** 3) / 144 + (t ** 3 * (d - t / 2) ** 3) / 36;
    expect(Math.abs(res.Cw / cw - 1)).toBeLessThan(0.02);
  });
});

describe('symmetry (exact, no source needed)', () => {
  const cases: [string, Region][] = [
    ['rectangle', [polygonContour([[10, 20], [70, 20], [70, 45], [10, 45]])]],
    ['I-section with root radii', profileRegion({ id: 'i', type: 'i-beam', at: [-50, 300], depth: 200, flangeWidth: 100, flangeThickness: 8.5, webThickness: 5.6, rootRadius: 12 })],
    ['rectangular tube with corner radii', profileRegion({ id: 'r', type: 'rect-tube', at: [1000, -2000], width: 120, height: 80, wall: 6, outerRadius: 12 })],
    ['circle far from the origin', [circleContour(5e5, -3e5, 25)]],
  ];
  for (const [name, region] of cases) {
    it(`${name}: shear centre and centre of twist at the centroid to round-off`, () => {
      const res = computeRegionTorsion(region);
      const scale = Math.max(1, Math.abs(res.centroid.x), Math.abs(res.centroid.y));
      for (const p of [res.shearCentre, res.centreOfTwist]) {
        expect(Math.abs(p.x - res.centroid.x)).toBeLessThan(1e-12 * scale);
        expect(Math.abs(p.y - res.centroid.y)).toBeLessThan(1e-12 * scale);
      }
    });
  }

  it("an unsymmetric section's shear centre moves with the section, and Poisson's ratio moves it only a little", () => {
    // Translation invariance (exact), and the elastic shear centre against the centre of twist
    // (they coincide for ν = 0 by construction; for ν = 0.3 they differ by a small fraction).
    const shape: ProfileShape = { id: 'a', type: 'angle', at: [0, 0], legVertical: 80, legHorizontal: 50, thickness: 6, rootRadius: 6 };
    const a = computeRegionTorsion(profileRegion(shape));
    const b = computeRegionTorsion(profileRegion({ ...shape, at: [1234.5, -678.25] }));
    expect(Math.abs(b.shearCentre.x - 1234.5 - a.shearCentre.x)).toBeLessThan(1e-6 * 80);
    expect(Math.abs(b.shearCentre.y + 678.25 - a.shearCentre.y)).toBeLessThan(1e-6 * 80);
    const zero = computeRegionTorsion(profileRegion(shape), { poisson: 0 });
    expect(Math.hypot(zero.shearCentre.x - zero.centreOfTwist.x, zero.shearCentre.y - zero.centreOfTwist.y)).toBeLessThan(1e-9 * 80);
    const shift = Math.hypot(a.shearCentre.x - a.centreOfTwist.x, a.shearCentre.y - a.centreOfTwist.y);
    expect(shift).toBeGreaterThan(0);
    expect(shift).toBeLessThan(0.01 * 80);
  });
});

describe('the elastic shear centre', () => {
  it('semicircle at ν = 0: e = 8a/(5π) from the centre of the circle', () => {
    // Timoshenko & Goodier, Theory of Elasticity, the shear centre of a semicircular section,
    // e = (8/15π)·(3 + 4ν)/(1 + ν)·a (from memory), at ν = 0. At other ν this engine's definition
    // (zero mean rotation of the section) moves it less than that formula; see shear-centre.ts.
    const a = 10;
    const res = computeRegionTorsion([contourFrom([0, -a, 0, a], [1, 0])], { poisson: 0 });
    expect(Math.abs(res.shearCentre.x / ((8 * a) / (5 * Math.PI)) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(res.shearCentre.y)).toBeLessThan(1e-12 * a);
  });

  it('equals the moment of the stresses of an explicitly solved flexure problem (reciprocity, exact)', () => {
    // Betti's reciprocal theorem lets shear-centre.ts take the flexure moments from the torsion
    // solution alone. Here the flexure function for a shear force Vy is solved on the same mesh
    // (∫G∇χ·∇v = ν∫G d·∇v + ∫E(αx + βy) v, with (α, β) giving a unit Vx or Vy) and the moment
    // of τ = G(∇χ − ν d) about the centroid is taken directly: T = xs·Vy − ys·Vx. The two agree
    // to round-off, for any ν.
    const run = <T>(g: Generator<unknown, T>): T => {
      for (;;) {
        const r = g.next();
        if (r.done) return r.value;
      }
    };
    const region: Region = profileRegion({ id: 'a', type: 'angle', at: [3, -2], legVertical: 40, legHorizontal: 25, thickness: 5, rootRadius: 4 });
    let q = splitUniformly(quadraticMesh(run(meshSection([region], 'coarse')).mesh)).mesh;
    const ord = reverseCuthillMcKee(elementPattern(q.x.length, q.elem, 6));
    q = renumberNodes(q, ord.order).mesh;
    const g = Float64Array.of(1);
    const sol = run(solveWarping(q, g, ord.part, ord.parts, { tol: 1e-12, start: null, mirrors: [] }));
    for (const [nu, load01] of [
      [0, 1],
      [0.3, 1],
      [0.3, 0],
    ] as const) {
      const c = centres(q, g, ord.part, ord.parts, sol, nu);
      const s = meshSectionProperties(q, g, ord.part, ord.parts);
      const E = 2 * (1 + nu);
      const emb = linearEmbedding(q);
      const { K, K1 } = assembleWarping(q, g, s.cx, s.cy, emb.vertexId, emb.vertexCount);
      // (Vx, Vy) = (1 − load01, load01): (α, β) = M⁻¹(Vx, Vy), M = E[[Iyy, Ixy], [Ixy, Ixx]].
      const D = E * E * (s.Ixx * s.Iyy - s.Ixy * s.Ixy);
      const Vx = 1 - load01, Vy = load01;
      const alpha = (E * s.Ixx * Vx - E * s.Ixy * Vy) / D, beta = (-E * s.Ixy * Vx + E * s.Iyy * Vy) / D;
      const n = q.x.length;
      const load = new Float64Array(n);
      const G = new ElementGeometry();
      const ne = q.elem.length / 6;
      for (let e = 0; e < ne; e++) {
        G.load(q.x, q.y, q.elem, e, s.cx, s.cy);
        for (let k = 0; k < NQ; k++) {
          const x = G.px[k], y = G.py[k], w = G.w[k];
          const dx = alpha * (x * x - y * y) / 2 + beta * x * y, dy = alpha * x * y + beta * (y * y - x * x) / 2;
          for (let a = 0; a < 6; a++) load[q.elem[6 * e + a]] += w * (nu * (dx * G.gx[6 * k + a] + dy * G.gy[6 * k + a]) + E * (alpha * x + beta * y) * QN[6 * k + a]);
        }
      }
      // Hold one vertex at zero (the flexure function is also free by a constant).
      let held = 0;
      while (emb.vertexId[held] < 0) held++;
      const hv = emb.vertexId[held];
      for (const [A, h] of [
        [K, held],
        [K1, hv],
      ] as const)
        for (let i = 0; i < A.n; i++) for (let k = A.rowPtr[i]; k < A.rowPtr[i + 1]; k++) if ((i === h || A.col[k] === h) && A.col[k] !== i) A.val[k] = 0;
      load[held] = 0;
      const chi = new Float64Array(n);
      run(conjugateGradients(K, load, chi, new Multigrid(K, { P: emb.P, coarse: K1 }), 1e-13, 10_000));
      let T = 0;
      for (let e = 0; e < ne; e++) {
        G.load(q.x, q.y, q.elem, e, s.cx, s.cy);
        for (let k = 0; k < NQ; k++) {
          const x = G.px[k], y = G.py[k];
          let cx = 0, cy = 0;
          for (let a = 0; a < 6; a++) {
            cx += G.gx[6 * k + a] * chi[q.elem[6 * e + a]];
            cy += G.gy[6 * k + a] * chi[q.elem[6 * e + a]];
          }
          const tx = cx - nu * (alpha * (x * x - y * y) / 2 + beta * x * y), ty = cy - nu * (alpha * x * y + beta * (y * y - x * x) / 2);
          T += G.w[k] * (x * ty - y * tx);
        }
      }
      // The moment about the centroid is T = xs·Vy − ys·Vx (coordinates from the centroid).
      if (Vy === 1) expect(Math.abs(s.cx + T - c.shearX)).toBeLessThan(1e-9 * 40);
      else expect(Math.abs(s.cy - T - c.shearY)).toBeLessThan(1e-9 * 40);
    }
  });
});
