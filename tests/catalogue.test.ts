/**
 * The profile catalogue (src/catalogue/): every size's outline, built by the engine from its
 * nominal dimensions, must give the tabulated A, Ix and Iy within 1 %. This catches a mistyped
 * dimension or property (a flange thickness off by one digit moves Ix by several per cent).
 *
 * Sources: EN 10365:2017 dimensions with the section properties of European section tables for
 * IPE, HE A and HE B (A in cm², I in cm⁴); the AISC Steel Construction Manual, Table 1-1, for
 * W shapes (in², in⁴). All recalled, from memory. Tabulated properties include the root fillets;
 * for W shapes the fillet radius is kdes − tf. Tolerance 1 %: the European tables print four
 * figures, the AISC table three, and it rounds d and bf to three figures as well.
 */
import { describe, expect, it } from 'vitest';
import { CatalogueError, catalogueProfile, catalogueSeries, catalogueSize } from '../src/catalogue';
import { pathContour } from '../src';
import { profileToPaths, validateProfile } from '../src';
import { UNIT_IN_METRES } from '../src/document/types';
import { sectionProperties } from '../src/properties/section';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function computed(series: string, designation: string) {
  const shape = { id: 'c', ...catalogueProfile(series, designation) };
  const { outer, holes } = profileToPaths(shape);
  return sectionProperties([outer, ...holes].map((p) => pathContour(p.start, p.segments)));
}

/** Largest relative difference seen per series and property, for the report at the end. */
const worst: Record<string, { A: number; Ix: number; Iy: number }> = {};

describe('catalogue sizes agree with their tabulated properties', () => {
  for (const s of catalogueSeries()) {
    describe(`${s.name} (${s.standard})`, () => {
      it('names its standard, says its values come from memory, and holds 10 to 20 sizes', () => {
        expect(s.standard.length).toBeGreaterThan(3);
        expect(s.source).toMatch(/from memory/);
        expect(s.sizes.length).toBeGreaterThanOrEqual(10);
        expect(s.sizes.length).toBeLessThanOrEqual(30);
        expect(new Set(s.sizes.map((z) => z.designation)).size).toBe(s.sizes.length);
      });
      for (const z of s.sizes) {
        it(`${z.designation}: A, Ix, Iy within 1 % of the table`, () => {
          expect(validateProfile({ id: 'c', ...catalogueProfile(s.id, z.designation) })).toEqual([]);
          const p = computed(s.id, z.designation);
          // Table units (cm or in) from the dimension units (mm or in).
          const k = UNIT_IN_METRES[s.units] / UNIT_IN_METRES[s.tableUnits];
          const e = { A: rel(p.area * k ** 2, z.A), Ix: rel(p.Ix * k ** 4, z.Ix), Iy: rel(p.Iy * k ** 4, z.Iy) };
          const w = (worst[s.id] ??= { A: 0, Ix: 0, Iy: 0 });
          for (const q of ['A', 'Ix', 'Iy'] as const) w[q] = Math.max(w[q], e[q]);
          expect(e.A, 'A').toBeLessThan(0.01);
          expect(e.Ix, 'Ix (strong axis)').toBeLessThan(0.01);
          expect(e.Iy, 'Iy (weak axis)').toBeLessThan(0.01);
          // The strong axis is horizontal: the local frame stands the beam upright.
          expect(p.Ix).toBeGreaterThan(p.Iy);
        });
      }
    });
  }
  it('would catch a mistyped dimension (a flange thickness with one digit wrong)', () => {
    // IPE 300 with tf = 17.0 instead of 10.7: far outside 1 % (EN 10365 value tf = 10.7 mm).
    const good = computed('IPE', 'IPE 300');
    const bad = { ...catalogueProfile('IPE', 'IPE 300'), flangeThickness: 17.0, id: 'b' };
    const { outer } = profileToPaths(bad);
    const p = sectionProperties([pathContour(outer.start, outer.segments)]);
    expect(rel(p.Ix, good.Ix)).toBeGreaterThan(0.1);
  });
  it('prints the largest differences found', () => {
    // Kept as figures for the record; every one is already checked above.
    for (const [id, w] of Object.entries(worst))
      console.log(`${id}: largest difference A ${(100 * w.A).toFixed(2)} %, Ix ${(100 * w.Ix).toFixed(2)} %, Iy ${(100 * w.Iy).toFixed(2)} %`);
    expect(Object.keys(worst).sort()).toEqual(['HEA', 'HEB', 'IPE', 'W']);
  });
});

describe('catalogue look-up', () => {
  it('returns an i-beam record named by its designation, in the units asked for', () => {
    const p = catalogueProfile('IPE', 'IPE 300');
    expect(p).toEqual({ type: 'i-beam', name: 'IPE 300', at: [0, 0], depth: 300, flangeWidth: 150, flangeThickness: 10.7, webThickness: 7.1, rootRadius: 15 });
    // 1 in = 25.4 mm exactly (the international inch of 1959): W12×26 d = 12.2 in = 309.88 mm.
    const w = catalogueProfile('W', 'W12x26', { units: 'mm', at: [5, 6] });
    expect(w.depth).toBe(309.88);
    expect(w.rootRadius).toBe(7.62); // (0.680 − 0.380) in
    expect(w.at).toEqual([5, 6]);
    expect(catalogueProfile('IPE', 'IPE 300', { units: 'm' }).depth).toBe(0.3);
  });
  it('forgives spacing, case and the usual spellings', () => {
    for (const [s, d] of [['hea', 'HEA 300'], ['HE A', 'he300a'], ['HEA', '300'], ['HEA', 'HE 300 A']])
      expect(catalogueSize(s, d)?.designation).toBe('HE 300 A');
    expect(catalogueSize('W', 'w12X26')?.designation).toBe('W12×26');
    expect(catalogueSize('W', '12x26')?.designation).toBe('W12×26');
    expect(catalogueSize('IPE', 'ipe300')?.designation).toBe('IPE 300');
    expect(catalogueSize('HEB', 'HE 300 A')).toBeUndefined();
  });
  it('refuses an unknown series or size with the choices', () => {
    expect(() => catalogueProfile('UB', '305x165x40')).toThrow(CatalogueError);
    expect(() => catalogueProfile('UB', '305x165x40')).toThrow(/IPE, HEA, HEB, W/);
    expect(() => catalogueProfile('IPE', 'IPE 310')).toThrow(/runs from IPE 80 to IPE 600/);
  });
});
