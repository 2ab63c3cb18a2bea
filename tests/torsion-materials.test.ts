/**
 * Mixed materials: pieces with their own shear modulus, in the G-weighted formulation, J and Cw
 * relative to a reference modulus.
 *
 * Sources: a composite circular bar (core and sleeve bonded, concentric) twists without warping,
 * so each part carries torque in proportion to G·Ip and G_ref·J = G₁·πr₁⁴/2 + G₂·π(r₂⁴ − r₁⁴)/2
 * (Gere & Goodno, Mechanics of Materials, torsion of composite bars; Roark Table 10.1 case 1 for
 * each part). Separate parts twist independently, so their G·J add (same sources), and the
 * rectangles use the series of Timoshenko & Goodier, Theory of Elasticity, §109.
 */
import { describe, expect, it } from 'vitest';
import { circleContour, polygonContour, reverseContour } from '../src/geometry/contour';
import { computeRegionTorsion, computeTorsion, TorsionError } from '../src/torsion';

const PI = Math.PI;
const rect = (x: number, y: number, w: number, h: number) =>
  polygonContour([
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ]);

function rectangleJ(b: number, t: number): number {
  // Timoshenko & Goodier §109 (b ≥ t).
  let s = 0;
  for (let n = 1; n < 400; n += 2) s += Math.tanh((n * PI * b) / (2 * t)) / n ** 5;
  return ((b * t ** 3) / 3) * (1 - ((192 / PI ** 5) * t * s) / b);
}

describe('G-weighted torsion', () => {
  it('composite circular bar: G_ref·J = G₁πr₁⁴/2 + G₂π(r₂⁴ − r₁⁴)/2', () => {
    // Gere & Goodno, composite bar in torsion (torque shared in proportion to G·Ip).
    const r1 = 20, r2 = 30, G1 = 26, G2 = 80;
    const res = computeTorsion(
      [
        { region: [circleContour(5, 5, r1)], G: G1 },
        { region: [circleContour(5, 5, r2), reverseContour(circleContour(5, 5, r1))], G: G2 },
      ],
      { referenceG: G2 },
    );
    const expected = (G1 * (PI * r1 ** 4) / 2 + G2 * (PI * (r2 ** 4 - r1 ** 4)) / 2) / G2;
    expect(Math.abs(res.J / expected - 1)).toBeLessThan(0.005);
    // Under a unit torque the largest stress is in the sleeve at r₂: τ = G₂ r₂ / (G_ref J).
    expect(Math.abs(res.stress.max / (r2 / expected) - 1)).toBeLessThan(0.005);
  });

  it('separate parts of different materials: G·J add', () => {
    // Same sources: each rectangle twists on its own (Timoshenko & Goodier §109 for each J).
    const G1 = 1, G2 = 3;
    const res = computeTorsion([
      { region: [rect(0, 0, 40, 8)], G: G1 },
      { region: [rect(0, 30, 30, 10)], G: G2 },
    ]);
    const expected = (G1 * rectangleJ(40, 8) + G2 * rectangleJ(30, 10)) / G1;
    expect(Math.abs(res.J / expected - 1)).toBeLessThan(0.005);
    expect(res.cautions.some((c) => c.includes('2 separate parts'))).toBe(true);
  });

  it('one rectangle cut into two pieces of the same material equals the whole (identity)', () => {
    const whole = computeRegionTorsion([rect(0, 0, 50, 10)]);
    const cut = computeTorsion([
      { region: [rect(0, 0, 20, 10)], G: 5 },
      { region: [rect(20, 0, 30, 10)], G: 5 },
    ]);
    expect(Math.abs(cut.J / whole.J - 1)).toBeLessThan(1e-4);
    expect(Math.abs(cut.J / rectangleJ(50, 10) - 1)).toBeLessThan(0.005);
  });

  it('a plate standing on part of a wider plate (T-junction interface) equals the union', () => {
    // The joined outline as one polygon against the same shape as two pieces meeting along part
    // of an edge: the mesher must split the wide plate's edge at the narrow plate's corners.
    const union = computeRegionTorsion([
      polygonContour([
        [0, 0],
        [100, 0],
        [100, 10],
        [70, 10],
        [70, 30],
        [30, 30],
        [30, 10],
        [0, 10],
      ]),
    ]);
    const pieces = computeTorsion([
      { region: [rect(0, 0, 100, 10)], G: 1 },
      { region: [rect(30, 10, 40, 20)], G: 1 },
    ]);
    expect(Math.abs(pieces.J / union.J - 1)).toBeLessThan(1e-3);
    expect(Math.abs(pieces.shearCentre.y - union.shearCentre.y)).toBeLessThan(1e-3 * 30);
  });

  it('a stiffer piece raises J between the all-soft and all-stiff values, and J scales with 1/G_ref', () => {
    const soft = rectangleJ(60, 12);
    const res = computeTorsion([
      { region: [rect(0, 0, 30, 12)], G: 1 },
      { region: [rect(30, 0, 30, 12)], G: 4 },
    ]);
    expect(res.J).toBeGreaterThan(soft);
    expect(res.J).toBeLessThan(4 * soft);
    const other = computeTorsion(
      [
        { region: [rect(0, 0, 30, 12)], G: 1 },
        { region: [rect(30, 0, 30, 12)], G: 4 },
      ],
      { referenceG: 4 },
    );
    expect(Math.abs(other.J / (res.J / 4) - 1)).toBeLessThan(1e-12);
    // The stiff half pulls the shear centre towards itself.
    expect(res.shearCentre.x).toBeGreaterThan(30);
  });

  it('overlapping pieces are refused with their place', () => {
    expect(() =>
      computeTorsion([
        { region: [rect(0, 0, 20, 10)], G: 1 },
        { region: [rect(10, 0, 20, 10)], G: 2 },
      ]),
    ).toThrow(TorsionError);
    expect(() =>
      computeTorsion([
        { region: [rect(0, 0, 20, 10)], G: 1 },
        { region: [rect(10, 0, 20, 10)], G: 2 },
      ]),
    ).toThrow(/cross|overlap/);
  });
});
