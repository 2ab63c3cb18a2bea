/**
 * Thin walls from a centreline ("strip"): the exact outline against closed forms, the thin-wall
 * approximation against its published counterpart, and the refusals.
 *
 * Sources:
 * - Young & Budynas, Roark's Formulas for Stress and Strain (7th ed.), Table A.1: hollow circle
 *   A = π(Ro² − Ri²), I = π(Ro⁴ − Ri⁴)/4; thin-walled circular tube I = πR³t; hollow rectangle
 *   A = BH − bh, I = (BH³ − bh³)/12.
 * - Gere & Goodno, Mechanics of Materials, appendix "Properties of plane areas": rectangle (case 1),
 *   semicircle (case 9: centroid 4r/3π from the diameter), quarter circle (case 10: centroid 4r/3π
 *   from each edge, I about an edge πr⁴/16, Ixy about the edges r⁴/8). Case numbers from memory.
 * - Hibbeler, Statics, composite areas (Sect. 9.3 and 10.4): sums of parts with the parallel-axis
 *   theorem.
 * Decision recorded here: a strip whose centreline ends on its start is closed (no ends): it gives
 * an outer loop and a hole, so a thin ring is two semicircular centreline arcs and a rectangular
 * tube is a closed rectangle. An open centreline gives square ends.
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { booleanRegions, resolveOutline } from '../src/boolean';
import { shapeContours } from '../src';
import { arcFromChord, contourFrom, pushArc, reverseContour, type Contour, type Region } from '../src/geometry/contour';
import { chainFrom, chainFromPath, chainSegment, LineError, segmentCount, type LineChain } from '../src/lines/chain';
import { alongFace, facesMeet } from '../src/geometry/offset-faces';
import { stripOutline, type StripCorners } from '../src/lines/strip-outline';
import { thinWallComparison } from '../src/lines/thin-wall';
import { regionMoments, regionMomentsAbout } from '../src/moments/kernel';
import { centroidalFromRaw, sectionProperties } from '../src/properties/section';
import { close, worst } from './helpers';

const PI = Math.PI;

/** A, centroid, Ix, Iy, Ixy of a region, taken about a nearby point. */
function areaValues(region: Region, ox = 0, oy = 0) {
  const c = centroidalFromRaw(regionMomentsAbout(region, ox, oy));
  return { A: c.A, x: ox + c.xc, y: oy + c.yc, Ix: c.Ix, Iy: c.Iy, Ixy: c.Ixy };
}

const ringCentreline = (R: number): LineChain =>
  chainFromPath([R, 0], [
    { to: [-R, 0], via: [0, R] },
    { to: [R, 0], via: [0, -R] },
  ]);

describe('closed centrelines: thin ring and rectangular tubes', () => {
  it('thin ring from two semicircular arcs (Roark Table A.1, hollow circle)', () => {
    for (const [R, t] of [[5, 0.5], [40, 3], [1, 1.9]]) {
      for (const corners of ['mitre', 'round'] as const) {
        const o = stripOutline(ringCentreline(R), t, corners);
        expect(o).toHaveLength(2);
        const v = areaValues(o);
        const Ro = R + t / 2, Ri = R - t / 2;
        close(v.A, PI * (Ro ** 2 - Ri ** 2));
        close(v.Ix, (PI * (Ro ** 4 - Ri ** 4)) / 4);
        close(v.Iy, (PI * (Ro ** 4 - Ri ** 4)) / 4);
        close(v.x, 0, 1e-12, R);
        close(v.Ixy, 0, 1e-12, v.Ix);
      }
    }
  });

  it('thin ring: thin-wall approximation against the exact ring (Roark Table A.1)', () => {
    // Thin-walled tube: I ≈ πR³t, A ≈ 2πRt. Exact hollow circle: I = π(Ro⁴ − Ri⁴)/4 = πR³t(1 + t²/4R²),
    // A = 2πRt exactly. So the thin-wall I is low by (t²/4R²)/(1 + t²/4R²).
    const R = 10, t = 2;
    const c = ringCentreline(R);
    const cmp = thinWallComparison(c, t, stripOutline(c, t, 'round'));
    close(cmp.thinWall.Ix, PI * R ** 3 * t);
    close(cmp.exact.Ix, PI * R ** 3 * t * (1 + (t * t) / (4 * R * R)));
    close(cmp.percent.area, 0, 1e-12, 1);
    const q = (t * t) / (4 * R * R);
    close(cmp.percent.Ix, (-100 * q) / (1 + q));
    close(cmp.percent.Iy, (-100 * q) / (1 + q));
    expect(cmp.percent.Ixy).toBeNull();
    close(cmp.difference.centroid, 0, 1e-12, R);
  });

  it('rectangular tube with sharp corners (Roark Table A.1, hollow rectangle)', () => {
    const b = 10, h = 6, t = 0.8;
    for (const dir of [1, -1]) {
      const pts: [number, number][] = dir > 0 ? [[b, 0], [b, h], [0, h], [0, 0]] : [[0, h], [b, h], [b, 0], [0, 0]];
      const c = chainFromPath([0, 0], pts.map((to) => ({ to })));
      const o = stripOutline(c, t, 'mitre');
      const v = areaValues(o);
      const B = b + t, H = h + t, bi = b - t, hi = h - t;
      close(v.A, B * H - bi * hi);
      close(v.Ix, (B * H ** 3 - bi * hi ** 3) / 12);
      close(v.Iy, (H * B ** 3 - hi * bi ** 3) / 12);
      close(v.x, b / 2);
      close(v.y, h / 2);
      // Outer loop CCW, hole CW, whichever way the centreline runs.
      const signs = o.map((k) => Math.sign(regionMomentsAbout([k], 0, 0).m00)).sort();
      expect(signs).toEqual([-1, 1]);
      // Thin-wall values (line properties × t) against the exact hollow rectangle.
      const cmp = thinWallComparison(c, t, o);
      close(cmp.thinWall.Ix, t * (2 * b * (h / 2) ** 2 + (2 * h ** 3) / 12));
      close(cmp.percent.Ix, (100 * (cmp.thinWall.Ix - (B * H ** 3 - bi * hi ** 3) / 12)) / ((B * H ** 3 - bi * hi ** 3) / 12));
    }
  });

  it('rectangular tube with round corners: outside corners of radius t/2', () => {
    // Composite (Hibbeler): the outer rounded rectangle B × H with corner radius ρ = t/2 is a
    // central rectangle B × (H − 2ρ), two strips (B − 2ρ) × ρ, and four quarter circles
    // (Gere & Goodno case 10: centroid 4ρ/3π from each edge, I about an edge πρ⁴/16); the hole
    // keeps sharp corners: (b − t) × (h − t).
    const b = 12, h = 7, t = 1.2;
    const c = chainFromPath([0, 0], [{ to: [b, 0] }, { to: [b, h] }, { to: [0, h] }, { to: [0, 0] }]);
    const v = areaValues(stripOutline(c, t, 'round'), b / 2, h / 2);
    const B = b + t, H = h + t, rho = t / 2, bi = b - t, hi = h - t;
    const q = (4 * rho) / (3 * PI), Aq = (PI * rho * rho) / 4;
    const quarter = (span: number) => PI * rho ** 4 / 16 - Aq * q * q + Aq * (span / 2 - rho + q) ** 2;
    const outerA = B * (H - 2 * rho) + 2 * (B - 2 * rho) * rho + 4 * Aq;
    const outerIx = (B * (H - 2 * rho) ** 3) / 12 + 2 * (((B - 2 * rho) * rho ** 3) / 12 + (B - 2 * rho) * rho * (H / 2 - rho / 2) ** 2) + 4 * quarter(H);
    const outerIy = (H * (B - 2 * rho) ** 3) / 12 + 2 * (((H - 2 * rho) * rho ** 3) / 12 + (H - 2 * rho) * rho * (B / 2 - rho / 2) ** 2) + 4 * quarter(B);
    close(v.A, outerA - bi * hi);
    close(v.Ix, outerIx - (bi * hi ** 3) / 12);
    close(v.Iy, outerIy - (hi * bi ** 3) / 12);
    close(v.x, b / 2);
    close(v.y, h / 2);
  });
});

describe('open centrelines', () => {
  it('semicircular strip with square ends: half of a hollow circle', () => {
    // Gere & Goodno case 9 (semicircle: centroid 4r/3π from the diameter, I about the diameter πr⁴/8),
    // composite of the outer semicircle minus the inner one (Hibbeler).
    const R = 4, t = 1;
    const c = chainFromPath([R, 0], [{ to: [-R, 0], via: [0, R] }]);
    const v = areaValues(stripOutline(c, t, 'round'));
    const Ro = R + t / 2, Ri = R - t / 2;
    const A = (PI * (Ro ** 2 - Ri ** 2)) / 2;
    const ybar = (4 * (Ro ** 3 - Ri ** 3)) / (3 * PI * (Ro ** 2 - Ri ** 2));
    close(v.A, A);
    close(v.y, ybar);
    close(v.Ix, (PI * (Ro ** 4 - Ri ** 4)) / 8 - A * ybar * ybar);
    close(v.Iy, (PI * (Ro ** 4 - Ri ** 4)) / 8);
  });

  it('bent plate: leg, tangent quarter bend, leg (composite closed form)', () => {
    // Parts (Hibbeler composite; Gere & Goodno cases 1 and 10): two rectangles (a − R) × t and a
    // quarter annulus about (R, R) of radii R ± t/2 in the quadrant below-left of its centre:
    //   A = π(Ro² − Ri²)/4, centroid 4(Ro³ − Ri³)/(3π(Ro² − Ri²)) from the centre along −x and −y,
    //   ∫(x − R)² dA = ∫(y − R)² dA = π(Ro⁴ − Ri⁴)/16, ∫(x − R)(y − R) dA = (Ro⁴ − Ri⁴)/8.
    const a = 20, R = 3, t = 1;
    const c = chainFromPath([a, 0], [{ to: [R, 0] }, { to: [0, R], via: [R - R * Math.SQRT1_2, R - R * Math.SQRT1_2] }, { to: [0, a] }]);
    const Ro = R + t / 2, Ri = R - t / 2;
    const A1 = (a - R) * t, A3 = (PI * (Ro ** 2 - Ri ** 2)) / 4;
    const dq = (4 * (Ro ** 3 - Ri ** 3)) / (3 * PI * (Ro ** 2 - Ri ** 2));
    // Raw moments about the origin.
    const m00 = 2 * A1 + A3;
    const m10 = A1 * ((a + R) / 2) + 0 + A3 * (R - dq);
    const m01 = 0 + A1 * ((a + R) / 2) + A3 * (R - dq);
    const Iq = (PI * (Ro ** 4 - Ri ** 4)) / 16, Pq = (Ro ** 4 - Ri ** 4) / 8;
    const m20 = (t * (a - R) ** 3) / 12 + A1 * ((a + R) / 2) ** 2 + ((a - R) * t ** 3) / 12 + (Iq + 2 * R * A3 * -dq + R * R * A3);
    const m11 = 0 + 0 + (Pq + R * A3 * -dq + R * A3 * -dq + R * R * A3);
    for (const corners of ['mitre', 'round'] as const) {
      const o = stripOutline(c, t, corners);
      const m = regionMoments(o);
      close(m.m00, m00);
      close(m.m10, m10);
      close(m.m01, m01);
      close(m.m20, m20);
      close(m.m02, m20);
      close(m.m11, m11);
    }
    // The same plate as the bent-plate profile (itself checked in tests/profiles.test.ts), whose
    // outside faces meet at its local origin, placed at (−t/2, −t/2).
    const plate = shapeContours({ id: 'p', type: 'bent-plate', at: [-t / 2, -t / 2], legHorizontal: a + t / 2, legVertical: a + t / 2, thickness: t, insideRadius: R - t / 2 });
    const p = sectionProperties(plate), s = sectionProperties(stripOutline(c, t, 'round'));
    for (const k of ['area', 'Ix', 'Iy', 'Ixy', 'Zx', 'Zy'] as const) close(s[k], p[k], 1e-12);
  });

  it('mitred corners of a polyline keep the area t·L exactly', () => {
    // Exact identity, derived here: at a mitred line–line corner each face is cut or extended by
    // (t/2)·tan(δ/2), the inner face shorter and the outer face longer by the same amount, so every
    // leg is a trapezoid of mean length equal to its centreline length.
    fc.assert(
      fc.property(polylineArb, fc.double({ min: 0.01, max: 0.5, noNaN: true }), (pts, t) => {
        const c = chainFromPath(pts[0], pts.slice(1).map((to) => ({ to })));
        let o: Region;
        try {
          o = stripOutline(c, t, 'mitre');
        } catch (e) {
          expect(e).toBeInstanceOf(LineError);
          return;
        }
        let L = 0;
        for (let i = 1; i < pts.length; i++) L += Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
        close(areaValues(o, pts[0][0], pts[0][1]).A, t * L, 1e-9);
      }),
      { numRuns: 200 },
    );
  });
});

/** Random polylines: 3 to 6 points in a 20 × 20 box, consecutive points at least 1 apart. */
const polylineArb = fc
  .array(fc.tuple(fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true })), { minLength: 3, maxLength: 6 })
  .map((pts) => pts.filter((p, i) => i === 0 || Math.hypot(p[0] - pts[i - 1][0], p[1] - pts[i - 1][1]) >= 1))
  .filter((pts) => pts.length >= 2);

describe('strips against an independent construction (fast-check)', () => {
  /**
   * Independent construction: the wall is the union of one band per centreline piece (a rectangle,
   * or an annular sector built from the arc's centre) and, at each corner, on the outside, the pie
   * slice of radius t/2 about the joint (round) or the mitre kite (polylines). The union is taken by the boolean module, whose own
   * tests check it against polygon-clipping; both give the same region when the outline is valid.
   */
  function band(c: LineChain, i: number, t: number): Contour {
    const s = chainSegment(c, i);
    const h = t / 2;
    if (s.sweep === 0) {
      const L = Math.hypot(s.bx - s.ax, s.by - s.ay);
      const nx = -(s.by - s.ay) / L, ny = (s.bx - s.ax) / L;
      return contourFrom([s.ax - h * nx, s.ay - h * ny, s.bx - h * nx, s.by - h * ny, s.bx + h * nx, s.by + h * ny, s.ax + h * nx, s.ay + h * ny]);
    }
    const { cx, cy, r } = arcFromChord(s.ax, s.ay, s.bx, s.by, s.sweep);
    const rr = s.sweep > 0 ? r + h : r - h, rl = s.sweep > 0 ? r - h : r + h; // right and left faces
    const at = (x: number, y: number, rad: number): [number, number] => [cx + ((x - cx) * rad) / r, cy + ((y - cy) * rad) / r];
    const [aR, bR, bL, aL] = [at(s.ax, s.ay, rr), at(s.bx, s.by, rr), at(s.bx, s.by, rl), at(s.ax, s.ay, rl)];
    const xy: number[] = [aR[0], aR[1]], bulge: number[] = [];
    pushArc(xy, bulge, aR[0], aR[1], bR[0], bR[1], s.sweep);
    xy.push(bR[0], bR[1], bL[0], bL[1]);
    bulge.push(0);
    pushArc(xy, bulge, bL[0], bL[1], aL[0], aL[1], -s.sweep);
    xy.push(aL[0], aL[1]);
    bulge.push(0);
    return contourFrom(xy, bulge);
  }

  /** Unit tangent of segment i at its start (end = false) or end, from the arc's centre. */
  function tangent(c: LineChain, i: number, end: boolean): [number, number] {
    const s = chainSegment(c, i);
    const [px, py] = end ? [s.bx, s.by] : [s.ax, s.ay];
    if (s.sweep === 0) {
      const L = Math.hypot(s.bx - s.ax, s.by - s.ay);
      return [(s.bx - s.ax) / L, (s.by - s.ay) / L];
    }
    const { cx, cy, r } = arcFromChord(s.ax, s.ay, s.bx, s.by, s.sweep);
    const sg = s.sweep > 0 ? 1 : -1;
    return [(-sg * (py - cy)) / r, (sg * (px - cx)) / r];
  }

  function unionOfParts(c: LineChain, t: number, corners: StripCorners): Region {
    const m = segmentCount(c);
    const parts: Region[] = [];
    for (let i = 0; i < m; i++) parts.push([band(c, i, t)]);
    // A centreline that ends on its start is closed: its closing vertex is a corner too
    // (within 1e-12 of the size, the rule stripOutline documents).
    const n = c.xy.length / 2;
    const size = Math.max(...Array.from(c.xy, Math.abs), t);
    const closed = Math.hypot(c.xy[0] - c.xy[2 * n - 2], c.xy[1] - c.xy[2 * n - 1]) <= 1e-12 * size;
    const h = t / 2;
    for (let i = 0; i < (closed ? m : m - 1); i++) {
      const s = chainSegment(c, i);
      const t1 = tangent(c, i, true), t2 = tangent(c, (i + 1) % m, false);
      const delta = Math.atan2(t1[0] * t2[1] - t1[1] * t2[0], t1[0] * t2[0] + t1[1] * t2[1]);
      if (Math.abs(delta) < 1e-12) continue;
      const out = delta > 0 ? -1 : 1; // the outside of a left turn is the right side
      const p1 = [s.bx - out * h * t1[1], s.by + out * h * t1[0]];
      const p2 = [s.bx - out * h * t2[1], s.by + out * h * t2[0]];
      let piece: Contour;
      if (corners === 'round') {
        // The pie slice of radius t/2 about the joint between the two outer face ends.
        piece = contourFrom([s.bx, s.by, p1[0], p1[1], p2[0], p2[1]], [0, Math.tan(delta / 4), 0]);
      } else {
        // Mitre kite of a line–line corner: the joint, the two face ends, the mitre point.
        const ext = h * Math.tan(Math.abs(delta) / 2);
        const mp = [p1[0] + ext * t1[0], p1[1] + ext * t1[1]];
        piece = contourFrom([s.bx, s.by, p1[0], p1[1], mp[0], mp[1], p2[0], p2[1]]);
      }
      if (regionMomentsAbout([piece], s.bx, s.by).m00 < 0) piece = reverseContour(piece);
      parts.push([piece]);
    }
    return booleanRegions(parts[0], parts.slice(1), 'union');
  }

  const centrelineArb = fc
    .record({
      pts: polylineArb,
      sweeps: fc.array(fc.double({ min: -5.5, max: 5.5, noNaN: true }), { minLength: 6, maxLength: 6 }),
      arcs: fc.array(fc.boolean(), { minLength: 6, maxLength: 6 }),
    })
    .map(({ pts, sweeps, arcs }) => chainFrom(pts.flat(), pts.slice(1).map((_, i) => (arcs[i] && Math.abs(sweeps[i]) > 1e-3 ? Math.tan(sweeps[i] / 4) : 0))));

  function check(c: LineChain, t: number, corners: StripCorners, stats: { built: number; refused: number }) {
    let o: Region;
    try {
      o = stripOutline(c, t, corners);
    } catch (e) {
      expect(e).toBeInstanceOf(LineError);
      expect((e as Error).message).toMatch(/segments\[\d+\]|thickness/);
      stats.refused++;
      return;
    }
    stats.built++;
    for (const k of o) for (const v of k.xy) expect(Number.isFinite(v)).toBe(true);
    // Topology, by the boolean module's own check: the outline neither crosses nor touches itself.
    expect(resolveOutline(o as Contour[]).selfIntersecting).toBe(false);
    const ox = c.xy[0], oy = c.xy[1];
    const mine = areaValues(o, ox, oy), ref = areaValues(unionOfParts(c, t, corners), ox, oy);
    const J = ref.Ix + ref.Iy;
    close(mine.A, ref.A, 1e-9);
    close(mine.x, ref.x, 1e-9, Math.sqrt(J / ref.A) + Math.abs(ref.x));
    close(mine.y, ref.y, 1e-9, Math.sqrt(J / ref.A) + Math.abs(ref.y));
    close(mine.Ix, ref.Ix, 1e-9, J);
    close(mine.Iy, ref.Iy, 1e-9, J);
    close(mine.Ixy, ref.Ixy, 1e-9, J);
  }

  it('round corners, lines and arcs', () => {
    const stats = { built: 0, refused: 0 };
    fc.assert(
      fc.property(centrelineArb, fc.double({ min: 0.05, max: 3, noNaN: true }), (c, t) => check(c, t, 'round', stats)),
      // Regression: a first segment shorter than t/2 before a round corner (a whole disk at the
      // joint would poke past its square start; the corner is only the outside slice).
      { numRuns: 150, examples: [[chainFrom([0, 1, 0, 0, 0, 1.3816629516875858], [0, 5.041915256481258]), 2.0000102592964577]] },
    );
    expect(stats.built).toBeGreaterThan(50);
  });

  it('mitred corners, polylines', () => {
    const stats = { built: 0, refused: 0 };
    fc.assert(
      fc.property(polylineArb, fc.double({ min: 0.05, max: 1.5, noNaN: true }), (pts, t) => check(chainFrom(pts.flat()), t, 'mitre', stats)),
      { numRuns: 150 },
    );
    expect(stats.built).toBeGreaterThan(50);
  });
});

describe('joint geometry (src/geometry/offset-faces.ts): exact identities', () => {
  // A face at offset d of a piece through the joint V = 0 with left normal n and curvature k is
  // the circle about C = n/k of radius |1/k − d| (or the line w·n = d): elementary geometry.
  const sideArb = fc.record({
    ang: fc.double({ min: -PI, max: PI, noNaN: true }),
    // Curvatures of either sign down to 1e-3 (the reference below forms the centre n/k), or 0.
    k: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 2, noNaN: true })),
    ccw: fc.boolean(),
  }).map(({ ang, k, ccw }) => ({ tx: Math.cos(ang), ty: Math.sin(ang), nx: -Math.sin(ang), ny: Math.cos(ang), k: ccw ? k : -k }));

  it('a point at arc distance s along a face gives ds = s and the rotation about the centre', () => {
    fc.assert(
      fc.property(sideArb, fc.double({ min: -0.4, max: 0.4, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), (p, d, s) => {
        if (p.k === 0) {
          const r = alongFace(p, d, d * p.nx + s * p.tx, d * p.ny + s * p.ty);
          close(r.ds, s, 1e-14, 1);
          expect(r.dphi).toBe(0);
          return;
        }
        const R = 1 / p.k, rho = Math.abs(R - d);
        if (!(rho > 0.05) || Math.abs(s) > 0.9 * PI * rho) return;
        // Walk s along the face in the direction of travel: rotation s/ρ about C, CCW for k > 0.
        const beta = (Math.sign(p.k) * s) / rho;
        const ex = (d - R) * p.nx, ey = (d - R) * p.ny; // E − C
        const wx = R * p.nx + Math.cos(beta) * ex - Math.sin(beta) * ey, wy = R * p.ny + Math.sin(beta) * ex + Math.cos(beta) * ey;
        const r = alongFace(p, d, wx, wy);
        close(r.ds, s, 1e-12, 1);
        close(r.dphi, beta, 1e-12, 1);
      }),
      { numRuns: 500 },
    );
  });

  it('where two faces meet, the point lies on both', () => {
    fc.assert(
      fc.property(sideArb, sideArb, fc.double({ min: -0.4, max: 0.4, noNaN: true }), (p, q, d) => {
        // Corners only: stripOutline treats turns below 1e-10 as tangent and never asks.
        if (Math.abs(p.tx * q.ty - p.ty * q.tx) < 1e-6) return;
        const w = facesMeet(p, q, d);
        if (!w) return;
        for (const f of [p, q]) {
          // Signed distance from the face: |w − C| − ρ for an arc, w·n − d for a line.
          const gap = f.k === 0 ? w[0] * f.nx + w[1] * f.ny - d : Math.hypot(w[0] - f.nx / f.k, w[1] - f.ny / f.k) - Math.abs(1 / f.k - d);
          expect(Math.abs(gap)).toBeLessThan(1e-9 * (1 + Math.hypot(w[0], w[1])));
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe('refusals say what and where', () => {
  const expectRefused = (c: LineChain, t: number, corners: StripCorners, pattern: RegExp, segment?: number) => {
    try {
      stripOutline(c, t, corners);
    } catch (e) {
      expect(e).toBeInstanceOf(LineError);
      expect((e as Error).message).toMatch(pattern);
      if (segment !== undefined) expect((e as LineError).where.segment).toBe(segment);
      return;
    }
    expect.fail(`expected a refusal matching ${pattern}`);
  };

  it('each kind of impossible wall', () => {
    expectRefused(chainFromPath([0, 0], [{ to: [1, 0] }, { to: [1, 0] }]), 0.2, 'round', /segments\[1\]: zero length/, 1);
    expectRefused(chainFromPath([0, 0], [{ to: [10, 0] }, { to: [10.8, 0], via: [10.4, 0.4] }]), 1, 'round', /segments\[1\]: the arc's radius \(0\.4\) must exceed half the wall thickness \(0\.5\)/, 1);
    expectRefused(chainFromPath([0, 0], [{ to: [10, 0] }, { to: [4, 0] }]), 1, 'mitre', /segments\[1\]: the centreline turns straight back on segments\[0\]/, 1);
    expectRefused(chainFromPath([0, 0], [{ to: [10, 0] }, { to: [10, 0.8] }, { to: [0, 0.8] }]), 1, 'mitre', /segments\[1\]: too short for a wall 1 thick/, 1);
    expectRefused(chainFromPath([0, 0], [{ to: [10, 0] }, { to: [10, 5] }, { to: [5, 5] }, { to: [5, -5] }]), 1, 'round', /segments\[3\] and segments\[0\]: the wall overlaps itself/, 3);
    expectRefused(chainFromPath([0, 0], [{ to: [10, 0] }, { to: [10, 3] }, { to: [5, 3] }, { to: [5, 0.4] }]), 1, 'mitre', /segments\[3\] and segments\[0\].*closer to itself than the thickness/);
    expectRefused(chainFromPath([0, 0], [{ to: [1, 0] }]), 0, 'round', /thickness: the wall thickness must be a positive number/);
    expectRefused(chainFromPath([0, 0], [{ to: [1, 0] }]), 1, 'bevel' as StripCorners, /corners: must be 'mitre' or 'round'/);
    expectRefused(chainFromPath([0, 0], []), 1, 'round', /needs at least one segment/);
  });
});

describe('position', () => {
  it('far from the origin (1e6) the exact and thin-wall values hold to 1e-9', () => {
    // Exact identity (translation). Dyadic coordinates and offset (2^20), so the moved centreline
    // is exactly the same geometry.
    const c = chainFromPath([20, 0], [{ to: [3, 0] }, { to: [0, 3], via: [0.875, 0.875] }, { to: [0, 20] }, { to: [-4, 24] }]);
    const off = 2 ** 20;
    const moved = { ...c, xy: c.xy.map((v, i) => v + (i % 2 ? -off : off)) };
    for (const corners of ['mitre', 'round'] as const) {
      const a = thinWallComparison(c, 0.75, stripOutline(c, 0.75, corners));
      const b = thinWallComparison(moved, 0.75, stripOutline(moved, 0.75, corners));
      const J = a.exact.Ix + a.exact.Iy;
      close(b.exact.area, a.exact.area, 1e-9);
      for (const k of ['Ix', 'Iy', 'Ixy'] as const) {
        close(b.exact[k], a.exact[k], 1e-9, J);
        close(b.thinWall[k], a.thinWall[k], 1e-9, J);
      }
      expect(Math.abs(b.exact.centroid.x - (a.exact.centroid.x + off))).toBeLessThanOrEqual(2 * Number.EPSILON * off);
      // Per cent of the exact value: 1e-9 of the values is 1e-7 in per-cent points.
      close(b.percent.Ix, a.percent.Ix, 1e-7, 1);
    }
  });
});

afterAll(() => {
  console.log(`lines-strip: largest relative error ${worst.value.toExponential(2)}`);
});
