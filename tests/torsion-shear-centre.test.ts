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
import { circleContour, polygonContour, type Region } from '../src/geometry/contour';
import { pathContour } from '../src/document/shapes';
import { profileToPaths } from '../src/document/profiles';
import type { ProfileShape } from '../src/document/types';
import { computeRegionTorsion } from '../src/torsion';

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
