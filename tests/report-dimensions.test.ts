/**
 * Dimensions on the report figure (src/report/dimensions.ts): what is found on a section and how
 * it is placed. The features are checked against the sections' own defining dimensions, the
 * layout against its rules: no two values overlap, no value sits on the material, and what does
 * not fit is listed as left off, never dropped silently.
 *
 * Sources: IPE 300 nominal dimensions (EN 10365: tf = 10.7, tw = 7.1 mm; from memory); a plate
 * with a bore (the CLI fixture plate-with-bore.json, Ø40 at (140, 35)); the others are invented
 * sections whose dimensions are their inputs.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { evaluateDocument, parseDocument, type Bounds, type Region, type SectionDocument, type Shape } from '../src';
import { findDimensionFeatures, layoutDimensions, type DimensionFeature, type DimensionLayout } from '../src/report/dimensions';
import { renderSectionFigure } from '../src/report/figure';

function evaluate(doc: SectionDocument) {
  const ev = evaluateDocument(doc);
  const cuts: Region[] = doc.shapes.flatMap((s, i) => (s.op === 'subtract' ? [ev.shapes[i].region] : []));
  return { ev, cuts, features: findDimensionFeatures(ev.region, cuts) };
}

const docOf = (shapes: Shape[]): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes });

const meet = (a: Bounds, b: Bounds) => a.xmin < b.xmax && a.xmax > b.xmin && a.ymin < b.ymax && a.ymax > b.ymin;

/** No two values overlap; every value is finite. */
function expectLegible(l: DimensionLayout): void {
  for (const t of l.texts) for (const v of [t.x, t.y, t.box.xmin, t.box.xmax]) expect(Number.isFinite(v)).toBe(true);
  for (let i = 0; i < l.texts.length; i++)
    for (let j = i + 1; j < l.texts.length; j++) expect(meet(l.texts[i].box, l.texts[j].box), `"${l.texts[i].text}" and "${l.texts[j].text}" overlap`).toBe(false);
}

describe('features', () => {
  test('the plate with a bore: one round hole Ø40 at (140, 35), plates none (the plate is its own extent)', () => {
    const r = parseDocument(readFileSync('tests/fixtures/plate-with-bore.json', 'utf8'));
    expect(r.ok).toBe(true);
    const { features } = evaluate((r as { doc: SectionDocument }).doc);
    const holes = features.filter((f) => f.kind === 'hole');
    expect(holes).toHaveLength(1);
    const h = holes[0] as Extract<DimensionFeature, { kind: 'hole' }>;
    expect(h.notch).toBe(false);
    expect(Math.abs(h.diameter - 40)).toBeLessThan(1e-9);
    expect(Math.abs(h.cx - 140) + Math.abs(h.cy - 35)).toBeLessThan(1e-9);
  });

  test('IPE 300: the flange and web thicknesses, 10.7 and 7.1 (EN 10365)', () => {
    const { features } = evaluate(docOf([{ id: 'i', type: 'i-beam', at: [0, 0], depth: 300, flangeWidth: 150, flangeThickness: 10.7, webThickness: 7.1, rootRadius: 15 }]));
    const t = features.filter((f): f is Extract<DimensionFeature, { kind: 'thickness' }> => f.kind === 'thickness');
    const values = [...new Set(t.map((f) => Math.round(f.t * 1e9) / 1e9))].sort((a, b) => a - b);
    expect(values).toEqual([7.1, 10.7]);
    // Each measure runs straight across material, face to face.
    for (const f of t) expect(Math.abs(Math.hypot(f.bx - f.ax, f.by - f.ay) - f.t)).toBeLessThan(1e-9);
    // Two flanges (each its own pair of faces) and one web.
    expect(t.filter((f) => Math.abs(f.t - 10.7) < 1e-9)).toHaveLength(2);
    expect(t.filter((f) => Math.abs(f.t - 7.1) < 1e-9)).toHaveLength(1);
  });

  test('a cope cut from a corner is a notch: the positions of its two inner edges', () => {
    const { features } = evaluate(
      docOf([
        { id: 'p', type: 'rectangle', at: [0, 0], width: 300, height: 120 },
        { id: 'c', type: 'rectangle', at: [240, 90], width: 100, height: 50, op: 'subtract' },
      ]),
    );
    const n = features.find((f) => f.kind === 'notch') as Extract<DimensionFeature, { kind: 'notch' }>;
    expect(n.x).toEqual([240]);
    expect(n.y).toEqual([90]);
  });

  test('a round cut across an edge is a notched hole (centre and diameter kept); a cut that misses is nothing', () => {
    const { features } = evaluate(
      docOf([
        { id: 'p', type: 'rectangle', at: [0, 0], width: 100, height: 20 },
        { id: 'b', type: 'circle', center: [50, 20], radius: 5, op: 'subtract' },
        { id: 'm', type: 'circle', center: [500, 500], radius: 5, op: 'subtract' },
      ]),
    );
    const holes = features.filter((f) => f.kind === 'hole') as Extract<DimensionFeature, { kind: 'hole' }>[];
    expect(holes).toHaveLength(1);
    expect(holes[0]).toMatchObject({ notch: true });
    expect(Math.abs(holes[0].diameter - 10)).toBeLessThan(1e-9);
  });

  test('a rectangular opening is given by its extent', () => {
    const { features } = evaluate(
      docOf([
        { id: 'p', type: 'rectangle', at: [0, 0], width: 200, height: 100 },
        { id: 'o', type: 'rectangle', at: [60, 30], width: 50, height: 25, op: 'subtract' },
      ]),
    );
    expect(features.find((f) => f.kind === 'opening')).toEqual({ kind: 'opening', xmin: 60, xmax: 110, ymin: 30, ymax: 55 });
  });

  test('an empty region has nothing to dimension, and no figure', () => {
    expect(findDimensionFeatures([])).toEqual([]);
    expect(layoutDimensions([], [], { mm: 1 }).texts).toEqual([]);
    expect(renderSectionFigure([], null, 'mm', { maxWidthMm: 180, maxHeightMm: 150 })).toBeNull();
  });
});

describe('layout', () => {
  test('the plate with a bore at 1:1: width, height, Ø40 and its position 140 and 35 from the lower left, none overlapping', () => {
    const r = parseDocument(readFileSync('tests/fixtures/plate-with-bore.json', 'utf8'));
    const { ev, features } = evaluate((r as { doc: SectionDocument }).doc);
    const l = layoutDimensions(features, ev.region, { mm: 1 });
    const by = (role: string) => l.texts.filter((t) => t.role === role).map((t) => t.text);
    expect(by('width')).toEqual(['200']);
    expect(by('height')).toEqual(['100']);
    expect(by('diameter')).toEqual(['Ø40']);
    expect(by('x-position')).toEqual(['140']);
    expect(by('y-position')).toEqual(['35']);
    expect(l.omitted).toEqual([]);
    expectLegible(l);
    // The diameter is written inside the bore, on a line through its centre that ends on the circle.
    const d = l.texts.find((t) => t.role === 'diameter')!;
    expect(Math.hypot(d.x - 140, d.y - 35)).toBeLessThan(20);
    expect(l.arrows.some((a) => Math.abs(a.x - 120) < 1e-9 && Math.abs(a.y - 35) < 1e-9)).toBe(true);
    expect(l.arrows.some((a) => Math.abs(a.x - 160) < 1e-9 && Math.abs(a.y - 35) < 1e-9)).toBe(true);
    // Running dimensions start from an origin circle at the section's extremes.
    expect(l.origins).toContainEqual({ x: 0, y: expect.any(Number) });
    expect(l.origins).toContainEqual({ x: expect.any(Number), y: 0 });
  });

  test('world units scale with the view: the same layout at 1:1 and at 1:10 in a finer unit', () => {
    const r = parseDocument(readFileSync('tests/fixtures/plate-with-bore.json', 'utf8'));
    const { ev, features } = evaluate((r as { doc: SectionDocument }).doc);
    const a = layoutDimensions(features, ev.region, { mm: 1 });
    const b = layoutDimensions(features, ev.region, { mm: 10 });
    // Ten times the world units per millimetre: every offset from the section is ten times larger.
    const ga = ev.props!.bounds.ymin - a.extent.ymin, gb = ev.props!.bounds.ymin - b.extent.ymin;
    expect(Math.abs(gb / ga - 10)).toBeLessThan(1e-9);
  });

  test('a row of 40 bolt holes at 1:5 (2.4 mm apart on paper) thins out: values that would touch are left off and listed, the rest legible', () => {
    const holes: Shape[] = Array.from({ length: 40 }, (_, i) => ({ id: `h${i}`, type: 'circle', center: [20 + 12 * i, 30], radius: 4, op: 'subtract' }) as Shape);
    const { ev, features } = evaluate(docOf([{ id: 'p', type: 'rectangle', at: [0, 0], width: 508, height: 60 }, ...holes]));
    expect(features.filter((f) => f.kind === 'hole')).toHaveLength(40);
    const l = layoutDimensions(features, ev.region, { mm: 5 });
    expectLegible(l);
    const xs = l.texts.filter((t) => t.role === 'x-position');
    expect(xs.length).toBeGreaterThan(5);
    expect(xs.length).toBeLessThan(40);
    const left = l.omitted.filter((o) => o.feature.kind === 'position');
    expect(xs.length + left.length).toBe(40); // every position either written or listed as left off
    // Kept positions are at least one arrowhead (2.4 mm on paper, 12 world units at 1:5) apart.
    const kept = xs.map((t) => t.value).sort((a, b) => a - b);
    for (let i = 1; i < kept.length; i++) expect(kept[i] - kept[i - 1]).toBeGreaterThanOrEqual(2.4 * 5);
    for (const o of l.omitted) expect(o.reason.length).toBeGreaterThan(10);
  });

  test('at most six thicknesses, distinct values first: a built-up section of many plates', () => {
    const plates: Shape[] = Array.from({ length: 9 }, (_, i) => ({ id: `p${i}`, type: 'rectangle', at: [0, i * 40], width: 200, height: 5 + i }) as Shape);
    const { ev, features } = evaluate(docOf(plates));
    const l = layoutDimensions(features, ev.region, { mm: 1.5 });
    expectLegible(l);
    const shown = l.texts.filter((t) => t.role === 'thickness');
    expect(shown.length).toBeLessThanOrEqual(6);
    expect(new Set(shown.map((t) => t.text)).size).toBe(shown.length); // no repeats while values are new
    expect(l.omitted.some((o) => /thinned out/.test(o.reason))).toBe(true);
  });

  test('the report figure states what was left off', () => {
    const holes: Shape[] = Array.from({ length: 40 }, (_, i) => ({ id: `h${i}`, type: 'circle', center: [20 + 12 * i, 30], radius: 4, op: 'subtract' }) as Shape);
    const doc = docOf([{ id: 'p', type: 'rectangle', at: [0, 0], width: 508, height: 60 }, ...holes]);
    const { ev, cuts } = evaluate(doc);
    const fig = renderSectionFigure(ev.region, ev.props, 'mm', { maxWidthMm: 180, maxHeightMm: 150, cuts })!;
    expect(fig.dimensions.omitted.length).toBeGreaterThan(0);
    expect(fig.svg).toContain('data-dim="diameter"');
  });
});
