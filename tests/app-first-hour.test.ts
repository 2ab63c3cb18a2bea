/**
 * The editor's operations for a drafter's first hour, without a browser: rounding a corner
 * (the engine's exact fillet, one undo step), corner numbering, New asking first, rolled sections
 * from the catalogue placed in the document's units and in view, Open… telling a DXF drawing from
 * a section document, and opening an example from the shelf in one undo step. Areas are checked
 * against closed forms named beside each check; the rest is the editor's own behaviour.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { openExample } from '../app/examples/open';
import { EXAMPLE_SHELF } from '../app/examples/shelf';
import { looksLikeDxf } from '../app/exchange/open';
import { placeCatalogueSize } from '../app/ops/catalogue';
import { answer, questionStore } from '../app/ops/question';
import { roundCorner, roundedShape } from '../app/ops/round-corner';
import { cornerOfHandle } from '../app/shapes/corners';
import { shapeCorners } from '../src';
import { evaluateDocument, type SectionDocument, type Shape } from '../src';

const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
const editorWith = (shapes: Shape[] = [], units: SectionDocument['units'] = 'mm') => {
  const e = createEditor({ ...EMPTY, units, shapes });
  e.store.setState({ width: 1000, height: 700, scale: 2, ox: 100, oy: 600 });
  return e;
};
const area = (e: ReturnType<typeof createEditor>) => e.results.evaluate(e.store.getState().doc).props!.area;
const PI = Math.PI;
const spandrel = (r: number) => (1 - PI / 4) * r * r; // square corner less a quarter circle (Gere & Goodno, App. E)

const plate: Shape = { id: 'p', type: 'polygon', name: 'Gusset', op: 'add', points: [[0, 0], [100, 0], [100, 60], [0, 60]] };

describe('round a corner', () => {
  it('a polygon corner becomes an exact arc: the polygon turns into a path that keeps id, name and op', () => {
    const e = editorWith([plate]);
    expect(roundCorner(e.ctx, { id: 'p', corner: 2, radius: 10 })).toBeNull();
    const s = e.store.getState().doc.shapes[0];
    expect(s).toMatchObject({ id: 'p', type: 'path', name: 'Gusset', op: 'add' });
    expect(e.store.getState().past.length).toBe(1);
    expect(Math.abs(area(e) - (6000 - spandrel(10)))).toBeLessThan(1e-9 * 6000);
    // Tangent points exactly r from the corner along each side.
    const tos = (s as Extract<Shape, { type: 'path' }>).segments.map((g) => g.to);
    expect(tos).toContainEqual([100, 50]);
  });

  it('a closed path: every corner rounds; a radius that does not fit is refused and nothing changes', () => {
    const e = editorWith([plate]);
    roundCorner(e.ctx, { id: 'p', corner: 0, radius: 20 });
    roundCorner(e.ctx, { id: 'p', corner: 2, radius: 20 });
    expect(Math.abs(area(e) - (6000 - 2 * spandrel(20)))).toBeLessThan(1e-9 * 6000);
    const before = e.store.getState().doc;
    expect(roundCorner(e.ctx, { id: 'p', corner: 1, radius: 70 })).toMatch(/does not fit/);
    expect(e.store.getState().doc).toBe(before);
    expect(roundCorner(e.ctx, { id: 'p', corner: 40, radius: 5 })).toMatch(/no corner 41/);
  });

  it('a path whose last point is within round-off of its start is treated as closed', () => {
    const p: Shape = { id: 'q', type: 'path', start: [0, 0], segments: [{ to: [50, 0] }, { to: [50, 50] }, { to: [1e-13, 0] }] };
    const r = roundedShape(p, 0, 5);
    expect(typeof r).not.toBe('string');
    // Right triangle 50·50/2 less the 45° corner's fillet area r²(cot(θ/2) − (π − θ)/2) with θ = 45°
    // (tangent length r·cot(θ/2); Gere & Goodno, App. E: kite less sector).
    const th = PI / 4;
    const lost = 5 * 5 * (1 / Math.tan(th / 2) - (PI - th) / 2);
    const a = evaluateDocument({ ...EMPTY, shapes: [r as Shape] }).props!.area;
    expect(Math.abs(a - (1250 - lost))).toBeLessThan(1e-9 * 1250);
  });

  it('open chains round only where two segments meet; a profile has no corners to pick', () => {
    const line: Shape = { id: 'l', type: 'line', start: [0, 0], segments: [{ to: [100, 0] }, { to: [100, 80] }] };
    expect(shapeCorners(line).map((c) => [c.index, c.label])).toEqual([[1, 'End of line 1']]);
    expect(cornerOfHandle(line, { kind: 'start' })).toBeNull();
    expect(cornerOfHandle(line, { kind: 'to', index: 0 })).toBe(1);
    const r = roundedShape(line, 1, 10) as Extract<Shape, { type: 'line' }>;
    expect(r.type).toBe('line');
    expect(r.segments[1].via).toBeDefined();
    const rect: Shape = { id: 'r', type: 'rectangle', at: [0, 0], width: 10, height: 10 };
    expect(shapeCorners(rect)).toEqual([]);
    expect(roundedShape(rect, 0, 1)).toMatch(/profile sets its radii/);
    expect(shapeCorners(plate).map((c) => c.label)).toEqual(['Vertex 1', 'Vertex 2', 'Vertex 3', 'Vertex 4']);
    expect(cornerOfHandle(plate, { kind: 'vertex', index: 3 })).toBe(3);
  });
});

describe('New', () => {
  it('asks before clearing a section with shapes; keeping it changes nothing, going ahead is one undo step', () => {
    const e = editorWith([plate]);
    e.run('file.new');
    const q = questionStore(e.store).getState().question;
    expect(q?.title).toBe('Start a new, empty section?');
    expect(q?.lines[0]).toMatch(/has one shape/);
    answer(e.store, false);
    expect(e.store.getState().doc.shapes.length).toBe(1);
    e.store.setState({ scale: 50, ox: -3000 });
    e.run('file.new');
    answer(e.store, true);
    expect(e.store.getState().doc.shapes).toEqual([]);
    expect(e.store.getState().scale).toBeLessThan(3);
    expect(e.store.getState().past.length).toBe(1);
    // Empty: no question.
    e.run('file.new');
    expect(questionStore(e.store).getState().question).toBeNull();
  });
});

describe('rolled sections', () => {
  it('IPE 300 in metres: dimensions converted, named, centred in the view on the grid, one undo step', () => {
    const e = editorWith([], 'm');
    e.store.setState({ scale: 2000, ox: 500, oy: 350 }); // 2 px per mm: the view centre is the origin
    expect(placeCatalogueSize(e.ctx, { series: 'IPE', designation: '300' })).toBeNull();
    const s = e.store.getState().doc.shapes[0] as Extract<Shape, { type: 'i-beam' }>;
    expect(s).toMatchObject({ type: 'i-beam', name: 'IPE 300', depth: 0.3, flangeWidth: 0.15, webThickness: 0.0071, flangeThickness: 0.0107, rootRadius: 0.015 });
    // Centred on the view's middle (the origin here), on the 10 mm grid of this zoom: −75 mm rounds to −70.
    expect(s.at).toEqual([-0.07, -0.15]);
    expect(e.store.getState().selected).toEqual([s.id]);
    expect(e.store.getState().past.length).toBe(1);
    // A = 2·b·tf + (h − 2tf)·tw + (4 − π)·r² (Gere & Goodno, App. E, composite areas), in m².
    expect(Math.abs(area(e) - (2 * 0.15 * 0.0107 + (0.3 - 0.0214) * 0.0071 + (4 - PI) * 0.015 ** 2))).toBeLessThan(1e-12);
  });

  it('the first shape of an empty section, a speck at the current zoom, is fitted to the view', () => {
    const e = editorWith([], 'in');
    e.store.setState({ scale: 2 }); // 2 px per inch: a W14 would be 28 px tall
    placeCatalogueSize(e.ctx, { series: 'W', designation: 'W14×30' });
    const st = e.store.getState();
    expect(st.scale * 13.8).toBeGreaterThan(st.height / 2);
    // A second one keeps the zoom (only brought into view if it were off-screen).
    placeCatalogueSize(e.ctx, { series: 'W', designation: 'W8×10' });
    expect(e.store.getState().scale).toBe(st.scale);
  });

  it('a size larger than the view zooms out to show it; an unknown size is refused with the sizes there are', () => {
    const e = editorWith();
    e.store.setState({ scale: 50 });
    placeCatalogueSize(e.ctx, { series: 'HEB', designation: 'HE 600 B' });
    const st = e.store.getState();
    expect(st.scale * 600).toBeLessThan(st.height);
    expect(placeCatalogueSize(e.ctx, { series: 'IPE', designation: '310' })).toMatch(/holds no size "310".*IPE 80/);
  });
});

describe('Open… and the examples', () => {
  it('tells a DXF drawing by its name or its first group codes', () => {
    const dxf = readFileSync(join(__dirname, '..', 'e2e', 'fixtures', 'plate-holes.dxf'), 'utf8');
    expect(looksLikeDxf('plate.DXF', '')).toBe(true);
    expect(looksLikeDxf('drawing.txt', dxf)).toBe(true);
    expect(looksLikeDxf('section.json', '{"format": "kern-section"}')).toBe(false);
  });

  it('opening a DXF through Open… starts the import review and changes nothing yet', () => {
    const e = editorWith([plate]);
    const dxf = readFileSync(join(__dirname, '..', 'e2e', 'fixtures', 'plate-holes.dxf'), 'utf8');
    e.ctx.io = { pickFile: () => Promise.resolve({ name: 'plate-holes.dxf', text: dxf }), download: () => {} };
    return e.run('file.open') && new Promise<void>((done) => setTimeout(done, 0)).then(() => {
      expect(e.store.getState().notice?.title).toMatch(/is a DXF drawing, not a section document/);
      expect(e.store.getState().doc.shapes).toEqual([plate]);
    });
  });

  it('each example opens in one undo step, with the properties of its file', async () => {
    const e = editorWith([plate]);
    const read = (f: string) => Promise.resolve(readFileSync(join(__dirname, '..', 'public', 'examples', f), 'utf8'));
    for (const [k, { file }] of EXAMPLE_SHELF.entries()) {
      expect(await openExample(e.ctx, file, read)).toBe(true);
      expect(e.store.getState().past.length).toBe(k + 1);
    }
    // The schema link of the shelf's files (relative to public/examples/) is not carried into the app's copy.
    expect('$schema' in e.store.getState().doc).toBe(false);
    expect(await openExample(e.ctx, 'nope.json', read)).toBe(false);
    expect(e.store.getState().notice?.title).toMatch(/no example "nope.json"/);
  });
});
