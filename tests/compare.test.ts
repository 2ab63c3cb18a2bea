/**
 * The comparison of a baseline and a proposal against hand calculations by the composite method:
 * a plate with a centred hole and a plate with an off-centre notch. Every changed property and each
 * percentage is checked; the hand calculation is written out beside it.
 *
 * Sources: composite areas, parallel-axis theorem for moments and products of inertia
 * (Hibbeler, Statics, Sec. 10.4 and 10.5, composite areas; Gere & Goodno, Mechanics of Materials,
 * Sec. 12.4-12.5 and 12.7); rectangle and circle properties (Gere & Goodno, plane areas, cases 1
 * and 9: Ix = bh³/12, Ix = πr⁴/4); principal axes (Gere & Goodno, Sec. 12.8, eq. for Ix1 with 2θ);
 * plastic modulus of a circle Z = d³/6 = 4r³/3 and of a rectangle bh²/4 (Gere & Goodno, Sec. 6.10,
 * plastic moduli; from memory); flexure formula S = I/c (Gere & Goodno, Sec. 5.5).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { polygonContour, reverseContour } from '../src/geometry/contour';
import { compareSections, comparisonRow, type SectionComparison } from '../src/compare';
import { circle, close, props, rect, worst } from './helpers';

const PI = Math.PI;

/** Hand values of the properties the comparison lists, by catalogue key. */
type Hand = Record<string, number>;

/** Check every row against the hand values, and each percentage as 100·(q − b)/|b|. */
function checkRows(c: SectionComparison, base: Hand, prop: Hand, tol = 1e-9): void {
  for (const [key, b] of Object.entries(base)) {
    const row = comparisonRow(c, key);
    expect(row, key).toBeDefined();
    const q = prop[key];
    const L = 200;
    const scale = row!.power > 0 ? L ** row!.power : 90;
    close(row!.baseline, b, tol, scale * 1e-3);
    close(row!.proposal, q, tol, scale * 1e-3);
    // The change to 1e-9 of the values' size; the percentage to 1e-9 of a percentage point.
    if (row!.kind !== 'angle') close(row!.change!, q - b, 1e-9, Math.max(Math.abs(q), Math.abs(b)));
    if (row!.kind === 'magnitude') close(row!.changePercent!, (100 * (q - b)) / Math.abs(b), 1e-9, 1);
  }
}

/** Ix1(θ) = (Ix+Iy)/2 + (Ix−Iy)/2 cos2θ − Ixy sin2θ; the θ in (−90°, 90°] where it is largest. */
function majorAxisDegrees(Ix: number, Iy: number, Ixy: number): number {
  const t = 0.5 * Math.atan2(-2 * Ixy, Ix - Iy);
  const I = (th: number) => (Ix + Iy) / 2 + ((Ix - Iy) / 2) * Math.cos(2 * th) - Ixy * Math.sin(2 * th);
  let best = I(t) >= I(t + PI / 2) ? t : t + PI / 2;
  if (best > PI / 2) best -= PI;
  return (best * 180) / PI;
}

describe('plate 200 × 100 with a centred hole Ø40', () => {
  const plate = [rect(0, 0, 200, 100)];
  const withHole = [rect(0, 0, 200, 100), reverseContour(circle(100, 50, 20))];
  const c = compareSections(props(plate), props(withHole));
  // Hand calculation (composite method): plate A1 = 200·100 = 20000, Ix1 = 200·100³/12,
  // Iy1 = 100·200³/12; hole A2 = π·20² = 400π, Ix2 = Iy2 = π·20⁴/4 = 40000π, both centred at
  // (100, 50), so the centroid does not move and no transfer terms arise.
  const A1 = 20000, A2 = 400 * PI, I2 = 40000 * PI;
  const Ix1 = (200 * 100 ** 3) / 12, Iy1 = (100 * 200 ** 3) / 12;
  const A = A1 - A2, Ix = Ix1 - I2, Iy = Iy1 - I2;
  const base: Hand = {
    area: A1, 'centroid.x': 100, 'centroid.y': 50, Qx: A1 * 50, Qy: A1 * 100, Ix: Ix1, Iy: Iy1, J0: Ix1 + Iy1,
    I1: Iy1, I2: Ix1, rx: Math.sqrt(Ix1 / A1), ry: Math.sqrt(Iy1 / A1), r1: Math.sqrt(Iy1 / A1), r2: Math.sqrt(Ix1 / A1),
    // S = I/c with c = 50 (x axis) and 100 (y axis).
    Sx_top: Ix1 / 50, Sx_bottom: Ix1 / 50, Sx_min: Ix1 / 50, Sy_left: Iy1 / 100, Sy_right: Iy1 / 100, Sy_min: Iy1 / 100,
    // Rectangle: Z = bh²/4.
    Zx: (200 * 100 ** 2) / 4, Zy: (100 * 200 ** 2) / 4, 'plasticAxis.y': 50, 'plasticAxis.x': 100, perimeter: 600,
  };
  const prop: Hand = {
    area: A, 'centroid.x': 100, 'centroid.y': 50, Qx: A * 50, Qy: A * 100, Ix, Iy, J0: Ix + Iy,
    I1: Iy, I2: Ix, rx: Math.sqrt(Ix / A), ry: Math.sqrt(Iy / A), r1: Math.sqrt(Iy / A), r2: Math.sqrt(Ix / A),
    Sx_top: Ix / 50, Sx_bottom: Ix / 50, Sx_min: Ix / 50, Sy_left: Iy / 100, Sy_right: Iy / 100, Sy_min: Iy / 100,
    // Less the circle's Z = 4r³/3 about its own diameter, which lies on the plastic axis.
    Zx: (200 * 100 ** 2) / 4 - (4 / 3) * 20 ** 3, Zy: (100 * 200 ** 2) / 4 - (4 / 3) * 20 ** 3, 'plasticAxis.y': 50, 'plasticAxis.x': 100,
    // Perimeter gains the hole's circumference 2π·20.
    perimeter: 600 + 40 * PI,
  };

  it('gives both values, the change and the change in per cent of every property', () => {
    checkRows(c, base, prop);
    // Spot figures written out: area loss 400π/20000 = 6.2832 %; Ix loss 40000π/(200·100³/12) = 0.75398 %.
    close(comparisonRow(c, 'area')!.changePercent!, -100 * (400 * PI) / 20000, 1e-12);
    close(comparisonRow(c, 'Ix')!.changePercent!, (-100 * 40000 * PI) / Ix1, 1e-12);
  });

  it('reports no centroid shift and no rotation, and no percentage for Ixy = 0 (with the reason)', () => {
    close(c.centroidShift.length, 0, 1e-9, 200);
    expect(Math.abs(c.rotation.degrees!)).toBeLessThan(1e-9);
    const ixy = comparisonRow(c, 'Ixy')!;
    expect(ixy.changePercent).toBeNull();
    expect(ixy.note).toMatch(/symmetric/);
    // Coordinates get their change as a distance, never a percentage.
    expect(comparisonRow(c, 'centroid.x')!.changePercent).toBeNull();
    expect(comparisonRow(c, 'centroid.x')!.note).toMatch(/origin/);
    expect(comparisonRow(c, 'Qx')!.changePercent).toBeNull();
  });
});

describe('plate 200 × 100 with an off-centre notch 60 × 30 at the top right corner', () => {
  const plate = [rect(0, 0, 200, 100)];
  // The notch removes x 140..200, y 70..100.
  const notched = [polygonContour([[0, 0], [200, 0], [200, 70], [140, 70], [140, 100], [0, 100]])];
  const c = compareSections(props(plate), props(notched));
  // Hand calculation (composite method, Hibbeler, Statics, Sec. 9.3 and 10.4):
  //   plate A1 = 20000 at (100, 50); notch A2 = 60·30 = 1800 at (170, 85).
  //   A = 18200; x̄ = (20000·100 − 1800·170)/18200 = 1694000/18200 = 93.0769…;
  //   ȳ = (20000·50 − 1800·85)/18200 = 847000/18200 = 46.5385…
  const A1 = 20000, A2 = 1800, A = A1 - A2;
  const xb = (A1 * 100 - A2 * 170) / A, yb = (A1 * 50 - A2 * 85) / A;
  //   Ix = 200·100³/12 + A1(50 − ȳ)² − [60·30³/12 + A2(85 − ȳ)²]
  const Ix = (200 * 100 ** 3) / 12 + A1 * (50 - yb) ** 2 - ((60 * 30 ** 3) / 12 + A2 * (85 - yb) ** 2);
  //   Iy = 100·200³/12 + A1(100 − x̄)² − [30·60³/12 + A2(170 − x̄)²]
  const Iy = (100 * 200 ** 3) / 12 + A1 * (100 - xb) ** 2 - ((30 * 60 ** 3) / 12 + A2 * (170 - xb) ** 2);
  //   Ixy = A1(100 − x̄)(50 − ȳ) − A2(170 − x̄)(85 − ȳ)  (rectangles have no own product about their centroid)
  const Ixy = A1 * (100 - xb) * (50 - yb) - A2 * (170 - xb) * (85 - yb);
  //   I1,2 = (Ix + Iy)/2 ± √(((Ix − Iy)/2)² + Ixy²)  (Gere & Goodno, Sec. 12.8)
  const R = Math.hypot((Ix - Iy) / 2, Ixy);
  const I1 = (Ix + Iy) / 2 + R, I2 = (Ix + Iy) / 2 - R;
  //   Plastic axis y: area above c = 200(70 − c) + 140·30 = A/2 = 9100 → c = 45.5;
  //   Zx = 4900·12.25 + 4200·(85 − 45.5) + 9100·22.75 = 60025 + 165900 + 207025 = 432950.
  //   Plastic axis x: area right of c = 100(140 − c) + 70·60 = 9100 → c = 91;
  //   Zy = 4900·24.5 + 4200·(170 − 91) + 9100·45.5 = 120050 + 331800 + 414050 = 865900.
  const Ix1 = (200 * 100 ** 3) / 12, Iy1 = (100 * 200 ** 3) / 12;
  const base: Hand = {
    area: A1, 'centroid.x': 100, 'centroid.y': 50, Qx: A1 * 50, Qy: A1 * 100, Ix: Ix1, Iy: Iy1, J0: Ix1 + Iy1, I1: Iy1, I2: Ix1,
    rx: Math.sqrt(Ix1 / A1), ry: Math.sqrt(Iy1 / A1), r1: Math.sqrt(Iy1 / A1), r2: Math.sqrt(Ix1 / A1),
    Sx_top: Ix1 / 50, Sx_bottom: Ix1 / 50, Sx_min: Ix1 / 50, Sy_left: Iy1 / 100, Sy_right: Iy1 / 100, Sy_min: Iy1 / 100,
    Zx: 500000, Zy: 1000000, 'plasticAxis.y': 50, 'plasticAxis.x': 100, perimeter: 600,
  };
  // The extent does not change (the notch leaves the top and right edges elsewhere), so the
  // fibre distances are 100 − ȳ, ȳ, x̄ and 200 − x̄.
  const prop: Hand = {
    area: A, 'centroid.x': xb, 'centroid.y': yb, Qx: A * yb, Qy: A * xb, Ix, Iy, Ixy, J0: Ix + Iy, I1, I2,
    rx: Math.sqrt(Ix / A), ry: Math.sqrt(Iy / A), r1: Math.sqrt(I1 / A), r2: Math.sqrt(I2 / A),
    Sx_top: Ix / (100 - yb), Sx_bottom: Ix / yb, Sx_min: Math.min(Ix / (100 - yb), Ix / yb),
    Sy_left: Iy / xb, Sy_right: Iy / (200 - xb), Sy_min: Math.min(Iy / xb, Iy / (200 - xb)),
    Zx: 432950, Zy: 865900, 'plasticAxis.y': 45.5, 'plasticAxis.x': 91,
    // The notch replaces 60 + 30 of the outline by 30 + 60.
    perimeter: 600,
  };

  it('gives both values, the change and the change in per cent of every property', () => {
    checkRows(c, { ...base, Ixy: 0 }, prop);
    // Figures written out: area loss 1800/20000 = 9 %; the critical fibre is the top one.
    close(comparisonRow(c, 'area')!.changePercent!, -9, 1e-12);
    close(comparisonRow(c, 'Sx_min')!.changePercent!, (100 * (Ix / (100 - yb) - Ix1 / 50)) / (Ix1 / 50), 1e-9);
    close(comparisonRow(c, 'perimeter')!.changePercent!, 0, 1e-9, 1);
    // Ixy of the baseline is zero: the change is given, the percentage is not.
    const ixy = comparisonRow(c, 'Ixy')!;
    close(ixy.change!, Ixy, 1e-9);
    expect(ixy.changePercent).toBeNull();
  });

  it('gives the centroid shift as a vector and a length', () => {
    close(c.centroidShift.dx, xb - 100, 1e-9);
    close(c.centroidShift.dy, yb - 50, 1e-9);
    close(c.centroidShift.length, Math.hypot(xb - 100, yb - 50), 1e-9);
  });

  it('gives the rotation of the principal axes, wrapped into (−90°, 90°]', () => {
    // Baseline: Iy > Ix, so the I1 axis is the y axis (θ = 90°). Proposal: the major axis from
    // Ix1(θ) (Gere & Goodno, Sec. 12.8). The rotation is the difference, wrapped as lines.
    const theta = majorAxisDegrees(Ix, Iy, Ixy);
    let rot = theta - 90;
    if (rot <= -90) rot += 180;
    close(c.rotation.degrees!, rot, 1e-9);
    close(comparisonRow(c, 'theta')!.change!, rot, 1e-9);
    expect(Math.abs(rot)).toBeLessThan(45);
    expect(c.rotation.exchanged).toBe(false);
  });
});

describe('rotation rules', () => {
  it('has no meaning for an isotropic section, and says so', () => {
    // A square is isotropic (Ix = Iy, Ixy = 0: Gere & Goodno, Sec. 12.8, every axis principal).
    const c = compareSections(props([rect(0, 0, 100, 100)]), props([rect(0, 0, 100, 100), reverseContour(circle(80, 80, 5))]));
    expect(c.rotation.degrees).toBeNull();
    expect(c.rotation.note).toMatch(/isotropic/);
    expect(comparisonRow(c, 'theta')!.change).toBeNull();
  });

  it('wraps across ±90° and says when the major and minor axes exchange roles', () => {
    // 200 × 100 plate (θ = 90°) against a 100 × 200 plate (θ = 0°): the I1 axis turns by 90°,
    // which as a line is +90° (the wrap keeps (−90°, 90°]).
    const c = compareSections(props([rect(0, 0, 200, 100)]), props([rect(0, 0, 100, 200)]));
    close(c.rotation.degrees!, 90, 1e-12);
    expect(c.rotation.exchanged).toBe(true);
    expect(c.rotation.note).toMatch(/exchanged/);
  });
});

describe('fuzzed comparisons', () => {
  it('never give NaN: every change is proposal − baseline, every percentage has its sign, or is null with a reason', () => {
    const num = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true });
    fc.assert(
      fc.property(num(1, 300), num(1, 300), num(0.05, 0.45), num(0.1, 0.9), num(0.1, 0.9), (w, h, rr, fx, fy) => {
        const r = rr * Math.min(w, h);
        const cx = r + fx * (w - 2 * r), cy = r + fy * (h - 2 * r);
        const c = compareSections(props([rect(0, 0, w, h)]), props([rect(0, 0, w, h), reverseContour(circle(cx, cy, r))]));
        for (const row of c.rows) {
          expect(Number.isFinite(row.baseline) && Number.isFinite(row.proposal)).toBe(true);
          if (row.change === null || row.changePercent === null) expect(row.note).toBeTruthy();
          if (row.kind !== 'angle' && row.change !== null) close(row.change, row.proposal - row.baseline, 1e-12, Math.abs(row.baseline) + Math.abs(row.proposal));
          if (row.changePercent !== null) expect(Math.sign(row.changePercent)).toBe(Math.sign(row.change!));
        }
        // The hole removes exactly πr² of area (Gere & Goodno, plane areas, case 9).
        close(comparisonRow(c, 'area')!.change!, -PI * r * r, 1e-9, w * h);
        expect(Number.isFinite(c.centroidShift.length)).toBe(true);
      }),
      { numRuns: 100, seed: 17 },
    );
  });
});

afterAll(() => {
  console.log(`compare: largest relative error at tight tolerance ${worst.value.toExponential(2)}`);
});
