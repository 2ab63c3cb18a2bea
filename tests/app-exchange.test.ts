/**
 * The app side of DXF import, export and the title block, without a browser (app/exchange/).
 * Section values are checked against closed forms named beside each check; the rest are
 * behavioural invariants of the editor (one undo step, nothing changed on refusal).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { applyImport, readDxf, uniqueIdPrefix } from '../app/exchange/dxf';
import { defaultPxPerUnit, pngProblem, pngSize } from '../app/exchange/exports';
import { exchangeStore } from '../app/exchange/state';
import { withPaperSize } from '../app/exchange/paper';
import { undo } from '../app/store/history';
import { circleContour, polygonContour, type SectionDocument, type Shape } from '../src';

const fixture = (name: string) => readFileSync(new URL(`../e2e/fixtures/${name}`, import.meta.url), 'utf8');
const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
const rect = (id: string, x: number, y: number, w: number, h: number): Shape => ({ id, type: 'rectangle', at: [x, y], width: w, height: h });
const editorWith = (shapes: Shape[] = [], units: SectionDocument['units'] = 'mm') => createEditor({ ...EMPTY, units, shapes }, { worker: false });
const area = (e: ReturnType<typeof editorWith>) => e.results.evaluate(e.store.getState().doc).props?.area ?? 0;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const PI = Math.PI;

describe('DXF import in the editor', () => {
  it('picks an id prefix no shape uses', () => {
    expect(uniqueIdPrefix(EMPTY)).toBe('dxf');
    expect(uniqueIdPrefix({ ...EMPTY, shapes: [rect('dxf-1', 0, 0, 1, 1)] })).toBe('dxf2');
    expect(uniqueIdPrefix({ ...EMPTY, shapes: [rect('dxf', 0, 0, 1, 1), rect('dxf2-4', 0, 0, 1, 1)] })).toBe('dxf3');
  });

  it('appends the plate with holes as one undoable step', () => {
    const e = editorWith([rect('dxf-1', 500, 0, 10, 10)]);
    expect(readDxf(e.ctx, 'plate-holes.dxf', fixture('plate-holes.dxf'))).toBe('review');
    expect(e.store.getState().doc.shapes).toHaveLength(1); // nothing before the user confirms
    expect(applyImport(e.ctx, 'add')).toBe(true);
    const ids = e.store.getState().doc.shapes.map((s) => s.id);
    expect(ids).toEqual(['dxf-1', 'dxf2-1', 'dxf2-2', 'dxf2-3']);
    // 10·10 + 240·100 − π·15² − (60·24 + π·12²) (composite method, Gere & Goodno, App. E).
    expect(rel(area(e), 100 + 24000 - PI * 225 - 1440 - PI * 144)).toBeLessThan(1e-12);
    undo(e.store);
    expect(e.store.getState().doc.shapes.map((s) => s.id)).toEqual(['dxf-1']);
  });

  it('asks for units when the file has none, then converts into the document units', () => {
    const e = editorWith();
    expect(readDxf(e.ctx, 'no-units.dxf', fixture('no-units.dxf'))).toBe('units');
    expect(exchangeStore(e.store).getState().pending?.stage).toBe('units');
    expect(readDxf(e.ctx, 'no-units.dxf', fixture('no-units.dxf'), 'in')).toBe('review');
    applyImport(e.ctx, 'add');
    // (4·2 − π·0.5²) in², 1 in = 25.4 mm exactly (international inch).
    expect(rel(area(e), (8 - PI * 0.25) * 25.4 ** 2)).toBeLessThan(1e-12);
  });

  it('refuses garbage with a message and changes nothing', () => {
    const e = editorWith([rect('r', 0, 0, 100, 60)]);
    const doc = e.store.getState().doc;
    expect(readDxf(e.ctx, 'x.dxf', '\u0000\u0001\u0002garbage\u00ff')).toBe('refused');
    expect(e.store.getState().doc).toBe(doc);
    expect(e.store.getState().past).toHaveLength(0);
    expect(e.store.getState().notice?.lines.join(' ')).toMatch(/unchanged/);
  });

  it('keeps only the closed loop of a file with an open chain and lists the chain', () => {
    const e = editorWith();
    readDxf(e.ctx, 'unclosed.dxf', fixture('unclosed.dxf'));
    const problems = exchangeStore(e.store).getState().problems;
    expect(problems.map((p) => [p.layer, p.handle])).toEqual([['SKETCH <b>draft</b>', '3B'], ['SKETCH <b>draft</b>', '3C'], ['SKETCH <b>draft</b>', '3D']]);
    applyImport(e.ctx, 'add');
    expect(area(e)).toBeCloseTo(5000, 9); // 100 · 50 (Gere & Goodno, App. E)
  });

  it('cuts a drawing with a hole out of a section exactly (the hole keeps its material)', () => {
    // Section: 300 × 200 plate with its own Ø20 hole at (60, 50), which lies inside the
    // imported drawing's Ø30 hole: S − (plate − holes) keeps S ∩ hole = the ring 15 > r > 10.
    const e = editorWith([rect('big', -50, -50, 300, 200), { id: 'h', type: 'circle', center: [60, 50], radius: 10, op: 'subtract' }]);
    readDxf(e.ctx, 'plate-holes.dxf', fixture('plate-holes.dxf'));
    applyImport(e.ctx, 'subtract');
    // The section's own hole lies inside the cut plate, so: 300·200 − 240·100 + (π·15² − π·10²)
    // + (60·24 + π·12²) (composite method, Gere & Goodno, App. E).
    const expected = 60000 - 24000 + (PI * 225 - PI * 100) + 1440 + PI * 144;
    expect(rel(area(e), expected)).toBeLessThan(1e-9);
  });
});

describe('title block', () => {
  it('each field is one undoable step, an unchanged field records nothing', () => {
    const e = editorWith();
    e.run('doc.setTitle', { field: 'project', value: 'Test hall (invented)' });
    e.run('doc.setTitle', { field: 'name', value: 'Column C3' });
    e.run('doc.setTitle', { field: 'name', value: 'Column C3' });
    expect(e.store.getState().past).toHaveLength(2);
    expect(e.store.getState().doc.title?.project).toBe('Test hall (invented)');
    expect(e.store.getState().doc.name).toBe('Column C3');
    undo(e.store);
    expect(e.store.getState().doc.name).toBeUndefined();
    e.run('doc.setTitle', { field: 'project', value: '' });
    expect(e.store.getState().doc.title).toEqual({});
  });
});

describe('exports', () => {
  it('PNG size follows the chosen resolution and refuses huge images', () => {
    const region = [polygonContour([[0, 0], [100, 0], [100, 50], [0, 50]]), circleContour(50, 25, 10)];
    // (100 + 2·4) × (50 + 2·4) units at 4 px per unit (margin 4 % of the larger extent).
    expect(pngSize(region, 4)).toMatchObject({ width: 432, height: 232 });
    expect(pngProblem(pngSize(region, 1000))).toMatch(/largest side allowed is 8192/);
    expect(pngProblem(pngSize(region, 0))).toMatch(/greater than 0/);
    expect(defaultPxPerUnit(region)).toBe(10); // 2000 / 108 ≈ 18.5 → rounded down to 1-2-5: 10
  });

  it('paper size goes into the report as one more @page rule', () => {
    const html = '<html><head><style>@page { margin: 15mm; }</style></head><body></body></html>';
    expect(withPaperSize(html, 'Letter')).toContain('@page { margin: 15mm; }@page { size: letter portrait; }</style>');
    expect(withPaperSize(html, 'A4')).toContain('size: A4 portrait');
  });
});
