/**
 * A document's materials and loads worked out (src/analysis/): the section stresses work on (one
 * material when the document has none), one load case in the document's units, the kern, the
 * plastic moments in the loads' moment unit, and the extra keys of `props --json`.
 *
 * Sources:
 * - Gere & Goodno, Mechanics of Materials, combined loadings (σ = N/A + Mx y/Ix − My x/Iy for a
 *   doubly symmetric section) and the flexure formula; the kern of a rectangle (b/6, h/6).
 * - Gere & Goodno, Sec. 6.10 (Mp = fy b h²/4) and the composite plastic moment by equal forces
 *   above and below the axis (EN 1994-1-1, §6.2.1.2, from memory), worked by hand.
 * - Hibbeler, Statics, composite bodies: centre of gravity Σ ρ A ȳ / Σ ρ A.
 */
import { afterAll, describe, expect, it } from 'vitest';
import {
  analyseLoadCase,
  axisAngle,
  DEMO_DOCUMENT,
  documentLoadUnits,
  evaluateDocument,
  kernOfSection,
  loadUnitTexts,
  plasticOfSection,
  sectionExtrasJson,
  sectionKern,
  stressSection,
  tensionSide,
  type SectionDocument,
  type Shape,
} from '../src';
import { close, worst } from './helpers';

const rect = (id: string, x: number, y: number, w: number, h: number, extra: Partial<Shape> = {}): Shape => ({ id, type: 'rectangle', at: [x, y], width: w, height: h, ...extra }) as Shape;
const plain = (shapes: Shape[], more: Partial<SectionDocument> = {}): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes, ...more });
const C24 = { id: 'c24', name: 'Softwood C24', E: 11000, density: 420, fy: 24 };
const S355 = { id: 's355', name: 'Steel S355', E: 210000, density: 7850, fy: 355 };

describe('the section stresses work on', () => {
  it('without materials is the whole section as one material, number for number', () => {
    const ev = evaluateDocument(DEMO_DOCUMENT);
    const s = stressSection(DEMO_DOCUMENT, ev);
    expect(s.oneMaterial).toBe(true);
    const t = s.section!.transformed, p = ev.props!;
    for (const [a, b] of [
      [t.area, p.area],
      [t.centroid.x, p.centroid.x],
      [t.centroid.y, p.centroid.y],
      [t.Ix, p.Ix],
      [t.Iy, p.Iy],
      [t.Ixy, p.Ixy],
      [t.I1, p.I1],
      [t.I2, p.I2],
      [t.theta, p.theta],
    ]) {
      expect(a).toBe(b);
    }
    // No density is claimed: no mass and no centre of gravity.
    expect(s.section!.cg).toBeNull();
    expect(s.section!.massPerLength).toBe(0);
  });

  it('with one material gives today\'s geometric numbers, and G on C', () => {
    const shapes = [rect('a', 0, 0, 100, 200), rect('b', 20, 40, 30, 30, { op: 'subtract' })];
    const bare = evaluateDocument(plain(shapes));
    const doc = plain(shapes, { materials: [S355], reference: 's355' });
    const ev = evaluateDocument(doc);
    expect(ev.props).toEqual(bare.props);
    const s = stressSection(doc, ev).section!;
    expect(s.transformed.Ix).toBe(bare.props!.Ix);
    close(s.cg!.x, bare.props!.centroid.x, 1e-15);
    close(s.cg!.y, bare.props!.centroid.y, 1e-15);
    close(s.massPerLength, 7850 * (20000 - 900) * 1e-6, 1e-14);
  });

  it('says why when a material cannot be used', () => {
    const doc = plain([rect('a', 0, 0, 10, 10, { material: 'c24' })], { materials: [C24], reference: 'nope' });
    const s = stressSection(doc, evaluateDocument(doc));
    expect(s.section).toBeNull();
    expect(s.message).toMatch(/reference material "nope"/);
  });
});

describe('one load case in the document\'s units', () => {
  it('rectangle 100 × 200 mm under N = 100 kN, Mx = 10 kN·m, My = 2 kN·m (Gere & Goodno, combined loadings)', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)], { momentLength: 'm', loads: { N: 100, Mx: 10, My: 2 } });
    const s = stressSection(doc, evaluateDocument(doc)).section!;
    const lc = analyseLoadCase(s, doc.loads, documentLoadUnits(doc));
    // A = 20000 mm², Ix = 100·200³/12, Iy = 200·100³/12; N/A = 5 MPa; Mx = 10e6 N·mm, My = 2e6 N·mm.
    const A = 20000, Ix = (100 * 200 ** 3) / 12, Iy = (200 * 100 ** 3) / 12;
    const sig = (x: number, y: number) => 100e3 / A + (10e6 * (y - 100)) / Ix - (2e6 * (x - 50)) / Iy;
    // Tension largest at the top left corner, compression at the bottom right (My > 0 stretches the left).
    close(lc.extremes.maxTension!.value, sig(0, 200), 1e-13);
    expect([lc.extremes.maxTension!.x, lc.extremes.maxTension!.y]).toEqual([0, 200]);
    close(lc.extremes.maxCompression!.value, sig(100, 0), 1e-13);
    close(lc.peak, Math.max(sig(0, 200), -sig(100, 0)), 1e-13);
    expect(lc.unloaded).toBe(false);
    expect(lc.shear).toBeNull();
    expect(loadUnitTexts(doc)).toEqual({ stress: 'MPa', force: 'kN', moment: 'kN·m' });
  });

  it('the neutral axis in words: tension above under Mx > 0, below under Mx < 0, left under My > 0', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)]);
    const s = stressSection(doc, evaluateDocument(doc)).section!;
    const u = documentLoadUnits(doc);
    const up = analyseLoadCase(s, { Mx: 1 }, u);
    expect(tensionSide(up)).toBe('above');
    expect(axisAngle(up.axis!.direction)).toBe(0);
    expect(tensionSide(analyseLoadCase(s, { Mx: -1 }, u))).toBe('below');
    const left = analyseLoadCase(s, { My: 1 }, u);
    expect(tensionSide(left)).toBe('to the left of');
    expect(axisAngle(left.axis!.direction)).toBe(90);
    expect(tensionSide(analyseLoadCase(s, { N: 5 }, u))).toBeNull();
    expect(analyseLoadCase(s, { N: 5 }, u).axis).toBeNull();
  });

  it('τ at a cut, with the shear cautions before the deferral to the code', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)]);
    const s = stressSection(doc, evaluateDocument(doc)).section!;
    const lc = analyseLoadCase(s, { V: 30 }, documentLoadUnits(doc), { axis: 'y', at: 100 });
    // 3V/(2A) at the neutral axis of a rectangle (Gere & Goodno, Sec. 5.8): 1.5 · 30e3 / 20000 MPa.
    close(lc.shear!.tau!, 2.25, 1e-13);
    expect(lc.unloaded).toBe(true);
    expect(lc.cautions[lc.cautions.length - 1]).toMatch(/licensed engineer/);
    expect(lc.cautions.some((c) => /average shear stress/.test(c))).toBe(true);
  });

  it('refuses a load that is not a finite number', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)]);
    const s = stressSection(doc, evaluateDocument(doc)).section!;
    expect(() => analyseLoadCase(s, { Mx: NaN }, documentLoadUnits(doc))).toThrow(/Mx must be a finite number/);
  });
});

describe('kern and plastic moments', () => {
  it('the kern of a section without materials is the geometric kern: a 100 × 200 rectangle gives the rhombus b/6, h/6', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)]);
    const ev = evaluateDocument(doc);
    const k = kernOfSection(stressSection(doc, ev).section!).points!;
    expect(k).toEqual(sectionKern(ev.region, ev.props!));
    close(Math.max(...k.map((p) => p[0])), 50 + 100 / 6, 1e-14);
    close(Math.max(...k.map((p) => p[1])), 100 + 200 / 6, 1e-14);
  });

  it('plastic moment of a steel flat on timber in kN·m (hand calculation by equal forces)', () => {
    // Timber 100 × 200 (fy 24) on a steel flat 100 × 10 (fy 355): the axis lies in the timber,
    // c = 200 − 417 500/2400 above the joint; Mp = 48 148 697.9 N·mm (see tests/materials-composite).
    const doc = plain([rect('t', 0, 0, 100, 200, { material: 'c24' }), rect('s', 0, -10, 100, 10, { material: 's355' })], { materials: [C24, S355], reference: 's355', momentLength: 'm' });
    const s = stressSection(doc, evaluateDocument(doc)).section!;
    const pl = plasticOfSection(s, documentLoadUnits(doc)).plastic!;
    const up = 417500 / 2400, c = 200 - up;
    close(pl.x.at, c, 1e-13);
    close(pl.x.Mp, ((2400 * up * up) / 2 + (2400 * c * c) / 2 + 355000 * (c + 5)) * 1e-6, 1e-13);
    expect(pl.unit).toBe('kN·m');
    // Mp about the vertical axis: Σ fy b² t / 4 (Gere & Goodno, Sec. 6.10).
    close(pl.y.Mp, ((24 * 100 * 100 * 200) / 4 + (355 * 100 * 100 * 10) / 4) * 1e-6, 1e-13);
  });
});

describe('props --json extras', () => {
  it('a section without materials gains only the kern', () => {
    const doc = plain([rect('a', 0, 0, 100, 200)]);
    const j = sectionExtrasJson(doc, evaluateDocument(doc));
    expect(Object.keys(j)).toEqual(['kern']);
    expect(j.kern!.length).toBe(4);
  });

  it('two materials: centre of gravity, mass per length, transformed section, by material, plastic, kern, cautions', () => {
    const doc = plain([rect('t', 0, 0, 100, 200, { material: 'c24' }), rect('s', 0, -10, 100, 10, { material: 's355' })], { materials: [C24, S355], reference: 'c24', momentLength: 'm' });
    const j = sectionExtrasJson(doc, evaluateDocument(doc));
    expect(Object.keys(j).sort()).toEqual(['by_material', 'cautions', 'cg', 'kern', 'mass_per_length', 'plastic', 'stress_unit', 'transformed']);
    // Hibbeler, composite bodies: ȳ_G = (420·20000·100 + 7850·1000·(−5)) / (420·20000 + 7850·1000).
    close(j.cg!.y, (420 * 20000 * 100 - 7850 * 1000 * 5) / (420 * 20000 + 7850 * 1000), 1e-14);
    close(j.mass_per_length!, (420 * 20000 + 7850 * 1000) * 1e-6, 1e-14);
    const n = 210000 / 11000;
    close(j.transformed!.area, 20000 + n * 1000, 1e-14);
    expect(j.transformed!.reference).toBe('c24');
    expect(j.by_material!.s355.centroid).toEqual({ x: 50, y: -5 });
    expect(j.plastic!.unit).toBe('kN·m');
    expect(JSON.parse(JSON.stringify(j))).toEqual(j);
  });
});

afterAll(() => {
  console.log(`analysis: largest relative error ${worst.value.toExponential(2)}`);
});
