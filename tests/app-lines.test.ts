/**
 * Line elements, weld loads and strips in the editor, without a browser: the line tool joins the
 * group being drawn, the strip tool takes the thickness and corners set in the rail (in the units
 * they were typed in), weld loads are added, picked and kept in step with group names, segments
 * are removed, and line elements are laid along outlines; each change is one undo step.
 * Values: Blodgett, Design of Welded Structures (1966), Table 5 (from memory): two parallel lines
 * Jw = d(3b² + d²)/6, box Jw = (b + d)³/6.
 */
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { addWeldLoad, removeChainSegment, setLineGroup, setWeldLoad } from '../app/ops/welds';
import { stripThickness } from '../app/shapes/strip';
import { undo } from '../app/store/history';
import type { LineShape, SectionDocument, Shape, StripShape } from '../src';

const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
const editorWith = (shapes: Shape[] = [], units: SectionDocument['units'] = 'mm') => createEditor({ ...EMPTY, units, shapes }, { worker: false });
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

function type(e: ReturnType<typeof createEditor>, ...entries: string[]) {
  for (const t of entries) expect(e.type(t)).toBeNull();
}

describe('drawing line elements and strips', () => {
  it('the line tool draws a weld group line by line; each new line joins the group of the one before', () => {
    const e = editorWith();
    e.run('tool.line');
    type(e, '0, 0', '0, 100');
    e.tool().key(e.env, 'enter');
    const first = e.store.getState().doc.shapes[0] as LineShape;
    setLineGroup(e.store, first.id, 'Two lines');
    type(e, '60, 0', '60, 100');
    e.tool().key(e.env, 'enter');
    const doc = e.store.getState().doc;
    expect(doc.shapes.map((s) => (s as LineShape).group)).toEqual(['Two lines', 'Two lines']);
    const g = e.results.evaluate(doc).lines;
    expect(g).toHaveLength(1);
    // Blodgett Table 5, two parallel lines: Jw = d(3b² + d²)/6 with b = 60, d = 100.
    expect(rel(g[0].props!.J, (100 * (3 * 3600 + 10000)) / 6)).toBeLessThan(1e-13);
  });

  it('the strip tool takes the rail thickness and corners, in the units they were typed in', () => {
    const e = editorWith([], 'mm');
    e.run('tool.strip');
    expect(stripThickness(e.store.getState())).toBe(5);
    e.store.setState({ stripDefaults: { thickness: 0.25, units: 'in', corners: 'round' } });
    expect(stripThickness(e.store.getState())).toBeCloseTo(6.35, 12);
    expect(e.tool().prompt(e.env)).toMatch(/t = 6\.35 mm, rounded corners/);
    type(e, '0, 0', '100, 0');
    e.tool().key(e.env, 'enter');
    const s = e.store.getState().doc.shapes[0] as StripShape;
    expect(s.type).toBe('strip');
    expect(s.thickness).toBeCloseTo(6.35, 12);
    expect(s.corners).toBe('round');
    // Without a rail value the last strip's thickness is used.
    e.store.setState({ stripDefaults: { thickness: null, units: 'mm', corners: 'mitre' } });
    expect(stripThickness(e.store.getState())).toBe(s.thickness);
  });
});

describe('weld loads in the editor', () => {
  const C: LineShape = { id: 'w', type: 'line', group: 'Weld', start: [50, 100], segments: [{ to: [0, 100] }, { to: [0, 0] }, { to: [50, 0] }] };

  it('adds a load, picks its point on the canvas with one click, and evaluates it; one undo step each', () => {
    const e = editorWith([C]);
    const i = addWeldLoad(e.store, 'Weld', [12.5, 50]);
    expect(i).toBe(0);
    e.run('tool.weldPoint', i);
    expect(e.store.getState().tool).toBe('weldPoint');
    expect(e.type('200, 50')).toBeNull();
    expect(e.store.getState().tool).toBe('select');
    expect(setWeldLoad(e.store, 0, { Fy: -10 })).toBeNull();
    const w = e.results.evaluate(e.store.getState().doc).welds[0];
    // Hand value of tests/lines-document.test.ts (Blodgett Sect. 7.4): 0.336440 kN/mm.
    expect(rel(w.result!.critical.f, 0.33644)).toBeLessThan(1e-5);
    expect(setWeldLoad(e.store, 0, { Fx: Number.NaN })).toMatch(/finite/);
    undo(e.store);
    expect(e.store.getState().doc.weldLoads).toEqual([{ group: 'Weld', at: [200, 50], Fx: 0, Fy: 0 }]);
    undo(e.store);
    expect(e.store.getState().doc.weldLoads![0].at).toEqual([12.5, 50]);
  });

  it('a renamed group takes its loads with it; a group another line still uses keeps them', () => {
    const other: LineShape = { ...C, id: 'v', start: [100, 0], segments: [{ to: [100, 100] }] };
    const e = editorWith([C, other]);
    addWeldLoad(e.store, 'Weld', [0, 0]);
    setLineGroup(e.store, 'v', 'Stiffener');
    expect(e.store.getState().doc.weldLoads![0].group).toBe('Weld');
    setLineGroup(e.store, 'w', 'Bracket');
    expect(e.store.getState().doc.weldLoads![0].group).toBe('Bracket');
    expect(e.results.evaluate(e.store.getState().doc).welds[0].message).toBeNull();
  });

  it('removing an inner segment splits the line in two, both selected, one undo step', () => {
    const e = editorWith([C]);
    expect(removeChainSegment(e.store, 'w', 1)).toBeNull();
    const shapes = e.store.getState().doc.shapes as LineShape[];
    expect(shapes).toHaveLength(2);
    expect(shapes[1].id).not.toBe('w');
    expect(shapes.every((s) => s.group === 'Weld')).toBe(true);
    expect(e.store.getState().selected).toEqual(shapes.map((s) => s.id));
    undo(e.store);
    expect(e.store.getState().doc.shapes).toEqual([C]);
  });

  it('line elements along the selected plate: a weld all round (Blodgett Table 5, box)', () => {
    const plate = { id: 'p', type: 'rectangle', at: [0, 0], width: 120, height: 200 } as Shape;
    const e = editorWith([plate]);
    e.store.setState({ selected: ['p'] });
    e.run('line.alongOutline');
    const doc = e.store.getState().doc;
    expect(doc.shapes.map((s) => s.type)).toEqual(['rectangle', 'line']);
    const g = e.results.evaluate(doc).lines[0];
    expect(rel(g.props!.J, (120 + 200) ** 3 / 6)).toBeLessThan(1e-13);
    // Nothing to follow: a notice, no change.
    const empty = editorWith();
    empty.run('line.alongOutline');
    expect(empty.store.getState().doc.shapes).toEqual([]);
    expect(empty.store.getState().notice?.title).toMatch(/No outline/);
  });
});
