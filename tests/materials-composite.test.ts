/**
 * Sections of several materials: composition by document order, centre of gravity, mass per
 * length, the transformed section, stiffness shares and moduli, the plastic moment, and the
 * identity with today's numbers for one material.
 *
 * Sources:
 * - Gere & Goodno, Mechanics of Materials, composite beams (Sec. 6.2, and 6.3 for the
 *   transformed-section method), Example 6-1: a wood beam 4.0 in × 6.0 in on a steel plate
 *   4.0 in × 0.5 in, M = 60 k-in, E_wood = 1500 ksi, E_steel = 30 000 ksi. The published answers
 *   are recalled from memory (3 significant figures): h1 = 5.031 in, I1 = 171.0 in⁴,
 *   I2 = 3.012 in⁴, σ_wood,top = −1310 psi, σ_wood,bottom = 251 psi, σ_steel,top = 5030 psi,
 *   σ_steel,bottom = 7620 psi. They are checked to their printed precision, and the hand
 *   calculation written out below is checked to round-off.
 * - Hibbeler, Statics, composite bodies (centre of gravity as Σ w x̄ / Σ w): the centre of gravity
 *   of two materials by hand.
 * - EN 10058 flat bars (mass per metre at 7850 kg/m³, from memory): 100 × 10 flat = 7.85 kg/m.
 * - Gere & Goodno, Sec. 6.10 (plastic moment of a rectangle, Mp = fy b h²/4) and the composite
 *   plastic moment by equal forces above and below the axis (EN 1994-1-1, §6.2.1.2, from memory),
 *   worked by hand for a steel plate on timber.
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { circle, close, rect, worst } from './helpers';
import { contourFrom, reverseContour, rotateRegion, translateRegion, type Region } from '../src/geometry/contour';
import { regionMoments } from '../src/moments/kernel';
import { booleanRegions } from '../src/boolean';
import { evaluateDocument } from '../src/evaluate';
import { DEMO_DOCUMENT } from '../src/document/demo';
import { fiftyShapeDocument } from '../bench/doc50';
import { shapeToRegion } from '../src';
import type { SectionDocument } from '../src/document/types';
import { composeMaterials, createMaterialComposer, type MaterialLayer } from '../src/materials/compose';
import { mixedSection, partsFromRegions, type MaterialPart } from '../src/materials/mixed';
import { compositePlastic } from '../src/materials/plastic';
import type { Material } from '../src/materials/material';
import { mixedPropsJson } from '../src/materials/json';
import { sectionKern } from '../src/kern/kern';
import { CODE_DEFERRAL, TRANSFORMED_CAUTION } from '../src/materials/cautions';

const wood: Material = { id: 'wood', name: 'Wood', E: 1500, density: 500, fy: 6 }; // ksi (Gere Ex. 6-1)
const steelUS: Material = { id: 'steel', name: 'Steel', E: 30000, density: 7850, fy: 36 }; // ksi

const areaOf = (r: Region) => regionMoments(r).m00;

describe('steel plate under a wood beam (Gere & Goodno, Example 6-1)', () => {
  // Units: in, ksi. Wood 4 × 6 from y = 0.5 to 6.5; steel plate 4 × 0.5 from y = 0 to 0.5.
  const parts: MaterialPart[] = [
    { material: wood, region: [rect(0, 0.5, 4, 6)] },
    { material: steelUS, region: [rect(0, 0, 4, 0.5)] },
  ];
  const s = mixedSection(parts, wood, 'in');

  it('neutral axis and moments of inertia', () => {
    // Hand calculation (transformed to wood, n = 30000/1500 = 20): wood A = 24 at ȳ = 3.5, steel
    // transformed A = 20 · 2 = 40 at ȳ = 0.25: ȳ_t = (84 + 10)/64 = 1.46875 in from the bottom.
    close(s.transformed.area, 64, 1e-14);
    close(s.transformed.centroid.y, 94 / 64, 1e-14);
    close(s.transformed.centroid.x, 2, 1e-14);
    // h1 = 6.5 − 1.46875 = 5.03125 (Gere: h1 = 5.031 in, from memory).
    expect(Math.abs(6.5 - s.transformed.centroid.y - 5.031)).toBeLessThan(0.0005);
    // I1 (wood about the NA) = 4·6³/12 + 24·2.03125² = 72 + 99.0234375 = 171.0234375;
    // I2 (steel about the NA) = 4·0.5³/12 + 2·1.21875² = 0.0416667 + 2.9707031 = 3.0123698.
    const I1 = 72 + 24 * 2.03125 ** 2, I2 = (4 * 0.125) / 12 + 2 * 1.21875 ** 2;
    expect(Math.abs(I1 - 171.0)).toBeLessThan(0.05); // Gere: I1 = 171.0 in⁴ (from memory)
    expect(Math.abs(I2 - 3.012)).toBeLessThan(0.0005); // Gere: I2 = 3.012 in⁴ (from memory)
    // Transformed I = I1 + n I2 = 231.2708333 in⁴ (wood units).
    close(s.transformed.Ix, I1 + 20 * I2, 1e-14);
    close(s.transformed.Ixy, 0, 1e-13, s.transformed.Ix);
    // Stiffness shares: wood I1/I, steel n I2/I.
    const [w, st] = s.parts;
    close(w.stiffnessShare.x, I1 / (I1 + 20 * I2), 1e-14);
    close(st.stiffnessShare.x, (20 * I2) / (I1 + 20 * I2), 1e-14);
    close(w.stiffnessShare.x + st.stiffnessShare.x, 1, 1e-15);
  });

  it('stresses from the composite formula σ_i = −M y E_i / (E1 I1 + E2 I2)', () => {
    // Gere's M = +60 k-in compresses the top: in Kern's convention (Mx > 0 stretches the top) that
    // is Mx = −60 k-in. E1 I1 + E2 I2 = 1500 · 171.0234 + 30000 · 3.01237 = 346 907.2 k-in².
    const I1 = 72 + 24 * 2.03125 ** 2, I2 = (4 * 0.125) / 12 + 2 * 1.21875 ** 2;
    const EI = 1500 * I1 + 30000 * I2;
    const M = 60;
    const hand = {
      woodTop: (-M * 5.03125 * 1500) / EI, // −1.3053 ksi
      woodBottom: (M * 0.96875 * 1500) / EI, // 0.25133 ksi
      steelTop: (M * 0.96875 * 30000) / EI, // 5.0266 ksi
      steelBottom: (M * 1.46875 * 30000) / EI, // 7.6209 ksi
    };
    // Published, 3 significant figures (Gere & Goodno, Example 6-1, from memory), in psi.
    expect(Math.abs(hand.woodTop * 1000 - -1310)).toBeLessThan(5);
    expect(Math.abs(hand.woodBottom * 1000 - 251)).toBeLessThan(0.5);
    expect(Math.abs(hand.steelTop * 1000 - 5030)).toBeLessThan(5);
    expect(Math.abs(hand.steelBottom * 1000 - 7620)).toBeLessThan(5);
    // Kern's fibre moduli: |σ| = |M| / S at each material's extreme fibres.
    const [w, st] = s.parts;
    close(M / w.moduli.Sx_top!, -hand.woodTop, 1e-13);
    close(M / w.moduli.Sx_bottom!, hand.woodBottom, 1e-13);
    close(M / st.moduli.Sx_bottom!, hand.steelBottom, 1e-13);
    // The steel plate lies wholly below the neutral axis: it has no fibre above it, so no top
    // modulus; its top face (0.96875 below the axis) is checked through the stress field
    // (tests/materials-stress.test.ts).
    expect(st.moduli.Sx_top).toBeNull();
    close(st.fibres.top, -0.96875, 1e-14);
    close((M * 20 * -st.fibres.top) / s.transformed.Ix, hand.steelTop, 1e-13);
  });
});

describe('centre of gravity and mass per length', () => {
  // A timber joist 100 × 200 mm (C24, 420 kg/m³) on a steel flat 100 × 10 mm (7850 kg/m³).
  const timber: Material = { id: 'c24', name: 'Softwood C24', E: 11000, density: 420, fy: 24 };
  const steel: Material = { id: 's355', name: 'Steel S355', E: 210000, density: 7850, fy: 355 };
  const parts: MaterialPart[] = [
    { material: timber, region: [rect(0, 0, 100, 200)] },
    { material: steel, region: [rect(0, -10, 100, 10)] },
  ];

  it('differs from the area centroid, as Σ ρ A ȳ / Σ ρ A', () => {
    // Hibbeler, Statics, composite bodies: ȳ_G = Σ ρ_i A_i ȳ_i / Σ ρ_i A_i (hand calculation):
    // (420 · 20000 · 100 + 7850 · 1000 · (−5)) / (420 · 20000 + 7850 · 1000)
    //   = 800 750 000 / 16 250 000 = 49.276923 mm; the area centroid is (2 000 000 − 5 000)/21 000 = 95 mm.
    const s = mixedSection(parts, steel, 'mm');
    close(s.cg!.y, 800750000 / 16250000, 1e-14);
    close(s.cg!.x, 50, 1e-14);
    close(s.centroid.y, 95, 1e-14);
    close(s.area, 21000, 1e-14);
    // Mass per length: 420 · 0.02 + 7850 · 0.001 = 8.4 + 7.85 = 16.25 kg/m.
    close(s.massPerLength, 16.25, 1e-14);
    close(s.parts[1].massPerLength, 7.85, 1e-14); // EN 10058: 100 × 10 flat, 7.85 kg/m (from memory)
  });

  it('mass per length is the same in every document unit', () => {
    // 1 in = 25.4 mm, 1 ft = 304.8 mm, 1 cm = 10 mm, 1 m = 1000 mm exactly.
    for (const [u, k] of [['cm', 0.1], ['m', 0.001], ['in', 1 / 25.4], ['ft', 1 / 304.8]] as const) {
      const scaled = parts.map((p) => ({ material: p.material, region: p.region.map((c) => ({ xy: c.xy.map((v) => v * k), bulge: c.bulge })) }));
      const s = mixedSection(scaled, steel, u);
      close(s.massPerLength, 16.25, 1e-13);
      close(s.cg!.y, (800750000 / 16250000) * k, 1e-13);
    }
  });

  it('is null when every density is zero, and a zero-density part is left out of it', () => {
    const weightless = parts.map((p) => ({ ...p, material: { ...p.material, density: 0 } }));
    expect(mixedSection(weightless, steel, 'mm').cg).toBeNull();
    const s = mixedSection([parts[0], { ...parts[1], material: { ...steel, density: 0 } }], steel, 'mm');
    close(s.cg!.y, 100, 1e-14);
  });
});

describe('composition by document order (the overlap rule)', () => {
  const T = 'timber', S = 'steel';

  it('a later steel shape replaces the earlier timber where they overlap', () => {
    // Timber 100 × 200; a steel insert 20 × 100 inside it; a steel plate 50 × 20 half outside.
    // Hand calculation: steel = 2000 + 1000, timber = 20000 − 2000 − 20·20, union = 20000 + 30·20.
    const layers: MaterialLayer[] = [
      { region: [rect(0, 0, 100, 200)], op: 'add', material: T },
      { region: [rect(40, 50, 20, 100)], op: 'add', material: S },
      { region: [rect(80, 150, 50, 20)], op: 'add', material: S },
    ];
    const out = composeMaterials(layers);
    expect(out.map((r) => r.material)).toEqual([T, S]);
    close(areaOf(out[0].region), 20000 - 2000 - 400, 1e-13);
    close(areaOf(out[1].region), 3000, 1e-13);
  });

  it('the earlier steel loses to a later timber; subtract removes all; intersect keeps the common part', () => {
    const steelFirst: MaterialLayer[] = [
      { region: [rect(40, 50, 20, 100)], op: 'add', material: S },
      { region: [rect(0, 0, 100, 200)], op: 'add', material: T },
    ];
    const a = composeMaterials(steelFirst);
    expect(a.map((r) => r.material)).toEqual([T]);
    close(areaOf(a[0].region), 20000, 1e-13);
    // Steel plate on timber, then a hole of radius 10 through the joint at (50, 0), then a keep-box.
    const layers: MaterialLayer[] = [
      { region: [rect(0, 0, 100, 200)], op: 'add', material: T },
      { region: [rect(0, -10, 100, 10)], op: 'add', material: S },
      { region: [circle(50, 0, 5)], op: 'subtract', material: S },
      { region: [rect(-5, -20, 60, 300)], op: 'intersect', material: T },
    ];
    const out = composeMaterials(layers);
    // Half discs of πr²/2 leave each material; the box keeps x ≤ 55 of both (half-disc halves: the
    // hole is centred at x = 50, wholly inside x ≤ 55).
    close(areaOf(out.find((r) => r.material === T)!.region), 55 * 200 - (Math.PI * 25) / 2, 1e-12);
    close(areaOf(out.find((r) => r.material === S)!.region), 55 * 10 - (Math.PI * 25) / 2, 1e-12);
    // The union of the material regions is the evaluator's region (same area).
    const doc: SectionDocument = {
      format: 'kern-section',
      version: 2,
      units: 'mm',
      shapes: [
        { id: 'a', type: 'rectangle', at: [0, 0], width: 100, height: 200 },
        { id: 'b', type: 'rectangle', at: [0, -10], width: 100, height: 10 },
        { id: 'c', type: 'circle', center: [50, 0], radius: 5, op: 'subtract' },
        { id: 'd', type: 'rectangle', at: [-5, -20], width: 60, height: 300, op: 'intersect' },
      ],
    };
    const ev = evaluateDocument(doc);
    close(areaOf(out[0].region) + areaOf(out[1].region), ev.props!.area, 1e-13);
  });

  it('equals the layer-by-layer rule, written out literally (fast-check)', () => {
    // The rule of the issue, applied one layer at a time to every material region (no pieces, no
    // caches): the composer's pieces must give the same areas and centroids.
    const literal = (layers: MaterialLayer[]) => {
      const state = new Map<string, Region>();
      for (const l of layers) {
        for (const [id, r] of state) {
          if (r.length === 0) continue;
          if (l.op === 'intersect') state.set(id, booleanRegions(r, [l.region], 'intersection'));
          else if (l.op === 'subtract' || id !== l.material) state.set(id, booleanRegions(r, [l.region], 'difference'));
        }
        if (l.op === 'add') {
          const r = state.get(l.material) ?? [];
          state.set(l.material, r.length ? booleanRegions(r, [l.region], 'union') : l.region);
        }
      }
      return state;
    };
    const layerArb = fc.record({
      x: fc.integer({ min: 0, max: 40 }),
      y: fc.integer({ min: 0, max: 40 }),
      w: fc.integer({ min: 3, max: 30 }),
      round: fc.boolean(),
      op: fc.constantFrom<MaterialLayer['op']>('add', 'add', 'add', 'subtract', 'intersect'),
      material: fc.constantFrom('a', 'b', 'c'),
    });
    fc.assert(
      fc.property(fc.array(layerArb, { minLength: 1, maxLength: 7 }), (spec) => {
        const layers: MaterialLayer[] = spec.map((l) => ({
          region: l.op === 'intersect' ? [rect(l.x - 20, l.y - 20, l.w + 40, l.w + 30)] : l.round ? [circle(l.x, l.y, l.w / 2)] : [rect(l.x, l.y, l.w, (l.w * 2) / 3)],
          op: l.op,
          material: l.material,
        }));
        const want = literal(layers);
        const got = composeMaterials(layers);
        for (const [id, r] of want) {
          const a = r.length ? regionMoments(r) : null;
          const g = got.find((q) => q.material === id);
          if (!a || a.m00 < 1e-9) {
            expect(g ? areaOf(g.region) : 0).toBeLessThan(1e-9);
            continue;
          }
          expect(g).toBeDefined();
          const m = regionMoments(g!.region);
          expect(Math.abs(m.m00 - a.m00)).toBeLessThan(1e-9 * 3600);
          expect(Math.abs(m.m10 - a.m10)).toBeLessThan(1e-9 * 3600 * 60);
          expect(Math.abs(m.m01 - a.m01)).toBeLessThan(1e-9 * 3600 * 60);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('the drag cache gives the same regions as a fresh composition, and reuses unchanged ones', () => {
    const composer = createMaterialComposer();
    const base: MaterialLayer[] = [
      { region: [rect(0, 0, 100, 200)], op: 'add', material: T },
      { region: [rect(0, -10, 100, 10)], op: 'add', material: S },
      { region: [rect(30, 200, 40, 10)], op: 'add', material: S },
      { region: [circle(50, 100, 8)], op: 'subtract', material: S },
    ];
    const first = composer.compose(base);
    const again = composer.compose(base);
    expect(again[0].region).toBe(first[0].region);
    expect(again[1].region).toBe(first[1].region);
    // Drag the top plate step by step (into the timber), then the hole across the joint: each frame
    // equals a fresh composition.
    const frames: [number, number, number][] = [[2, 5, -5], [2, 12, -5], [2, 40, -5], [2, 75, -5], [2, -20, -5], [3, 0, -60], [3, 10, -95], [3, 20, -100], [3, 30, -100]];
    for (const [which, dx, dy] of frames) {
      const moved = base.map((l, k) => (k === which ? { ...l, region: translateRegion(l.region, dx, dy) } : l));
      const cached = composer.compose(moved);
      const fresh = composeMaterials(moved);
      expect(cached.map((r) => r.material)).toEqual(fresh.map((r) => r.material));
      cached.forEach((r, k) => close(areaOf(r.region), areaOf(fresh[k].region), 1e-12));
    }
  });
});

describe('one material gives exactly today\'s numbers', () => {
  const steel: Material = { id: 'steel', name: 'Steel', E: 210000, density: 7850, fy: 355 };

  it.each([
    ['the demo section', DEMO_DOCUMENT],
    ['the 50-shape benchmark section', fiftyShapeDocument()],
  ])('%s: bit for bit through the evaluator\'s region, to round-off through the composer\'s own booleans', (_name, doc) => {
    const ev = evaluateDocument(doc);
    const q = ev.props!;
    const layers: MaterialLayer[] = doc.shapes.map((sh) => ({ region: shapeToRegion(sh), op: sh.op ?? 'add', material: 'steel' }));
    const viaUnion = composeMaterials(layers, { union: ev.region });
    expect(viaUnion[0].region).toBe(ev.region);
    const s = mixedSection(partsFromRegions(viaUnion, [steel]), steel, doc.units);
    const t = s.transformed;
    // The same moments and the same arithmetic with n = 1: equal to the last bit.
    for (const [a, b] of [
      [t.area, q.area],
      [t.centroid.x, q.centroid.x],
      [t.centroid.y, q.centroid.y],
      [t.Ix, q.Ix],
      [t.Iy, q.Iy],
      [t.Ixy, q.Ixy],
      [t.I1, q.I1],
      [t.I2, q.I2],
      [t.theta, q.theta],
      [s.parts[0].moduli.Sx_top!, q.Sx_top],
      [s.parts[0].moduli.Sx_bottom!, q.Sx_bottom],
      [s.parts[0].moduli.Sy_left!, q.Sy_left],
      [s.parts[0].moduli.Sy_right!, q.Sy_right],
      [s.area, q.area],
    ]) {
      expect(a).toBe(b);
    }
    close(s.cg!.x, q.centroid.x, 1e-15);
    close(s.cg!.y, q.centroid.y, 1e-15);
    const pl = compositePlastic(partsFromRegions(viaUnion, [steel]));
    expect(pl.x.at).toBe(q.plasticAxis.y);
    expect(pl.y.at).toBe(q.plasticAxis.x);
    close(pl.x.Mp / steel.fy, q.Zx, 1e-15);
    close(pl.y.Mp / steel.fy, q.Zy, 1e-15);
    // Without the evaluator's region the composer unites its own pieces (another order of the
    // same booleans): the same section to round-off.
    const own = mixedSection(partsFromRegions(composeMaterials(layers), [steel]), steel, doc.units).transformed;
    const J = q.Ix + q.Iy;
    close(own.area, q.area, 1e-13);
    for (const k of ['Ix', 'Iy', 'Ixy', 'I1', 'I2'] as const) close(own[k], q[k], 1e-12, J);
  });
});

describe('plastic moment of two materials', () => {
  it('steel flat on timber: equal forces above and below the axis (hand calculation)', () => {
    // Timber 100 × 200 (fy = 24) on steel 100 × 10 (fy = 355), bending about a horizontal axis.
    // Forces: timber 24 · 20000 = 480 000, steel 355 · 1000 = 355 000; total 835 000, half 417 500.
    // The axis lies in the timber, at c above the steel: 24 · 100 · (200 − c) = 417 500 →
    // 200 − c = 173.958333, c = 26.041667 (y = 26.041667 with the joint at y = 0).
    // Mp = 24·100·(200 − c)²/2 + 24·100·c²/2 + 355·1000·(c + 5)
    //    = 36 315 104.2 + 813 802.1 + 355 000 · 31.041667 = 48 148 697.9 N·mm.
    const timber: Material = { id: 't', name: 'T', E: 11000, density: 420, fy: 24 };
    const steel: Material = { id: 's', name: 'S', E: 210000, density: 7850, fy: 355 };
    const pl = compositePlastic([
      { material: timber, region: [rect(0, 0, 100, 200)] },
      { material: steel, region: [rect(0, -10, 100, 10)] },
    ]);
    const up = 417500 / 2400, c = 200 - up;
    close(pl.x.at, c, 1e-13);
    close(pl.x.Mp, (2400 * up * up) / 2 + (2400 * c * c) / 2 + 355000 * (c + 5), 1e-13);
    // About the vertical axis both materials are symmetric about x = 50: Mp = Σ fy b² t / 4
    // (Gere & Goodno, Sec. 6.10: Mp = fy b h²/4 for a rectangle).
    close(pl.y.at, 50, 1e-13);
    close(pl.y.Mp, (24 * 100 * 100 * 200) / 4 + (355 * 100 * 100 * 10) / 4, 1e-13);
  });
});

describe('invariance of the transformed section (fast-check, exact identities)', () => {
  /** A star loop (as in tests/invariants.test.ts) around (cx, cy). */
  const star = (cx: number, cy: number, radii: number[], bulges: number[]) => {
    const xy: number[] = [], b: number[] = [];
    radii.forEach((r, i) => {
      const t = (2 * Math.PI * i) / radii.length;
      xy.push(cx + r * Math.cos(t), cy + r * Math.sin(t));
      b.push(bulges[i % bulges.length]);
    });
    return contourFrom(xy, b);
  };
  const arb = fc.record({
    radii: fc.array(fc.double({ min: 5, max: 10, noNaN: true }), { minLength: 5, maxLength: 9 }),
    bulges: fc.array(fc.double({ min: -0.2, max: 0.2, noNaN: true }), { minLength: 9, maxLength: 9 }),
    ratio: fc.double({ min: 0.05, max: 30, noNaN: true }),
    dx: fc.double({ min: -200, max: 200, noNaN: true }),
    dy: fc.double({ min: -200, max: 200, noNaN: true }),
    th: fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }),
  });

  it('translation moves the centroid and CG with it and keeps every moment; rotation keeps A, I1, I2 and Ix + Iy', () => {
    fc.assert(
      fc.property(arb, ({ radii, bulges, ratio, dx, dy, th }) => {
        // Material a: a star with a round hole; material b: a bar in the hole (no overlap).
        const a: Material = { id: 'a', name: 'A', E: 1000, density: 1000, fy: 10 };
        const b: Material = { id: 'b', name: 'B', E: 1000 * ratio, density: 5000, fy: 100 };
        const regA: Region = [star(0, 0, radii, bulges), reverseContour(circle(0, 0, 3))];
        const regB: Region = [circle(0.5, -0.4, 2)];
        const base = mixedSection([{ material: a, region: regA }, { material: b, region: regB }], a, 'mm');
        const move = (r: Region) => rotateRegion(translateRegion(r, dx, dy), th, dx, dy);
        const moved = mixedSection([{ material: a, region: move(regA) }, { material: b, region: move(regB) }], a, 'mm');
        const t0 = base.transformed, t1 = moved.transformed;
        const J = t0.Ix + t0.Iy;
        expect(Math.abs(t1.area - t0.area) / t0.area).toBeLessThan(1e-12);
        expect(Math.abs(t1.I1 - t0.I1) / J).toBeLessThan(1e-10);
        expect(Math.abs(t1.I2 - t0.I2) / J).toBeLessThan(1e-10);
        expect(Math.abs(t1.Ix + t1.Iy - J) / J).toBeLessThan(1e-10);
        expect(Math.abs(moved.massPerLength - base.massPerLength) / base.massPerLength).toBeLessThan(1e-12);
        // The centroid and the CG are carried by the rigid motion.
        const c = Math.cos(th), s = Math.sin(th);
        for (const [p, q] of [[t0.centroid, t1.centroid], [base.cg!, moved.cg!]]) {
          const x = c * p.x - s * p.y + dx, y = s * p.x + c * p.y + dy;
          expect(Math.hypot(q.x - x, q.y - y)).toBeLessThan(1e-10 * (10 + Math.hypot(dx, dy)));
        }
        // Stiffness shares are invariant under rotation in the sum Ix + Iy.
        const share = (m: typeof base) => (m.parts[1].stiffnessShare.x * m.transformed.Ix + m.parts[1].stiffnessShare.y * m.transformed.Iy) / (m.transformed.Ix + m.transformed.Iy);
        expect(Math.abs(share(moved) - share(base))).toBeLessThan(1e-10);
      }),
      { numRuns: 80 },
    );
  });
});

describe('props JSON for the CLI', () => {
  it('has the keys the CLI prints, with the kern of the transformed section', () => {
    // Timber 100 × 200 over a steel flat 100 × 10 (as above); the kern of a section whose hull is
    // its 100 × 210 bounding rectangle has four vertices, one per hull edge.
    const timber: Material = { id: 'c24', name: 'Softwood C24', E: 11000, density: 420, fy: 24 };
    const steel: Material = { id: 's355', name: 'Steel S355', E: 210000, density: 7850, fy: 355 };
    const parts: MaterialPart[] = [
      { material: timber, region: [rect(0, 0, 100, 200)] },
      { material: steel, region: [rect(0, -10, 100, 10)] },
    ];
    const s = mixedSection(parts, steel, 'mm');
    const kern = sectionKern(parts.flatMap((p) => p.region), s.transformed);
    const j = mixedPropsJson(s, { plastic: compositePlastic(parts), kern });
    expect(Object.keys(j).sort()).toEqual(['by_material', 'cautions', 'cg', 'kern', 'mass_per_length', 'plastic', 'transformed']);
    expect(Object.keys(j.transformed).sort()).toEqual(['E', 'I1', 'I2', 'Ix', 'Ixy', 'Iy', 'area', 'centroid', 'reference', 'theta']);
    expect(j.transformed.reference).toBe('s355');
    expect(Object.keys(j.by_material)).toEqual(['c24', 's355']);
    close(j.by_material.c24.area, 20000, 1e-15);
    expect(j.by_material.c24.centroid).toEqual({ x: 50, y: 100 });
    close(j.mass_per_length, 16.25, 1e-14);
    expect(j.kern!.length).toBe(4);
    // Transformed to steel, n = 11000/210000: hand calculation of the kern's vertical reach
    // e = I / (A c) for the top and bottom edges (Gere & Goodno, core of a section).
    const n = 11000 / 210000, A = 1000 + n * 20000, yb = (1000 * -5 + n * 20000 * 100) / A;
    const I = (100 * 1000) / 12 + 1000 * (yb + 5) ** 2 + n * ((100 * 200 ** 3) / 12 + 20000 * (100 - yb) ** 2);
    const ys = j.kern!.map((p) => p[1]);
    close(Math.min(...ys), yb - I / (A * (200 - yb)), 1e-13);
    close(Math.max(...ys), yb + I / (A * (yb + 10)), 1e-13);
    expect(j.cautions).toEqual([TRANSFORMED_CAUTION, CODE_DEFERRAL]);
    expect(JSON.parse(JSON.stringify(j))).toEqual(j);
  });
});

describe('bad input', () => {
  it('names the material and what is wrong', () => {
    const good: Material = { id: 'g', name: 'G', E: 1, density: 1, fy: 1 };
    expect(() => mixedSection([{ material: { ...good, E: 0 }, region: [rect(0, 0, 1, 1)] }], good, 'mm')).toThrow(/material "g".E: the modulus of elasticity must be .* greater than 0, got 0/);
    expect(() => mixedSection([{ material: good, region: [rect(0, 0, 1, 1)] }], { ...good, id: 'r', fy: NaN }, 'mm')).toThrow(/reference material "r".fy/);
    expect(() => mixedSection([], good, 'mm')).toThrow(/empty/);
    expect(() => mixedSection([{ material: good, region: [reverseContour(rect(0, 0, 1, 1))] }], good, 'mm')).toThrow(/negative area/);
    expect(() => partsFromRegions([{ material: 'x', region: [rect(0, 0, 1, 1)] }], [good])).toThrow(/unknown material "x"; known materials: "g"/);
  });
});

afterAll(() => {
  console.log(`materials-composite: largest relative error ${worst.value.toExponential(2)}`);
});
