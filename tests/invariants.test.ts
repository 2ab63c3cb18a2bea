/**
 * Exact identities of area moments, checked on random sections with fast-check
 * (REFERENCES.md, "Exact identities that need no source"): invariance to translation, rotation,
 * winding and start vertex; the parallel-axis theorem; I1 + I2 = Ix + Iy and the invariance of
 * Ix·Iy − Ixy² under rotation (Gere & Goodno, Sec. 12.8, Mohr's circle for area moments).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { contourFrom, pushArc, reverseContour, rotateRegion, translateRegion, type Contour, type Region } from '../src/geometry/contour';
import { regionMoments } from '../src/moments/kernel';
import { inertiaAboutAxis, sectionProperties } from '../src/properties/section';
import { momentsAbove } from '../src/moments/cut';

/**
 * A simple star-shaped loop around (cx, cy): 5 to 12 vertices at equal angles with radii within a
 * factor 2, some edges bent into arcs with |bulge| ≤ 0.2 (sweep ≤ 45°). With those bounds every
 * corner is wider than the two arcs' turn and no arc reaches the centre, so the loop never crosses
 * itself and every identity below is checked on a valid section.
 */
const starArb = fc
  .record({
    cx: fc.double({ min: -50, max: 50, noNaN: true }),
    cy: fc.double({ min: -50, max: 50, noNaN: true }),
    radii: fc.array(fc.double({ min: 5, max: 10, noNaN: true }), { minLength: 5, maxLength: 12 }),
    bulges: fc.array(fc.double({ min: -0.2, max: 0.2, noNaN: true }), { minLength: 12, maxLength: 12 }),
    arcMask: fc.array(fc.boolean(), { minLength: 12, maxLength: 12 }),
  })
  .map(({ cx, cy, radii, bulges, arcMask }) => {
    const n = radii.length;
    const xy: number[] = [];
    const bulge: number[] = [];
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * i) / n;
      xy.push(cx + radii[i] * Math.cos(t), cy + radii[i] * Math.sin(t));
      bulge.push(arcMask[i] ? bulges[i] : 0);
    }
    return contourFrom(xy, bulge);
  });

function rel(a: number, b: number, scale: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), scale);
}

function expectSameProps(a: Region, b: Region, tol = 1e-10): void {
  const p = sectionProperties(a), q = sectionProperties(b);
  const L = Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
  expect(rel(p.area, q.area, L * L)).toBeLessThan(tol);
  for (const k of ['Ix', 'Iy', 'Ixy', 'I1', 'I2'] as const) expect(rel(p[k], q[k], p.J0)).toBeLessThan(tol);
}

function rotateStart(c: Contour, k: number): Contour {
  const n = c.xy.length >> 1;
  const xy = new Float64Array(2 * n), b = c.bulge ? new Float64Array(n) : null;
  for (let i = 0; i < n; i++) {
    const j = (i + k) % n;
    xy[2 * i] = c.xy[2 * j];
    xy[2 * i + 1] = c.xy[2 * j + 1];
    if (b && c.bulge) b[i] = c.bulge[j];
  }
  return { xy, bulge: b };
}

describe('invariants of the moment engine', () => {
  it('translation moves the centroid and keeps centroidal moments', () => {
    fc.assert(
      fc.property(starArb, fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), (c, dx, dy) => {
        const p = sectionProperties([c]);
        const q = sectionProperties(translateRegion([c], dx, dy));
        expect(Math.abs(q.centroid.x - p.centroid.x - dx)).toBeLessThan(1e-9 * (1 + Math.abs(dx)));
        expect(Math.abs(q.centroid.y - p.centroid.y - dy)).toBeLessThan(1e-9 * (1 + Math.abs(dy)));
        expectSameProps([c], translateRegion([c], dx, dy), 1e-9);
      }),
    );
  });

  it('rotation keeps I1, I2, J0 and Ix·Iy − Ixy², and turns θ with it', () => {
    fc.assert(
      fc.property(starArb, fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), (c, beta) => {
        const p = sectionProperties([c]);
        const q = sectionProperties(rotateRegion([c], beta, 3, -7));
        expect(rel(q.I1, p.I1, p.J0)).toBeLessThan(1e-10);
        expect(rel(q.I2, p.I2, p.J0)).toBeLessThan(1e-10);
        expect(rel(q.J0, p.J0, p.J0)).toBeLessThan(1e-10);
        expect(rel(q.Ix * q.Iy - q.Ixy ** 2, p.Ix * p.Iy - p.Ixy ** 2, p.J0 ** 2)).toBeLessThan(1e-9);
        expect(rel(q.I1 + q.I2, q.Ix + q.Iy, q.J0)).toBeLessThan(1e-12);
        // θ turns by β (mod 180°) unless the section is nearly isotropic.
        if (p.I1 - p.I2 > 1e-3 * p.J0) {
          let d = q.theta - p.theta - (beta * 180) / Math.PI;
          d = ((d % 180) + 180 + 90) % 180 - 90;
          expect(Math.abs(d)).toBeLessThan(1e-5);
        }
      }),
    );
  });

  it('reversing the winding negates every moment; the start vertex does not matter', () => {
    fc.assert(
      fc.property(starArb, fc.nat(20), (c, k) => {
        const m = regionMoments([c]);
        const r = regionMoments([reverseContour(c)]);
        const s = regionMoments([rotateStart(c, k % (c.xy.length >> 1))]);
        const scale = Math.abs(m.m20) + Math.abs(m.m02);
        for (const key of ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'] as const) {
          const sc = key === 'm00' ? Math.abs(m.m00) : key.startsWith('m1') || key === 'm01' ? Math.sqrt(scale * Math.abs(m.m00)) : scale;
          expect(Math.abs(r[key] + m[key])).toBeLessThanOrEqual(1e-11 * sc);
          expect(Math.abs(s[key] - m[key])).toBeLessThanOrEqual(1e-11 * sc);
        }
      }),
    );
  });

  it('parallel-axis theorem: I about any axis = I about the parallel centroidal axis + A d²', () => {
    // Gere & Goodno, Sec. 12.5. The reference value comes from rotating the region itself so the
    // axis becomes the x axis and integrating y² directly.
    fc.assert(
      fc.property(starArb, fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), (c, px, py, ang) => {
        const p = sectionProperties([c]);
        const turned = rotateRegion(translateRegion([c], -px, -py), -ang);
        const direct = regionMoments(turned).m02;
        expect(rel(inertiaAboutAxis(p, px, py, ang), direct, direct)).toBeLessThan(1e-10);
      }),
    );
  });

  it('a cut splits the section: part above + part below = whole', () => {
    fc.assert(
      fc.property(starArb, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (c, f) => {
        const p = sectionProperties([c]);
        const y = p.bounds.ymin + f * (p.bounds.ymax - p.bounds.ymin);
        const up = momentsAbove([c], y);
        // Below y is above −y after a half turn.
        const down = momentsAbove(rotateRegion([c], Math.PI), -y);
        const m = regionMoments([c]);
        expect(rel(up.m00 + down.m00, m.m00, m.m00)).toBeLessThan(1e-11);
        // The half turn negates x and y: ∫y over the lower part is −(its ∫y').
        expect(rel(up.m01 - down.m01, m.m01, Math.abs(m.m00) * 60)).toBeLessThan(1e-11);
        expect(rel(up.m02 + down.m02, m.m02, m.m02)).toBeLessThan(1e-11);
        expect(rel(up.m11 + down.m11, m.m11, m.m02 + m.m20)).toBeLessThan(1e-11);
        expect(rel(up.width, down.width, up.width)).toBeLessThan(1e-9);
      }),
    );
  });

  it('flat, denormal and tiny arcs give finite, consistent results', () => {
    // Robustness (no source needed): an arc of any flatness is still an exact arc. Cutting the
    // section must keep up + down = whole, and nothing may be NaN.
    const flatBulge = fc.oneof(fc.constant(5e-324), fc.double({ min: 1e-300, max: 1e-2, noNaN: true }).map((v) => Math.exp(Math.log(1e-14) * (1 - Math.log10(v) / -300))), fc.double({ min: -1e-3, max: 1e-3, noNaN: true }));
    fc.assert(
      fc.property(fc.array(flatBulge, { minLength: 4, maxLength: 4 }), fc.double({ min: 0.02, max: 0.98, noNaN: true }), (bs, f) => {
        const c = contourFrom([0, 0, 10, 0, 10, 4, 0, 4], bs);
        const p = sectionProperties([c]);
        for (const v of [p.area, p.Ix, p.Iy, p.Ixy, p.Zx, p.Zy, p.perimeter, p.theta]) expect(Number.isFinite(v)).toBe(true);
        const y = p.bounds.ymin + f * (p.bounds.ymax - p.bounds.ymin);
        const up = momentsAbove([c], y), down = momentsAbove(rotateRegion([c], Math.PI), -y);
        expect(rel(up.m00 + down.m00, p.area, p.area)).toBeLessThan(1e-11);
        expect(rel(up.m02 + down.m02, regionMoments([c]).m02, regionMoments([c]).m02)).toBeLessThan(1e-11);
      }),
    );
  });

  it('arcs converge to dense chords at the rate 1/N² (convergence check, not a reference)', () => {
    // REFERENCES.md, "Independent computation": polygonising an arc with N chords converges to the
    // exact arc with error ∝ 1/N².
    const xy = [2, 0];
    const bulge: number[] = [];
    pushArc(xy, bulge, 2, 0, -2, 0, Math.PI);
    xy.push(-2, 0);
    bulge.push(0);
    const exact = sectionProperties([contourFrom(xy, bulge)]).Ix;
    const errs = [64, 128, 256].map((N) => {
      const pts: number[] = [];
      for (let k = 0; k <= N; k++) pts.push(2 * Math.cos((Math.PI * k) / N), 2 * Math.sin((Math.PI * k) / N));
      return Math.abs(sectionProperties([contourFrom(pts)]).Ix - exact);
    });
    expect(errs[0] / errs[1]).toBeGreaterThan(3.9);
    expect(errs[0] / errs[1]).toBeLessThan(4.1);
    expect(errs[1] / errs[2]).toBeGreaterThan(3.9);
  });
});
