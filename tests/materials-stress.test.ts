/**
 * Stresses under N, Mx and My: the general (unsymmetric) bending formula, the neutral axis, the
 * exact extremes, shear at a cut, units, and the colour-map data.
 *
 * Sources:
 * - Gere & Goodno, Mechanics of Materials: flexure formula σ = My/I and the section moduli of a
 *   rectangle (bh²/6) and a circle (πr³/4) (Sec. 5.5 and 5.6, App. E); shear formula τ = VQ/(Ib),
 *   τmax = 3V/(2A) for a rectangle (Sec. 5.8) and 4V/(3A) for a circle (Sec. 5.9); composite
 *   beams, Example 6-1 (wood 4 × 6 in on a steel plate 4 × 0.5 in, M = 60 k-in, answers from
 *   memory, see tests/materials-composite.test.ts); bending of unsymmetric beams (Sec. 6.5).
 * - Hibbeler, Mechanics of Materials, Sec. 6.5, unsymmetric bending: resolve the moment into
 *   components along the principal axes, σ = M_u v/I_u − M_v u/I_v (sign per the right-hand rule),
 *   and the neutral-axis angle tan α = (I_u/I_v) tan θ (eq. 6-19, from memory). Used as the
 *   independent hand route for the unequal angle below, against Kern's formula in Ix, Iy, Ixy.
 * - AISC Steel Construction Manual, Table 1-7 (angles), L6×4×1/2 (from memory): A = 4.75 in²,
 *   x̄ = 0.987 in, ȳ = 1.99 in, Ix = 17.4 in⁴, Iy = 6.27 in⁴, rz = 0.870 in, tan α = 0.440. The
 *   table includes the root fillet and rounded toes; the sharp-cornered angle checked here agrees
 *   to about 1 %, the stated tolerance.
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { circle, close, rect, worst } from './helpers';
import { contourFrom, reverseContour, rotateRegion, type Region } from '../src/geometry/contour';
import { mixedSection, type MaterialPart } from '../src/materials/mixed';
import type { Material } from '../src/materials/material';
import { neutralAxis, stressAt, stressField, stressValue, SIGN_CONVENTION } from '../src/materials/stress';
import { stressExtremes } from '../src/materials/extremes';
import { shearAtCut, SHEAR_ROTATED_CAUTION } from '../src/materials/shear';
import { sampleStressGrid, stressGradients } from '../src/materials/stress-map';
import { stressJson } from '../src/materials/json';
import { STRESS_CAUTION, CODE_DEFERRAL, ROTATED_AXES_CAUTION, TRANSFORMED_CAUTION } from '../src/materials/cautions';
import type { LoadUnits } from '../src/materials/units';

const steel: Material = { id: 'steel', name: 'Steel S355', E: 210000, density: 7850, fy: 355 };
const one = (region: Region, m: Material = steel) => mixedSection([{ material: m, region }], m, 'mm');
const SI: LoadUnits = { length: 'mm', force: 'kN', stress: 'MPa', momentLength: 'm' };

describe('unequal angle L6×4×1/2 under a moment about x (unsymmetric bending)', () => {
  // Vertical leg 0.5 × 6 on the left, horizontal leg 3.5 × 0.5 along the bottom, heel at the origin.
  const corners: [number, number][] = [[0, 0], [4, 0], [4, 0.5], [0.5, 0.5], [0.5, 6], [0, 6]];
  const L = contourFrom(corners.flat());
  const s = one([L]);
  const t = s.transformed;
  // Hand calculation, two rectangles (parallel-axis theorem).
  const xb = 75 / 76, yb = 151 / 76; // (0.75 + 3.9375)/4.75 and (9 + 0.4375)/4.75
  const Ix = (0.5 * 6 ** 3) / 12 + 3 * (3 - yb) ** 2 + (3.5 * 0.5 ** 3) / 12 + 1.75 * (0.25 - yb) ** 2;
  const Iy = (6 * 0.5 ** 3) / 12 + 3 * (0.25 - xb) ** 2 + (0.5 * 3.5 ** 3) / 12 + 1.75 * (2.25 - xb) ** 2;
  const Ixy = 3 * (0.25 - xb) * (3 - yb) + 1.75 * (2.25 - xb) * (0.25 - yb);

  it('section properties: hand calculation and the AISC table', () => {
    close(t.area, 4.75, 1e-14);
    close(t.centroid.x, xb, 1e-14);
    close(t.centroid.y, yb, 1e-14);
    close(t.Ix, Ix, 1e-13);
    close(t.Iy, Iy, 1e-13);
    close(t.Ixy, Ixy, 1e-13);
    // AISC Table 1-7, L6×4×1/2 (from memory), within 1 %.
    const within = (v: number, tab: number) => expect(Math.abs(v - tab) / tab).toBeLessThan(0.01);
    within(t.centroid.x, 0.987);
    within(t.centroid.y, 1.99);
    within(t.Ix, 17.4);
    within(t.Iy, 6.27);
    within(Math.sqrt(t.I2 / t.area), 0.87);
    within(Math.tan((t.theta * Math.PI) / 180), 0.44);
  });

  it('stresses at the six corners: general formula = principal-axis resolution (Hibbeler Sec. 6.5)', () => {
    const M = 100; // kip·in about +x
    const f = stressField(s, { Mx: M });
    // Principal-axis route: θp from tan 2θ = −2Ixy/(Ix − Iy), I_u = I1 about the u axis (at θp).
    const th = Math.atan2(-2 * Ixy, Ix - Iy) / 2;
    const avg = (Ix + Iy) / 2, R = Math.hypot((Ix - Iy) / 2, Ixy);
    const I1 = avg + R, I2 = avg - R;
    close(t.I1, I1, 1e-13);
    close(t.I2, I2, 1e-13);
    close((t.theta * Math.PI) / 180, th, 1e-13);
    const c = Math.cos(th), sn = Math.sin(th);
    const Mu = M * c, Mv = -M * sn; // moment vector (M, 0) in the principal frame
    const hand = corners.map(([x, y]) => {
      const u = (x - xb) * c + (y - yb) * sn, v = -(x - xb) * sn + (y - yb) * c;
      return (Mu * v) / I1 - (Mv * u) / I2;
    });
    corners.forEach(([x, y], k) => {
      const p = stressAt(f, x, y);
      expect(p.inside).toBe(true);
      close(p.stresses[0].value, hand[k], 1e-12, Math.max(...hand.map(Math.abs)));
    });
    // Extremes at corners (straight edges only), the largest of the hand values.
    const ext = stressExtremes(f);
    close(ext.maxTension!.value, Math.max(...hand), 1e-12);
    close(ext.maxCompression!.value, Math.min(...hand), 1e-12);
    const kt = hand.indexOf(Math.max(...hand)), kc = hand.indexOf(Math.min(...hand));
    expect([ext.maxTension!.x, ext.maxTension!.y]).toEqual(corners[kt]);
    expect([ext.maxCompression!.x, ext.maxCompression!.y]).toEqual(corners[kc]);
    // The top of the vertical leg is in tension (Mx > 0 stretches y > ȳ) and the toe of the
    // horizontal leg too: the product of inertia tilts the neutral axis (hand signs).
    expect(hand[4]).toBeGreaterThan(0);
    // Neutral axis: through the centroid, at θp + atan((I1/I2) · Mv/Mu) in the document frame
    // (Hibbeler eq. 6-19, tan α = (Iz/Iy) tan θ, in the principal frame).
    const na = neutralAxis(f)!;
    close(na.point.x, xb, 1e-13);
    close(na.point.y, yb, 1e-13);
    const want = th + Math.atan((I1 / I2) * (Mv / Mu));
    const got = Math.atan2(na.direction.y, na.direction.x);
    const d = Math.abs(Math.sin(got - want)); // same line, either direction
    expect(d).toBeLessThan(1e-12);
    // Not horizontal: a moment about x does not bend an angle about x.
    expect(Math.abs(na.direction.y)).toBeGreaterThan(0.1);
  });

  it('shear: the Ixy caution, and VQ/(Ib) against the value with Ixy', () => {
    const r = shearAtCut(s, 'y', yb, 10);
    expect(r.cautions).toContain(SHEAR_ROTATED_CAUTION);
    // At the centroidal cut: b = 0.5 (the vertical leg), Q = first moment of the part above.
    close(r.width, 0.5, 1e-14);
    const Qhand = 0.5 * (6 - yb) * ((6 - yb) / 2); // rectangle 0.5 × (6 − ȳ) above the axis
    close(r.Q, Qhand, 1e-13);
    close(r.tau!, (10 * Qhand) / (Ix * 0.5), 1e-13);
    // Ixy term: Qy of the same part about the centroidal y axis: area × (0.25 − x̄).
    const Qy = 0.5 * (6 - yb) * (0.25 - xb);
    close(r.Qother, Qy, 1e-13);
    close(r.tauUnsymmetric!, (10 * (Iy * Qhand - Ixy * Qy)) / ((Ix * Iy - Ixy * Ixy) * 0.5), 1e-13);
  });
});

describe('neutral axis under pure bending passes through the centroid (fast-check)', () => {
  it('for any moment on any star section, with a second material', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 5, max: 10, noNaN: true }), { minLength: 5, maxLength: 9 }),
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (radii, Mx, My, ratio) => {
          fc.pre(Math.hypot(Mx, My) > 1e-6);
          const xy: number[] = [];
          radii.forEach((r, i) => xy.push(30 + r * Math.cos((2 * Math.PI * i) / radii.length), -20 + r * Math.sin((2 * Math.PI * i) / radii.length)));
          const bar: Material = { id: 'bar', name: 'Bar', E: 210000 * ratio, density: 2700, fy: 250 };
          const s = mixedSection(
            [
              { material: steel, region: [contourFrom(xy), reverseContour(circle(30, -20, 2))] },
              { material: bar, region: [circle(30, -20, 2)] },
            ],
            steel,
            'mm',
          );
          const f = stressField(s, { Mx, My });
          const na = neutralAxis(f)!;
          const c = s.transformed.centroid;
          expect(Math.hypot(na.point.x - c.x, na.point.y - c.y)).toBeLessThan(1e-12 * 40);
          // σ vanishes on the axis and the tension side lies to the left of its direction.
          for (const k of [-5, 3, 11]) expect(Math.abs(stressValue(f, 1, na.point.x + k * na.direction.x, na.point.y + k * na.direction.y))).toBeLessThan(1e-9 * Math.hypot(Mx, My));
          expect(stressValue(f, 1, na.point.x - na.direction.y, na.point.y + na.direction.x)).toBeGreaterThan(0);
          // Equilibrium: ∫σ dA = N = 0, exactly for a field linear about the transformed centroid.
          const e = stressExtremes(f);
          expect(e.maxTension!.value).toBeGreaterThan(0);
          expect(e.maxCompression!.value).toBeLessThan(0);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('rotation invariance of the stress field (fast-check, exact identity)', () => {
  it('turning the section and the moment vector together turns the stresses with them', () => {
    // A steel angle and an aluminium bar beside it.
    const base: Region = [contourFrom([0, 0, 150, 0, 150, 12, 12, 12, 12, 90, 0, 90]), circle(60, 40, 10)];
    const parts = (r: Region): MaterialPart[] => [
      { material: steel, region: [r[0]] },
      { material: { id: 'al', name: 'Al', E: 70000, density: 2700, fy: 250 }, region: [r[1]] },
    ];
    fc.assert(
      fc.property(
        fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        (th, Mx, My, N) => {
          const s0 = mixedSection(parts(base), steel, 'mm');
          const s1 = mixedSection(parts(rotateRegion(base, th)), steel, 'mm');
          const c = Math.cos(th), sn = Math.sin(th);
          const f0 = stressField(s0, { N, Mx, My }, SI);
          const f1 = stressField(s1, { N, Mx: c * Mx - sn * My, My: sn * Mx + c * My }, SI);
          const scale = Math.abs(N) / s0.transformed.area + (Math.hypot(Mx, My) * 1000 * 100) / s0.transformed.I2 + 1e-12;
          for (const [x, y] of [[0, 0], [150, 12], [12, 90], [60, 50], [55, 35]]) {
            const a = stressAt(f0, x, y), b = stressAt(f1, c * x - sn * y, sn * x + c * y);
            expect(b.stresses.map((q) => q.material)).toEqual(a.stresses.map((q) => q.material));
            a.stresses.forEach((q, k) => expect(Math.abs(b.stresses[k].value - q.value)).toBeLessThan(1e-10 * scale));
          }
          const e0 = stressExtremes(f0), e1 = stressExtremes(f1);
          expect(Math.abs((e1.maxTension?.value ?? 0) - (e0.maxTension?.value ?? 0))).toBeLessThan(1e-10 * scale);
          expect(Math.abs((e1.maxCompression?.value ?? 0) - (e0.maxCompression?.value ?? 0))).toBeLessThan(1e-10 * scale);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('flexure formula: rectangle and circle, with units', () => {
  it('rectangle 100 × 200 mm under N, Mx and My (kN, kN·m, MPa)', () => {
    // Gere & Goodno, flexure formula with S = bh²/6; axial stress N/A. Mx = 10 kN·m:
    // σ = 10e6 N·mm / (100 · 200² / 6 mm³) = 15 MPa at the top (tension, Mx > 0), −15 at the bottom.
    const s = one([rect(0, 0, 100, 200)]);
    const f = stressField(s, { N: 50, Mx: 10, My: 2 }, SI);
    const sN = 50e3 / 20000, sx = 10e6 / ((100 * 200 * 200) / 6), sy = 2e6 / ((200 * 100 * 100) / 6);
    close(sx, 15, 1e-14);
    // My > 0 stretches the left fibres (x < x̄): the top-left corner has the largest tension.
    const ext = stressExtremes(f);
    close(ext.maxTension!.value, sN + sx + sy, 1e-13);
    expect([ext.maxTension!.x, ext.maxTension!.y]).toEqual([0, 200]);
    close(ext.maxCompression!.value, sN - sx - sy, 1e-13);
    expect([ext.maxCompression!.x, ext.maxCompression!.y]).toEqual([100, 0]);
    close(stressAt(f, 50, 100).stresses[0].value, sN, 1e-13);
    // Same case in lbf, in and psi: 1 psi = 6894.757293168361 Pa (NIST SP 811).
    const k = 1 / 25.4;
    const sUS = mixedSection([{ material: steel, region: [rect(0, 0, 100 * k, 200 * k)] }], steel, 'in');
    const lbf = 4.4482216152605;
    const fUS = stressField(sUS, { N: 50e3 / lbf, Mx: 10e6 / lbf / 25.4, My: 2e6 / lbf / 25.4 }, { length: 'in', force: 'lbf', stress: 'MPa' });
    close(stressExtremes(fUS).maxTension!.value, sN + sx + sy, 1e-13);
  });

  it('circle: the extremes lie inside arcs, where the gradient is normal to the boundary', () => {
    // Gere & Goodno, S = πr³/4 for a circle: σmax = |M| / S at the point along the gradient.
    const r = 25, cx = 40, cy = -10;
    const s = one([circle(cx, cy, r)]);
    const Mx = 3, My = -4; // kN·m; |M| = 5
    const f = stressField(s, { Mx, My }, SI);
    const ext = stressExtremes(f);
    const smax = (5e6 * 4) / (Math.PI * r ** 3);
    close(ext.maxTension!.value, smax, 1e-13);
    close(ext.maxCompression!.value, -smax, 1e-13);
    // Gradient of σ: (−My, Mx)/I ∝ (4, 3): the tension peak at centre + r (0.8, 0.6).
    expect(Math.hypot(ext.maxTension!.x - (cx + 0.8 * r), ext.maxTension!.y - (cy + 0.6 * r))).toBeLessThan(1e-12 * r);
  });
});

describe('two materials: the wood beam with a steel plate (Gere & Goodno, Example 6-1)', () => {
  const wood: Material = { id: 'wood', name: 'Wood', E: 1500, density: 500, fy: 6 };
  const st: Material = { id: 'steel', name: 'Steel', E: 30000, density: 7850, fy: 36 };
  const parts: MaterialPart[] = [
    { material: wood, region: [rect(0, 0.5, 4, 6)] },
    { material: st, region: [rect(0, 0, 4, 0.5)] },
  ];
  const US: LoadUnits = { length: 'in', force: 'kip', stress: 'ksi' };
  // Hand values, ksi (see tests/materials-composite.test.ts): I = 231.2708333 in⁴ (wood units).
  const I = 72 + 24 * 2.03125 ** 2 + 20 * ((4 * 0.125) / 12 + 2 * 1.21875 ** 2);
  const M = -60; // Gere's positive moment compresses the top

  it('stresses in both materials, the same whichever is the reference', () => {
    for (const ref of [wood, st]) {
      const s = mixedSection(parts, ref, 'in');
      const f = stressField(s, { Mx: M }, US);
      close(stressAt(f, 2, 6.5).stresses[0].value, (M * 5.03125) / I, 1e-13); // −1.31 ksi
      const joint = stressAt(f, 1, 0.5);
      expect(joint.stresses.map((q) => q.material)).toEqual(['wood', 'steel']);
      close(joint.stresses[0].value, (M * -0.96875) / I, 1e-13); // 0.251 ksi
      close(joint.stresses[1].value, (20 * M * -0.96875) / I, 1e-13); // 5.03 ksi
      close(stressAt(f, 4, 0).stresses[0].value, (20 * M * -1.46875) / I, 1e-13); // 7.62 ksi
      const ext = stressExtremes(f);
      expect(ext.maxTension!.material).toBe('steel');
      expect(ext.maxTension!.y).toBe(0);
      expect(ext.maxCompression!.material).toBe('wood');
      expect(ext.maxCompression!.y).toBe(6.5);
      // Per material: the wood's least stress is at its bottom face (tension 0.251 ksi).
      const w = ext.byMaterial.find((e) => e.material === 'wood')!;
      close(w.max.value, (M * -0.96875) / I, 1e-13);
      // Horizontal neutral axis through the transformed centroid; tension (bottom) to its left.
      const na = neutralAxis(f)!;
      close(na.point.y, 1.46875, 1e-14);
      expect(na.direction.x).toBe(-1);
    }
  });

  it('shear at the neutral axis and in the plate: V Q / (I b) with transformed Q and actual b', () => {
    // Hand calculation: at y = ȳ, Q = 4 · 5.03125 · 5.03125/2 = 50.627 in³ (wood above the axis);
    // at y = 0.25 (inside the plate), Q = −(20 · 4 · 0.25) · (0.125 − 1.46875) = 26.875 in³.
    const s = mixedSection(parts, wood, 'in');
    const V = 10;
    const a = shearAtCut(s, 'y', 1.46875, V, US);
    close(a.Q, (4 * 5.03125 ** 2) / 2, 1e-13);
    close(a.tau!, (V * a.Q) / (I * 4), 1e-13);
    close(a.tau!, a.tauUnsymmetric!, 1e-13);
    expect(a.cautions).not.toContain(SHEAR_ROTATED_CAUTION);
    const b = shearAtCut(s, 'y', 0.25, V, US);
    close(b.Q, 26.875, 1e-13);
    close(b.tau!, (V * 26.875) / (I * 4), 1e-13);
    expect(shearAtCut(s, 'y', 7, V, US).tau).toBeNull();
  });

  it('stress JSON: the CLI shape, with the cautions', () => {
    const s = mixedSection(parts, wood, 'in');
    const f = stressField(s, { Mx: -600 }, US); // 10 × Gere's moment: the steel passes fy = 36 ksi
    const j = stressJson(s, f, [[2, 0.5], [9, 9]]);
    expect(Object.keys(j.max_tension!).sort()).toEqual(['material', 'value', 'x', 'y']);
    expect(j.max_tension!.material).toBe('steel');
    expect(j.neutral_axis).toEqual({ point: { x: 2, y: 1.46875 }, direction: { x: -1, y: 0 } });
    expect(j.at[0].stresses.length).toBe(2);
    expect(j.at[1]).toEqual({ x: 9, y: 9, inside: false, stresses: [] });
    expect(j.units).toEqual({ stress: 'ksi', force: 'kip', moment: 'kip·in' });
    expect(j.sign_convention).toBe(SIGN_CONVENTION);
    expect(j.cautions[0]).toBe(STRESS_CAUTION);
    expect(j.cautions).toContain(TRANSFORMED_CAUTION);
    expect(j.cautions).not.toContain(ROTATED_AXES_CAUTION);
    expect(j.cautions.some((c) => /In Steel the stress reaches 76\.2\d* ksi, beyond fy = 36 ksi/.test(c))).toBe(true);
    expect(j.cautions[j.cautions.length - 1]).toBe(CODE_DEFERRAL);
    expect(JSON.parse(JSON.stringify(j))).toEqual(j);
    // No load: no neutral axis, no extremes of either sign.
    const z = stressJson(s, stressField(s, {}, US));
    expect(z.neutral_axis).toBeNull();
    expect(z.max_tension).toBeNull();
    expect(z.max_compression).toBeNull();
  });
});

describe('shear formula, single material (Gere & Goodno, Sec. 5.8 and 5.9)', () => {
  it('rectangle: 3V/(2A) at the neutral axis, both cut directions; circle: 4V/(3A)', () => {
    const s = one([rect(-10, 5, 60, 140)]);
    close(shearAtCut(s, 'y', 75, 12, SI).tau!, (1.5 * 12e3) / 8400, 1e-13);
    close(shearAtCut(s, 'x', 20, 12, SI).tau!, (1.5 * 12e3) / 8400, 1e-13);
    const c = one([circle(3, 4, 30)]);
    close(shearAtCut(c, 'y', 4, 5, SI).tau!, (4 * 5e3) / (3 * Math.PI * 900), 1e-13);
  });
});

describe('points on edges and corners, and bad input', () => {
  it('a point typed on an edge, a corner or an arc counts as on the section', () => {
    const s = one([circle(0, 0, 10), reverseContour(circle(0, 0, 6))]);
    const f = stressField(s, { Mx: 1 });
    for (const [x, y] of [[10, 0], [0, -10], [6, 0], [Math.SQRT1_2 * 10, Math.SQRT1_2 * 10], [8, 0]]) expect(stressAt(f, x, y).inside).toBe(true);
    for (const [x, y] of [[0, 0], [10.001, 0], [5.99, 0]]) expect(stressAt(f, x, y).inside).toBe(false);
    expect(() => stressAt(f, NaN, 0)).toThrow(/finite/);
    expect(() => stressField(s, { Mx: Infinity })).toThrow(/Mx must be a finite number/);
  });
});

describe('colour-map data', () => {
  it('gradients span each material\'s extremes along the stress gradient; grid samples match the field', () => {
    const al: Material = { id: 'al', name: 'Al', E: 70000, density: 2700, fy: 250 };
    const s = mixedSection(
      [
        { material: steel, region: [rect(0, 0, 100, 20)] },
        { material: al, region: [circle(50, 60, 40)] },
      ],
      steel,
      'mm',
    );
    const f = stressField(s, { N: -20, Mx: 3, My: 1 }, SI);
    const ext = stressExtremes(f);
    const grads = stressGradients(f, ext);
    expect(grads.map((g) => g.material)).toEqual(['steel', 'al']);
    for (const g of grads) {
      const n = f.parts.find((p) => p.material.id === g.material)!.n;
      const e = ext.byMaterial.find((q) => q.material === g.material)!;
      close(stressValue(f, n, g.from.x, g.from.y), e.min.value, 1e-12, Math.abs(e.max.value));
      close(stressValue(f, n, g.to.x, g.to.y), e.max.value, 1e-12, Math.abs(e.max.value));
      expect(g.uniform).toBe(false);
    }
    const grid = sampleStressGrid(f, 80, 80);
    let inside = 0, inDisc = 0;
    for (let j = 0; j < grid.ny; j++) {
      for (let i = 0; i < grid.nx; i++) {
        const k = grid.part[j * grid.nx + i];
        if (k < 0) {
          expect(Number.isNaN(grid.values[j * grid.nx + i])).toBe(true);
          continue;
        }
        inside++;
        if (k === 1) inDisc++;
        const x = grid.x0 + i * grid.dx, y = grid.y0 + j * grid.dy;
        expect(grid.values[j * grid.nx + i]).toBe(stressValue(f, f.parts[k].n, x, y));
        if ((i + j) % 7 === 0) expect(stressAt(f, x, y).stresses.map((q) => q.material)).toContain(f.parts[k].material.id);
      }
    }
    // Cell counts estimate the areas (midpoint rule): 100·20 + π·40² over cells of dx·dy.
    const cell = grid.dx * grid.dy;
    expect(Math.abs(inDisc * cell - Math.PI * 1600) / (Math.PI * 1600)).toBeLessThan(0.02);
    expect(Math.abs(inside * cell - (2000 + Math.PI * 1600)) / (2000 + Math.PI * 1600)).toBeLessThan(0.02);
    // Uniform stress (axial only): one colour per material.
    expect(stressGradients(stressField(s, { N: 5 }, SI), stressExtremes(stressField(s, { N: 5 }, SI))).every((g) => g.uniform)).toBe(true);
  });
});

afterAll(() => {
  console.log(`materials-stress: largest relative error ${worst.value.toExponential(2)}`);
});
