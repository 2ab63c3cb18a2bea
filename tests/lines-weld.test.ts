/**
 * Weld groups by the elastic vector method: the force per unit length at the most stressed point.
 *
 * Sources:
 * - Blodgett, Design of Welded Structures (1966), Sect. 7.4, "treating the weld as a line": the
 *   direct shear F/L and the twisting force T·c/Jw at a point are added as vectors, and Table 5
 *   gives Jw and the centroid of the common groups (from memory). The bracket examples there use a
 *   C-shaped weld loaded off its centroid; their numbers are not recalled, so the example below has
 *   our own numbers, worked out by hand in full in the comment.
 * - Budynas & Nisbett, Shigley's Mechanical Engineering Design (9th ed.), Sect. 9-3 (stresses in
 *   welded joints in torsion: primary shear V/A plus secondary shear M·r/J, added as vectors) and
 *   Table 9-1 (from memory).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { arcPointAtAngle } from '../src/geometry/contour';
import { chainFrom, chainFromPath, chainSegment, LineError, segmentCount, type LineGroup } from '../src/lines/chain';
import { weldForceAt, weldGroupForces } from '../src/lines/weld-group';
import { close, worst } from './helpers';

const PI = Math.PI;

describe('elastic weld-group force at the critical point', () => {
  it('C-shaped group under an eccentric vertical load (worked by hand)', () => {
    // Group: web d = 10 in along x = 0 from y = −5 to 5; flanges b = 5 in along y = ±5 from x = 0
    // to 5 (a bracket welded on three sides). Load P = 20 kip downwards at (13, 0): 8 in beyond
    // the flange tips.
    //
    // Hand calculation (Blodgett Sect. 7.4 method; properties from Table 5, from memory):
    //   L  = 2b + d = 20 in
    //   x̄  = b²/(2b + d) = 25/20 = 1.25 in, ȳ = 0
    //   Jw = (2b + d)³/12 − b²(b + d)²/(2b + d) = 8000/12 − 25·225/20 = 666.667 − 281.25 = 385.417 in³
    //        (check: Ix = 2·5·5² + 10³/12 = 333.333; Iy = 10·1.25² + 2(5³/12 + 5·1.25²) = 52.083;
    //         Ix + Iy = 385.417)
    //   e  = 13 − 1.25 = 11.75 in, T = P·e = 235 kip·in, clockwise (M = −235)
    //   direct:    f_v = P/L = 1.0 kip/in, downwards
    //   torsion at the flange tip (5, 5): r = (3.75, 5), T/Jw = 0.609730 kip/in per in,
    //     f_h = T·r_y/Jw = 0.609730·5 = 3.04865 kip/in (to the right, clockwise about G),
    //     f_t = T·r_x/Jw = 0.609730·3.75 = 2.28649 kip/in (downwards)
    //   resultant: f = √(3.04865² + (1 + 2.28649)²) = √(9.29426 + 10.80099) = 4.4828 kip/in
    //   at the web corner (0, 5): r = (−1.25, 5): f = √(3.04865² + (1 − 0.76216)²) = 3.058 kip/in,
    //   so the tips govern; (5, −5) is the mirror point with the same force.
    const c = chainFromPath([5, 5], [{ to: [0, 5] }, { to: [0, -5] }, { to: [5, -5] }]);
    const r = weldGroupForces([c], { Fx: 0, Fy: -20, at: [13, 0] });
    close(r.properties.length, 20);
    close(r.properties.centroid.x, 1.25);
    close(r.properties.J, 8000 / 12 - (25 * 225) / 20);
    close(r.M, -235);
    // The hand figures to the digits carried above.
    close(r.critical.f, 4.4828, 1e-4);
    close(Math.abs(r.critical.torsion.fx), 3.04865, 1e-5);
    // The same hand formulas carried exactly: T/Jw·(r_y, r_x) plus P/L.
    const k = 235 / (8000 / 12 - (25 * 225) / 20);
    close(r.critical.f, Math.hypot(k * 5, 1 + k * 3.75));
    close(r.critical.x, 5);
    expect(Math.abs(r.critical.y)).toBe(5);
    close(r.critical.direct.fy, -1);
    // Clockwise moment: at the top tip the torsional force points to +x and down.
    const top = weldForceAt(r, 5, 5);
    close(top.fx, k * 5);
    close(top.fy, -1 - k * 3.75);
    close(weldForceAt(r, 0, 5).f, Math.hypot(k * 5, 1 - k * 1.25));
    // The mirror tip ties and is reported too.
    expect(r.alsoCritical).toHaveLength(1);
    close(r.alsoCritical[0].x, 5);
    close(Math.abs(r.alsoCritical[0].y), 5);
    close(r.alsoCritical[0].y, -r.critical.y);
    expect(r.uniform).toBe(false);
  });

  it('ring under an eccentric load: the maximum lies inside an arc', () => {
    // Ring of radius R (Blodgett Table 5, circle: Jw = πd³/4 = 2πR³, from memory), load P
    // downwards at (e, 0). Direct P/(2πR) downwards; torsion P·e·R/(2πR³) at every point, tangent,
    // clockwise: at (R, 0) it points straight down too, so f_max = P/(2πR)·(1 + e/R) there.
    // The ring is drawn from (0, R) so that (R, 0) is the middle of the second arc, not an end.
    const R = 2, P = 10, e = 7;
    const ring = chainFromPath([0, R], [{ to: [0, -R], via: [-R, 0] }, { to: [0, R], via: [R, 0] }]);
    const r = weldGroupForces([ring], { Fx: 0, Fy: -P, at: [e, 0] });
    close(r.properties.J, 2 * PI * R ** 3);
    close(r.critical.f, (P / (2 * PI * R)) * (1 + e / R));
    close(r.critical.x, R);
    close(r.critical.y, 0, 1e-12, R);
    expect(r.critical.segment).toBe(1);
  });

  it('an added moment alone: the force is M·r/J, largest at the farthest point', () => {
    // Shigley Sect. 9-3: secondary shear τ″ = M·r/J (per unit throat: f = M·r/Ju), Table 9-1
    // rectangle Ju = (b + d)³/6 (from memory). Farthest points: the corners, r = ½√(b² + d²).
    const b = 6, d = 8, M = 120;
    const box = chainFromPath([0, 0], [{ to: [b, 0] }, { to: [b, d] }, { to: [0, d] }, { to: [0, 0] }]);
    const r = weldGroupForces([box], { Fx: 0, Fy: 0, at: [0, 0], M });
    close(r.critical.f, (M * 0.5 * Math.hypot(b, d)) / ((b + d) ** 3 / 6));
    expect(r.alsoCritical.length).toBe(3);
  });

  it('no moment about the centroid: uniform F/L', () => {
    // Blodgett Sect. 7.4: a load through the centroid gives the direct part only, F/L everywhere.
    const c = chainFromPath([5, 5], [{ to: [0, 5] }, { to: [0, -5] }, { to: [5, -5] }]);
    const r = weldGroupForces([c], { Fx: 3, Fy: -4, at: [1.25, 0] });
    expect(r.uniform).toBe(true);
    close(r.critical.f, 5 / 20);
    close(weldForceAt(r, 0, 0).f, 5 / 20);
  });

  it('the exact maximum bounds and is approached by dense sampling (fast-check)', () => {
    // Independent check by brute force: |f| sampled at 2001 points per segment never exceeds the
    // reported maximum and comes within the sampling error (|f| is smooth along each segment).
    const groupArb = fc
      .array(
        fc.record({
          x0: fc.double({ min: -10, max: 10, noNaN: true }),
          y0: fc.double({ min: -10, max: 10, noNaN: true }),
          x1: fc.double({ min: -10, max: 10, noNaN: true }),
          y1: fc.double({ min: -10, max: 10, noNaN: true }),
          sweep: fc.double({ min: -5.5, max: 5.5, noNaN: true }),
          arc: fc.boolean(),
        }),
        { minLength: 1, maxLength: 4 },
      )
      .map((segs) =>
        segs
          .filter((s) => Math.hypot(s.x1 - s.x0, s.y1 - s.y0) > 0.1)
          .map((s) => chainFrom([s.x0, s.y0, s.x1, s.y1], [s.arc && Math.abs(s.sweep) > 1e-3 ? Math.tan(s.sweep / 4) : 0])),
      );
    const loadArb = fc.record({
      Fx: fc.double({ min: -100, max: 100, noNaN: true }),
      Fy: fc.double({ min: -100, max: 100, noNaN: true }),
      px: fc.double({ min: -30, max: 30, noNaN: true }),
      py: fc.double({ min: -30, max: 30, noNaN: true }),
      M: fc.double({ min: -500, max: 500, noNaN: true }),
    });
    // Single arcs too, where an interior maximum is common.
    const arcArb = fc
      .record({ r: fc.double({ min: 0.5, max: 10, noNaN: true }), a0: fc.double({ min: -PI, max: PI, noNaN: true }), sweep: fc.double({ min: 0.05, max: 6, noNaN: true }), ccw: fc.boolean() })
      .map(({ r, a0, sweep, ccw }) => {
        const a1 = a0 + (ccw ? sweep : -sweep);
        return [chainFrom([r * Math.cos(a0), r * Math.sin(a0), r * Math.cos(a1), r * Math.sin(a1)], [Math.tan((ccw ? sweep : -sweep) / 4)])];
      });
    fc.assert(
      fc.property(fc.oneof(groupArb, arcArb), loadArb, (g: LineGroup, l) => {
        if (g.length === 0) return;
        const r = weldGroupForces(g, { Fx: l.Fx, Fy: l.Fy, at: [l.px, l.py], M: l.M });
        let sampled = 0;
        for (const c of g) {
          for (let i = 0; i < segmentCount(c); i++) {
            const s = chainSegment(c, i);
            const alpha = Math.abs(s.sweep) / 2;
            for (let k = 0; k <= 2000; k++) {
              const u = k / 2000;
              const [x, y] = s.sweep === 0 ? [s.ax + u * (s.bx - s.ax), s.ay + u * (s.by - s.ay)] : arcPointAtAngle(s.ax, s.ay, s.bx, s.by, s.sweep, -alpha + 2 * alpha * u);
              sampled = Math.max(sampled, weldForceAt(r, x, y).f);
            }
          }
        }
        const scale = r.critical.f + 1e-300;
        expect(sampled).toBeLessThanOrEqual(r.critical.f * (1 + 1e-12) + 1e-12);
        expect((r.critical.f - sampled) / scale).toBeLessThan(1e-5);
        expect(Number.isFinite(r.critical.f)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('far from the origin (1e6) the critical force holds to 1e-9', () => {
    // Exact identity (translation of the group and the load together); dyadic offset 2^20, so the
    // moved group is exactly the same geometry.
    const off = 2 ** 20;
    const arcC = (dx: number, dy: number) =>
      chainFromPath([5 + dx, 5 + dy], [{ to: [0 + dx, 5 + dy] }, { to: [0 + dx, -5 + dy], via: [-5 + dx, 0 + dy] }, { to: [5 + dx, -5 + dy] }]);
    const a = weldGroupForces([arcC(0, 0)], { Fx: 4, Fy: -20, at: [13, 2], M: 30 });
    const b = weldGroupForces([arcC(off, -off)], { Fx: 4, Fy: -20, at: [13 + off, 2 - off], M: 30 });
    close(b.M, a.M, 1e-9);
    close(b.critical.f, a.critical.f, 1e-9);
    close(b.critical.fx, a.critical.fx, 1e-9, a.critical.f);
    close(b.critical.fy, a.critical.fy, 1e-9, a.critical.f);
    expect(Math.abs(b.critical.x - off - a.critical.x)).toBeLessThanOrEqual(2 * Number.EPSILON * off);
  });

  it('refuses unusable loads with a message', () => {
    const c = chainFromPath([0, 0], [{ to: [1, 0] }]);
    expect(() => weldGroupForces([c], { Fx: NaN, Fy: 0, at: [0, 0] })).toThrow(/finite/);
    expect(() => weldGroupForces([c], { Fx: 1, Fy: 0, at: [0, Infinity] })).toThrow(/point where the force acts/);
    expect(() => weldGroupForces([], { Fx: 1, Fy: 0, at: [0, 0] })).toThrow(LineError);
  });
});

afterAll(() => {
  console.log(`lines-weld: largest relative error ${worst.value.toExponential(2)}`);
});
