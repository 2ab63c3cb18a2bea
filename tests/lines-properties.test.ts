/**
 * Line properties (per unit thickness) against published tables and closed forms.
 *
 * Sources:
 * - Blodgett, Design of Welded Structures (Lincoln Arc Welding Foundation, 1966), Sect. 7.4,
 *   Table 5, "Properties of weld treated as a line": Sw (bending) and Jw (twisting) per unit
 *   throat, and the centroid distances Nx, Ny. Entries from memory.
 * - Budynas & Nisbett, Shigley's Mechanical Engineering Design (9th ed.), Table 9-1 (torsional
 *   properties of fillet welds, unit second polar moment Ju) and Table 9-2 (bending properties,
 *   unit second moment Iu). Entries from memory; they agree with Blodgett's where both list a case.
 * - Hibbeler, Engineering Mechanics: Statics, inside back cover, "Geometric properties of line and
 *   area elements": circular arc segment, centroid r sinα / α from the centre, length 2αr;
 *   quarter and semicircular arcs, centroid 2r/π.
 * - Young & Budynas, Roark's Formulas for Stress and Strain (7th ed.), Table A.1, thin-walled
 *   circular arc of mean radius R, half-angle α (case number not recalled; from memory):
 *   A = 2αRt, I about the axis of symmetry = R³t(α − sinα cosα), I about the perpendicular
 *   centroidal axis = R³t(α + sinα cosα − 2 sin²α / α).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { chainFrom, chainFromContour, chainFromPath, LineError, type LineChain, type LineGroup } from '../src/lines/chain';
import { lineMoments, lineProperties } from '../src/lines/line-properties';
import { circleContour } from '../src/geometry/contour';
import { close, worst } from './helpers';

const PI = Math.PI;

/** A straight run from p to q. */
const run = (p: [number, number], q: [number, number]): LineChain => chainFromPath(p, [{ to: q }]);

/** Ring of radius r about (cx, cy) as two semicircular arcs. */
const ring = (cx: number, cy: number, r: number): LineChain =>
  chainFromPath([cx + r, cy], [
    { to: [cx - r, cy], via: [cx, cy + r] },
    { to: [cx + r, cy], via: [cx, cy - r] },
  ]);

/** The arc of radius r about (cx, cy) from angle −α to α, as one segment. */
const arc = (cx: number, cy: number, r: number, alpha: number): LineChain =>
  chainFrom([cx + r * Math.cos(alpha), cy - r * Math.sin(alpha), cx + r * Math.cos(alpha), cy + r * Math.sin(alpha)], [Math.tan(alpha / 2)]);

describe('weld groups treated as lines (Blodgett Table 5; Shigley Tables 9-1, 9-2)', () => {
  it('two parallel vertical lines, length d, b apart', () => {
    const b = 6, d = 10;
    const p = lineProperties([run([0, 0], [0, d]), run([b, 0], [b, d])]);
    close(p.length, 2 * d);
    close(p.centroid.x, b / 2);
    close(p.centroid.y, d / 2);
    // Blodgett Table 5: Sw = d²/3, Jw = d(3b² + d²)/6 (from memory).
    close(p.Sx_top as number, (d * d) / 3);
    close(p.Sx_bottom as number, (d * d) / 3);
    close(p.J, (d * (3 * b * b + d * d)) / 6);
    // Shigley Table 9-2: Iu = d³/6 (from memory).
    close(p.Ix, d ** 3 / 6);
    close(p.Ixy, 0, 1e-12, p.J);
  });

  it('two parallel horizontal lines, length b, d apart', () => {
    const b = 5, d = 8;
    const p = lineProperties([run([0, 0], [b, 0]), run([0, d], [b, d])]);
    // Blodgett Table 5: Sw = bd, Jw = b(3d² + b²)/6 (from memory).
    close(p.Sx_top as number, b * d);
    close(p.J, (b * (3 * d * d + b * b)) / 6);
  });

  it('rectangle outline (box), b wide and d deep', () => {
    const b = 7, d = 12;
    const box = chainFromPath([0, 0], [{ to: [b, 0] }, { to: [b, d] }, { to: [0, d] }, { to: [0, 0] }]);
    const p = lineProperties([box]);
    close(p.length, 2 * (b + d));
    // Blodgett Table 5: Sw = bd + d²/3, Jw = (b + d)³/6 (from memory).
    close(p.Sx_top as number, b * d + (d * d) / 3);
    close(p.J, (b + d) ** 3 / 6);
    // Shigley Table 9-2: Iu = d²(3b + d)/6 (from memory).
    close(p.Ix, (d * d * (3 * b + d)) / 6);
    // The same box as a closed contour (a weld all round an area's boundary).
    const q = lineProperties([chainFromContour({ xy: Float64Array.of(0, 0, b, 0, b, d, 0, d), bulge: null })]);
    close(q.J, (b + d) ** 3 / 6);
  });

  it('C shape: web d, flanges b (opening to the right)', () => {
    const b = 5, d = 10;
    const c = chainFromPath([b, d / 2], [{ to: [0, d / 2] }, { to: [0, -d / 2] }, { to: [b, -d / 2] }]);
    const p = lineProperties([c]);
    close(p.length, 2 * b + d);
    // Blodgett Table 5: Nx = b²/(2b + d), Sw = bd + d²/6, Jw = (2b + d)³/12 − b²(b + d)²/(2b + d) (from memory).
    close(p.centroid.x, (b * b) / (2 * b + d));
    close(p.centroid.y, 0, 1e-12, d);
    close(p.Sx_top as number, b * d + (d * d) / 6);
    close(p.J, (2 * b + d) ** 3 / 12 - (b * b * (b + d) ** 2) / (2 * b + d));
    // Shigley Table 9-1: Ju = (8b³ + 6bd² + d³)/12 − b⁴/(2b + d); Table 9-2: Iu = d²(6b + d)/12 (from memory).
    close(p.J, (8 * b ** 3 + 6 * b * d * d + d ** 3) / 12 - b ** 4 / (2 * b + d));
    close(p.Ix, (d * d * (6 * b + d)) / 12);
    // Extreme points: the web at x = 0 (left), the flange tips at x = b (right).
    close(p.fibres.left, (b * b) / (2 * b + d));
    close(p.Sy_right as number, p.Iy / (b - (b * b) / (2 * b + d)));
  });

  it('circle (ring of radius r)', () => {
    for (const r of [0.37, 4, 250]) {
      const p = lineProperties([ring(-3, 11, r)]);
      close(p.length, 2 * PI * r);
      close(p.centroid.x, -3);
      close(p.centroid.y, 11);
      // Blodgett Table 5: Sw = πd²/4, Jw = πd³/4 with d = 2r (from memory); Shigley Table 9-1:
      // Ju = 2πr³, Table 9-2: Iu = πr³ (from memory).
      close(p.J, 2 * PI * r ** 3);
      close(p.Ix, PI * r ** 3);
      close(p.Iy, PI * r ** 3);
      close(p.Sx_top as number, PI * r * r);
      close(p.Sy_left as number, PI * r * r);
      expect(p.theta).toBe(0);
      // The same circle from an area contour (two half-circle arcs).
      close(lineProperties([chainFromContour(circleContour(-3, 11, r))]).J, 2 * PI * r ** 3);
    }
  });
});

describe('circular arcs (Hibbeler, Statics, inside back cover; Roark Table A.1)', () => {
  it('quarter and semicircular arcs: centroid 2r/π', () => {
    const r = 3.5;
    // Hibbeler: quarter-circle arc, x̄ = ȳ = 2r/π, L = πr/2.
    const q = lineProperties([chainFromPath([r, 0], [{ to: [0, r], via: [r * Math.SQRT1_2, r * Math.SQRT1_2] }])]);
    close(q.length, (PI * r) / 2);
    close(q.centroid.x, (2 * r) / PI);
    close(q.centroid.y, (2 * r) / PI);
    // Hibbeler: semicircular arc, ȳ = 2r/π, L = πr.
    const s = lineProperties([chainFromPath([r, 0], [{ to: [-r, 0], via: [0, r] }])]);
    close(s.length, PI * r);
    close(s.centroid.y, (2 * r) / PI);
    close(s.centroid.x, 0, 1e-12, r);
  });

  it('an arc of any sweep: centroid r sinα / α from the centre', () => {
    // Hibbeler, circular arc segment: x̄ = r sinα / α, L = 2αr, for half-angle α (sweep 2α).
    fc.assert(
      fc.property(fc.double({ min: 1e-9, max: PI - 0.01, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (alpha, r) => {
        const p = lineProperties([arc(0, 0, r, alpha)]);
        close(p.length, 2 * alpha * r, 1e-13);
        // To round-off of the arc's own size r: near α = π the centroid lies close to the centre
        // (x̄ ≪ r), and the arc's end points, given to 1 ulp of r, fix it only to that.
        close(p.centroid.x, (r * Math.sin(alpha)) / alpha, 1e-13, r);
        close(p.centroid.y, 0, 1e-13, r);
      }),
      { numRuns: 300 },
    );
  });

  it('arc second moments (Roark Table A.1, thin circular arc, from memory)', () => {
    // Per unit thickness: I about the symmetry axis (here x) = R³(α − sinα cosα); about the
    // centroidal axis parallel to y = R³(α + sinα cosα − 2 sin²α / α). Used for α ≥ 0.5, where
    // these expressions themselves lose no digits to cancellation.
    for (const alpha of [0.5, 0.8, 1, PI / 4, PI / 2, 2, 2.5, 3, 3.1]) {
      const R = 7.25;
      const p = lineProperties([arc(0, 0, R, alpha)]);
      const s = Math.sin(alpha), c = Math.cos(alpha);
      close(p.Ix, R ** 3 * (alpha - s * c), 2e-13);
      close(p.Iy, R ** 3 * (alpha + s * c - (2 * s * s) / alpha), 2e-13);
      close(p.Ixy, 0, 1e-13, p.J);
    }
  });

  it('flat arcs stay exact (against independent Gauss–Legendre integration)', () => {
    // Reference: the same integrals over θ by 24-point Gauss–Legendre, in the chord-midpoint frame
    // with cosθ − cosα written as 2 sin((α+θ)/2) sin((α−θ)/2). The integrands are analytic in θ
    // and the rule converges to round-off (a general numerical method, not the kernel's formulas).
    const { x: nodes, w: weights } = gaussLegendre(24);
    const reference = (h: number, alpha: number) => {
      const r = h / Math.sin(alpha);
      let L = 0, S = 0, XX = 0, YY = 0;
      nodes.forEach((z, k) => {
        const th = alpha * z, w = weights[k] * alpha * r;
        const xp = 2 * r * Math.sin((alpha + th) / 2) * Math.sin((alpha - th) / 2), yp = r * Math.sin(th);
        L += w;
        S += w * xp;
        XX += w * xp * xp;
        YY += w * yp * yp;
      });
      return { L, xbar: S / L, Ic: XX - (S * S) / L, Iyy: YY };
    };
    for (const alpha of [1e-14, 1e-9, 1e-6, 1e-3, 0.05, 0.3, 0.7, 0.99, 1.01, 1.5]) {
      const h = 2.5;
      // Chord along y from (0, −h) to (0, h), bulging to +x (a CCW arc bulges to the right).
      const p = lineProperties([chainFrom([0, -h, 0, h], [Math.tan(alpha / 2)])]);
      const ref = reference(h, alpha);
      close(p.length, ref.L, 1e-14);
      close(p.centroid.x, ref.xbar, 1e-13);
      close(p.Iy, ref.Ic, 1e-13);
      close(p.Ix, ref.Iyy, 1e-14);
    }
  });
});

describe('group behaviour', () => {
  it('separate lines add their moments', () => {
    // Exact identity: line moments are additive over the pieces of a group.
    const a = run([0, 0], [4, 3]);
    const b = ring(10, -2, 1.5);
    const m = lineMoments([a, b]), ma = lineMoments([a]), mb = lineMoments([b]);
    for (const k of ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'] as const) close(m[k], ma[k] + mb[k], 1e-13, Math.abs(ma[k]) + Math.abs(mb[k]));
  });

  it('principal axes of an inclined line follow the section convention', () => {
    // A single straight line of length L: I about its own axis is 0, across it L³/12 (Blodgett
    // Table 5, single line: Jw = d³/12, from memory). θ is the angle of the I1 axis (across the line).
    const L = 10, ang = (30 * PI) / 180;
    const p = lineProperties([run([1, 1], [1 + L * Math.cos(ang), 1 + L * Math.sin(ang)])]);
    close(p.J, L ** 3 / 12);
    close(p.I1, L ** 3 / 12);
    close(p.I2, 0, 1e-12, L ** 3);
    close(p.theta, 30 + 90 - 180, 1e-12);
  });

  it('far from the origin (1e6) the properties hold to 1e-9', () => {
    // Exact identity (translation). Coordinates and offsets are dyadic (2^20 ≈ 1e6), so the moved
    // group is exactly the same geometry and only the computation is tested.
    const groups: [string, LineGroup][] = [
      ['C', [chainFromPath([5, 5], [{ to: [0, 5] }, { to: [0, -5] }, { to: [5, -5] }])]],
      ['ring', [ring(0, 0, 3)]],
      ['flat arc', [chainFrom([0, 0, 10, 1], [1e-7])]],
      ['small arcs', [chainFrom([0, 0, 2 ** -10, 0], [0.4]), run([0, 0], [0, 2 ** -9]), chainFrom([2 ** -8, 0, 2 ** -8, 2 ** -9], [-1e-3])]],
    ];
    for (const [, g] of groups) {
      const p = lineProperties(g);
      for (const off of [2 ** 20, -3 * 2 ** 20]) {
        const moved = g.map((c) => ({ ...c, xy: c.xy.map((v, i) => v + (i % 2 === 0 ? off : -off)) }));
        const q = lineProperties(moved);
        close(q.length, p.length, 1e-12);
        // The centroid is a coordinate near 1e6: right to a few units in its last place.
        const ulp = Number.EPSILON * Math.abs(off);
        expect(Math.abs(q.centroid.x - (p.centroid.x + off))).toBeLessThanOrEqual(2 * ulp);
        expect(Math.abs(q.centroid.y - (p.centroid.y - off))).toBeLessThanOrEqual(2 * ulp);
        for (const k of ['Ix', 'Iy', 'Ixy', 'J', 'I1', 'I2'] as const) close(q[k], p[k], 1e-9, p.J);
        for (const k of ['top', 'bottom', 'left', 'right'] as const) close(q.fibres[k], p.fibres[k], 1e-9, p.bounds.xmax - p.bounds.xmin + p.bounds.ymax - p.bounds.ymin);
      }
    }
  });

  it('refuses unusable input with a message that says where', () => {
    expect(() => lineProperties([])).toThrow(LineError);
    expect(() => lineProperties([chainFrom([1, 1, 1, 1], [0])])).toThrow(/no length/);
    expect(() => lineProperties([run([0, 0], [1, 0]), chainFrom([0, 0, NaN, 1])])).toThrow(/chain 1: point 1/);
    expect(() => chainFromPath([0, 0], [{ to: [1, 0] }, { to: [2, 0], via: [1.5, 0] }])).toThrow(/segments\[1\]\.via: .*one line/);
    expect(() => chainFromPath([0, 0], [{ to: [0, 0], via: [1, 1] }])).toThrow(/segments\[0\]: an arc cannot end where it starts/);
    try {
      chainFromPath([0, 0], [{ to: [1, 0] }, { to: [Infinity, 0] }]);
    } catch (e) {
      expect((e as LineError).where.segment).toBe(1);
    }
  });

  it('fuzzed groups never give NaN', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true })), { minLength: 2, maxLength: 7 }),
        (pts) => {
          const xy = pts.flatMap(([x, y]) => [x, y]);
          const bulge = pts.slice(1).map(([, , b]) => b);
          let p;
          try {
            p = lineProperties([chainFrom(xy, bulge)]);
          } catch (e) {
            expect(e).toBeInstanceOf(LineError);
            return;
          }
          for (const v of [p.length, p.centroid.x, p.centroid.y, p.Ix, p.Iy, p.Ixy, p.J, p.I1, p.I2, p.theta]) expect(Number.isFinite(v)).toBe(true);
          for (const v of [p.Sx_top, p.Sx_bottom, p.Sy_left, p.Sy_right]) expect(v === null || Number.isFinite(v)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });
});

/** Gauss–Legendre nodes and weights on [−1, 1] by Newton's method on P_n. */
function gaussLegendre(n: number): { x: number[]; w: number[] } {
  const x: number[] = [], w: number[] = [];
  for (let i = 1; i <= n; i++) {
    let z = Math.cos((PI * (i - 0.25)) / (n + 0.5));
    let dp = 1;
    for (let it = 0; it < 100; it++) {
      let p1 = 1, p2 = 0;
      for (let j = 1; j <= n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j - 1) * z * p2 - (j - 1) * p3) / j;
      }
      dp = (n * (z * p1 - p2)) / (z * z - 1);
      const dz = p1 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-16) break;
    }
    x.push(z);
    w.push(2 / ((1 - z * z) * dp * dp));
  }
  return { x, w };
}

afterAll(() => {
  console.log(`lines-properties: largest relative error ${worst.value.toExponential(2)}`);
});
