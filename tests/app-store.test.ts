/**
 * The editor's store, history and commands without a browser (app/). Property values are
 * checked against closed forms, each named beside its check; history checks are behavioural
 * invariants of the editor itself (undo restores exactly the earlier state).
 */
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { buildRegistry, registry } from '../app/command-table';
import { loadDocumentText } from '../app/ops/document';
import { CommandRegistry } from '../app/commands/registry';
import { beginGesture, commit, endGesture, previewGesture, cancelGesture, undo, redo } from '../app/store/history';
import { AUTOSAVE_KEY, REJECTED_KEY, installAutosave, restoreDocument } from '../app/persist';
import { DEMO_DOCUMENT, type SectionDocument, type Shape } from '../src';

const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };

function editorWith(shapes: Shape[] = [], units: SectionDocument['units'] = 'mm') {
  return createEditor({ ...EMPTY, units, shapes });
}
function props(e: ReturnType<typeof createEditor>) {
  const p = e.results.evaluate(e.store.getState().doc).props;
  if (!p) throw new Error('no properties');
  return p;
}
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

const rect = (id: string, x: number, y: number, w: number, h: number, op?: Shape['op']): Shape =>
  ({ id, type: 'rectangle', at: [x, y], width: w, height: h, ...(op ? { op } : {}) }) as Shape;

describe('history', () => {
  it('undo and redo restore the exact documents', () => {
    const e = editorWith();
    const d0 = e.store.getState().doc;
    const d1 = { ...d0, shapes: [rect('a', 0, 0, 10, 10)] };
    const d2 = { ...d1, shapes: [...d1.shapes, rect('b', 20, 0, 10, 10)] };
    commit(e.store, d1);
    commit(e.store, d2);
    undo(e.store);
    expect(e.store.getState().doc).toBe(d1);
    undo(e.store);
    expect(e.store.getState().doc).toBe(d0);
    redo(e.store);
    redo(e.store);
    expect(e.store.getState().doc).toBe(d2);
  });
  it('keeps at least 200 steps', () => {
    const e = editorWith();
    const d0 = e.store.getState().doc;
    for (let k = 1; k <= 250; k++) commit(e.store, { ...d0, shapes: [rect('a', k, 0, 10, 10)] });
    for (let k = 0; k < 250; k++) undo(e.store);
    expect(e.store.getState().doc).toBe(d0);
    for (let k = 0; k < 250; k++) redo(e.store);
    expect((e.store.getState().doc.shapes[0] as { at: number[] }).at[0]).toBe(250);
  });
  it('a gesture previews without recording and commits one step', () => {
    const e = editorWith([rect('a', 0, 0, 10, 10)]);
    const base = e.store.getState().doc;
    beginGesture(e.store);
    for (let k = 1; k <= 20; k++) previewGesture(e.store, { ...base, shapes: [rect('a', k, 0, 10, 10)] });
    expect(e.store.getState().past.length).toBe(0);
    endGesture(e.store);
    expect(e.store.getState().past.length).toBe(1);
    undo(e.store);
    expect(e.store.getState().doc).toBe(base);
  });
  it('a cancelled gesture leaves the document as it was', () => {
    const e = editorWith([rect('a', 0, 0, 10, 10)]);
    const base = e.store.getState().doc;
    previewGesture(e.store, { ...base, shapes: [] });
    cancelGesture(e.store);
    expect(e.store.getState().doc).toBe(base);
    expect(e.store.getState().past.length).toBe(0);
  });
  it('a new edit after undo clears the redo stack', () => {
    const e = editorWith();
    commit(e.store, { ...EMPTY, shapes: [rect('a', 0, 0, 1, 1)] });
    undo(e.store);
    commit(e.store, { ...EMPTY, shapes: [rect('b', 0, 0, 2, 2)] });
    expect(e.store.getState().future.length).toBe(0);
  });
});

describe('command registry', () => {
  it('refuses a key bound twice', () => {
    const r = new CommandRegistry();
    r.register({ name: 'one', label: 'One', group: 'edit', keys: ['mod+k'], perform: () => {} });
    expect(() => r.register({ name: 'two', label: 'Two', group: 'edit', keys: ['Mod+K'], perform: () => {} })).toThrow(/already bound/);
  });
  it('builds without clashes and maps the history keys', () => {
    expect(() => buildRegistry()).not.toThrow();
    expect(registry.forKey('mod+z')?.name).toBe('undo');
    expect(registry.forKey('mod+shift+z')?.name).toBe('redo');
    expect(registry.forKey('mod+y')?.name).toBe('redo');
  });
});

describe('commands on the section', () => {
  it('a typed rectangle has the closed-form properties', () => {
    const e = editorWith();
    e.run('tool.rectangle');
    expect(e.type('0, 0')).toBeNull();
    expect(e.type('d 100, 200')).toBeNull();
    const p = props(e);
    expect(p.area).toBeCloseTo(20000, 8); // A = b·h (Gere & Goodno, App. E, rectangle)
    expect(rel(p.Ix, (100 * 200 ** 3) / 12)).toBeLessThan(1e-12); // Ix = b·h³/12 (Gere & Goodno, App. E, rectangle)
    expect(rel(p.Iy, (200 * 100 ** 3) / 12)).toBeLessThan(1e-12); // Iy = h·b³/12 (same)
    expect(e.store.getState().selected).toEqual([e.store.getState().doc.shapes[0].id]);
  });
  it('a typed circle by centre and radius', () => {
    const e = editorWith();
    e.run('tool.circle');
    e.type('10, 10');
    e.type('25');
    const p = props(e);
    expect(rel(p.area, Math.PI * 625)).toBeLessThan(1e-12); // A = πr² (Gere & Goodno, App. E, circle)
    expect(rel(p.Ix, (Math.PI * 25 ** 4) / 4)).toBeLessThan(1e-12); // I = πr⁴/4 (Gere & Goodno, App. E, circle)
  });
  it('a typed polygon closed with Enter: right triangle', () => {
    const e = editorWith();
    e.run('tool.polygon');
    e.type('0, 0');
    e.type('d 30, 0');
    e.type('0, 60');
    e.tool().key(e.env, 'enter');
    const p = props(e);
    expect(p.area).toBeCloseTo(900, 9); // A = b·h/2 (Gere & Goodno, App. E, right triangle)
    expect(p.centroid.x).toBeCloseTo(10, 12); // x̄ = b/3 (Gere & Goodno, App. E, right triangle)
    expect(p.centroid.y).toBeCloseTo(20, 12); // ȳ = h/3
    expect(rel(p.Ix, (30 * 60 ** 3) / 36)).toBeLessThan(1e-12); // Ix = b·h³/36 (Gere & Goodno, App. E, triangle)
  });
  it('a typed path with a three-point arc: semicircle', () => {
    const e = editorWith();
    e.run('tool.path');
    e.type('-50, 0');
    e.type('50, 0');
    e.run('path.arcMode');
    e.type('0, 50');
    expect(e.type('-50, 0')).toBeNull(); // ends on the start: closes
    const doc = e.store.getState().doc;
    expect(doc.shapes).toHaveLength(1);
    const p = props(e);
    const r = 50;
    expect(rel(p.area, (Math.PI * r * r) / 2)).toBeLessThan(1e-12); // A = πr²/2 (Gere & Goodno, App. E, semicircle)
    expect(rel(p.centroid.y, (4 * r) / (3 * Math.PI))).toBeLessThan(1e-12); // ȳ = 4r/3π (Gere & Goodno, App. E, semicircle)
    expect(rel(p.Ix, (Math.PI / 8 - 8 / (9 * Math.PI)) * r ** 4)).toBeLessThan(1e-10); // Ix = (π/8 − 8/9π) r⁴ (Gere & Goodno, App. E, semicircle)
  });
  it('polar input: a square drawn with length ∠ angle', () => {
    const e = editorWith();
    e.run('tool.polygon');
    e.type('0,0');
    e.type('40 a 0');
    e.type('40 a 90');
    e.type('40 a 180');
    e.tool().key(e.env, 'enter');
    expect(props(e).area).toBeCloseTo(1600, 9); // A = a² (square; Gere & Goodno, App. E)
  });
  it('switching the operation of a hole: add, subtract, intersect', () => {
    const e = editorWith([rect('plate', -50, -50, 100, 100), { id: 'hole', type: 'circle', center: [0, 0], radius: 20 }]);
    e.store.setState({ selected: ['hole'] });
    expect(props(e).area).toBeCloseTo(10000, 8); // the circle lies inside: union = the square, b² (App. E)
    e.run('op.subtract');
    expect(rel(props(e).area, 10000 - Math.PI * 400)).toBeLessThan(1e-12); // b² − πr² (App. E, square and circle)
    e.run('op.intersect');
    expect(rel(props(e).area, Math.PI * 400)).toBeLessThan(1e-12); // πr² (App. E, circle)
    undo(e.store);
    expect(rel(props(e).area, 10000 - Math.PI * 400)).toBeLessThan(1e-12);
  });
  it('arrow nudges move by a fixed step; rotate and mirror act on the selection', () => {
    const e = editorWith([rect('r', 0, 0, 100, 20)]);
    e.store.setState({ selected: ['r'] });
    e.run('edit.nudgeRight');
    e.run('edit.nudgeUp10');
    const p = props(e);
    expect(p.centroid.x).toBeCloseTo(51, 12); // b/2 + 1 mm
    expect(p.centroid.y).toBeCloseTo(20, 12); // h/2 + 10 mm
    e.run('edit.rotate', 90);
    const q = props(e);
    expect(rel(q.Ix, (20 * 100 ** 3) / 12)).toBeLessThan(1e-12); // turned 90°: Ix = h·b³/12 (Gere & Goodno, App. E)
    expect(q.centroid.x).toBeCloseTo(51, 9); // rotation about the selection's centre keeps it
    const tri = editorWith([{ id: 't', type: 'polygon', points: [[0, 0], [30, 0], [0, 60]] }]);
    tri.store.setState({ selected: ['t'] });
    tri.run('edit.mirrorX');
    expect(props(tri).centroid.x).toBeCloseTo(20, 12); // mirrored about x = 15: x̄ = 30 − b/3 (App. E, triangle)
    expect(props(tri).area).toBeCloseTo(900, 9);
  });
  it('mirroring a profile keeps it parametric and moves its centroid by the mirror', () => {
    const e = editorWith([{ id: 'L', type: 'angle', at: [0, 0], legVertical: 100, legHorizontal: 60, thickness: 10, rootRadius: 0 } as Shape]);
    e.store.setState({ selected: ['L'] });
    const before = props(e);
    e.run('edit.mirrorX');
    const s = e.store.getState().doc.shapes[0];
    expect(s.type).toBe('angle');
    const after = props(e);
    // Mirror about x = 30 (centre of the 0..60 extent): x̄' = 60 − x̄; areas and Ix unchanged, Ixy changes sign.
    expect(after.centroid.x).toBeCloseTo(60 - before.centroid.x, 9);
    expect(after.area).toBeCloseTo(before.area, 9);
    expect(after.Ixy).toBeCloseTo(-before.Ixy, 6);
    // Equal-leg-free angle area: t·(a + b − t) (Gere & Goodno, App. E, decomposed into rectangles)
    expect(after.area).toBeCloseTo(10 * (100 + 60 - 10), 9);
  });
  it('duplicate, delete, reorder and undo', () => {
    const e = editorWith([rect('a', 0, 0, 10, 10), rect('b', 20, 0, 10, 10)]);
    e.store.setState({ selected: ['a'] });
    e.run('edit.duplicate');
    let doc = e.store.getState().doc;
    expect(doc.shapes).toHaveLength(3);
    expect(new Set(doc.shapes.map((s) => s.id)).size).toBe(3);
    e.run('edit.delete');
    expect(e.store.getState().doc.shapes).toHaveLength(2);
    e.store.setState({ selected: ['a'] });
    e.run('order.forward');
    doc = e.store.getState().doc;
    expect(doc.shapes.map((s) => s.id)).toEqual(['b', 'a']);
    undo(e.store);
    undo(e.store);
    undo(e.store);
    expect(e.store.getState().doc.shapes.map((s) => s.id)).toEqual(['a', 'b']);
  });
  it('unit switching converts the document', () => {
    const e = editorWith([rect('a', 0, 0, 100, 200)]);
    e.run('units.set', 'cm');
    const doc = e.store.getState().doc;
    expect(doc.units).toBe('cm');
    expect(props(e).area).toBeCloseTo(200, 10); // 1 cm = 10 mm (SI): 10 cm × 20 cm
    e.run('units.set', 'in');
    expect(rel(props(e).area, 20000 / 25.4 ** 2)).toBeLessThan(1e-12); // 1 in = 25.4 mm exactly (international inch, 1959)
  });
  it('merge into one outline keeps the exact section (arcs preserved)', () => {
    const e = editorWith([rect('plate', -50, -50, 100, 100), { id: 'hole', type: 'circle', center: [0, 0], radius: 20, op: 'subtract' }]);
    e.store.setState({ selected: ['plate', 'hole'] });
    e.run('shape.merge');
    const doc = e.store.getState().doc;
    expect(doc.shapes.every((s) => s.type === 'path')).toBe(true);
    expect(doc.shapes.map((s) => s.op)).toEqual(['add', 'subtract']);
    expect(doc.shapes.some((s) => s.type === 'path' && s.segments.some((g) => g.via))).toBe(true);
    const p = props(e);
    expect(rel(p.area, 10000 - Math.PI * 400)).toBeLessThan(1e-12); // b² − πr² (Gere & Goodno, App. E)
    expect(rel(p.Ix, 100 ** 4 / 12 - (Math.PI * 20 ** 4) / 4)).toBeLessThan(1e-12); // b⁴/12 − πr⁴/4 (App. E)
  });
  it('convert to outline turns a profile into paths with the same properties', () => {
    const d = 200, bf = 100, tf = 10, tw = 6, r = 12;
    const e = editorWith([{ id: 'I', type: 'i-beam', at: [0, 0], depth: d, flangeWidth: bf, flangeThickness: tf, webThickness: tw, rootRadius: r } as Shape]);
    e.store.setState({ selected: ['I'] });
    const before = props(e);
    // Flanges, web and four root fillets, each fillet a quarter-circular spandrel (1 − π/4)·r² (Gere & Goodno, App. E).
    expect(rel(before.area, 2 * bf * tf + (d - 2 * tf) * tw + 4 * (1 - Math.PI / 4) * r * r)).toBeLessThan(1e-12);
    e.run('shape.toOutline');
    const doc = e.store.getState().doc;
    expect(doc.shapes.every((s) => s.type === 'path')).toBe(true);
    const after = props(e);
    expect(rel(after.area, before.area)).toBeLessThan(1e-12);
    expect(rel(after.Ix, before.Ix)).toBeLessThan(1e-12);
  });
  it('a file that fails validation changes nothing and says why', () => {
    const e = editorWith([rect('a', 0, 0, 10, 10)]);
    const before = e.store.getState().doc;
    expect(loadDocumentText(e.ctx, 'bad.json', '{ "format": "kern-section", "version": 1, "units": "mm", "shapes": [ { "id": "c", "type": "circle", "center": [0,0], "radius": -1 } ] }')).toBe(false);
    expect(e.store.getState().doc).toBe(before);
    const n = e.store.getState().notice;
    expect(n?.kind).toBe('error');
    expect(n?.lines.join('\n')).toMatch(/shapes\[0\]\.radius/);
    expect(loadDocumentText(e.ctx, 'garbage.json', 'not json')).toBe(false);
    expect(e.store.getState().doc).toBe(before);
    expect(e.store.getState().past.length).toBe(0);
  });
  it('a valid file replaces the document in one undoable step', () => {
    const e = editorWith([rect('a', 0, 0, 10, 10)]);
    const before = e.store.getState().doc;
    expect(loadDocumentText(e.ctx, 'demo.json', JSON.stringify(DEMO_DOCUMENT))).toBe(true);
    expect(e.store.getState().doc.shapes.length).toBe(DEMO_DOCUMENT.shapes.length);
    undo(e.store);
    expect(e.store.getState().doc).toBe(before);
  });
  it('a shape edit that fails validation is not applied', () => {
    const e = editorWith();
    expect(e.env.addShape({ type: 'circle', center: [0, 0], radius: -5 })).toBe(false);
    expect(e.store.getState().doc.shapes).toHaveLength(0);
    expect(e.transient.getState().inputError).toMatch(/radius/);
  });
});

describe('autosave', () => {
  const memory = () => {
    const m = new Map<string, string>();
    return { getItem: (k: string) => m.get(k) ?? null, setItem: (k: string, v: string) => void m.set(k, v), m };
  };
  it('saves after each committed edit, not during a preview, and restores', () => {
    const st = memory();
    const e = editorWith();
    installAutosave(e.store, st);
    commit(e.store, { ...EMPTY, shapes: [rect('a', 0, 0, 10, 10)] });
    expect(st.m.get(AUTOSAVE_KEY)).toBeDefined();
    const saved = st.m.get(AUTOSAVE_KEY);
    previewGesture(e.store, { ...EMPTY, shapes: [rect('a', 5, 0, 10, 10)] });
    expect(st.m.get(AUTOSAVE_KEY)).toBe(saved);
    endGesture(e.store);
    expect(st.m.get(AUTOSAVE_KEY)).not.toBe(saved);
    const r = restoreDocument(st);
    expect(r.restored).toBe(true);
    expect(r.doc).toEqual(e.store.getState().doc);
  });
  it('starts with the demo when nothing is stored, and keeps a bad copy aside', () => {
    expect(restoreDocument(memory()).doc).toBe(DEMO_DOCUMENT);
    const st = memory();
    st.setItem(AUTOSAVE_KEY, '{"format":"kern-section","version":1,"units":"furlong","shapes":[]}');
    const r = restoreDocument(st);
    expect(r.restored).toBe(false);
    expect(r.problems.join(' ')).toMatch(/units/);
    expect(st.m.get(REJECTED_KEY)).toMatch(/furlong/);
  });
});

describe('view follows the units', () => {
  it('keeps the picture size on a unit switch and on its undo', () => {
    const e = editorWith([rect('a', 0, 0, 100, 200)]);
    e.store.setState({ scale: 2, cutAt: 50 });
    e.run('units.set', 'cm');
    // 1 cm = 10 mm (SI): ten times the pixels per unit, the cut at 5 cm.
    expect(e.store.getState().scale).toBeCloseTo(20, 12);
    expect(e.store.getState().cutAt).toBeCloseTo(5, 12);
    undo(e.store);
    expect(e.store.getState().doc.units).toBe('mm');
    expect(e.store.getState().scale).toBeCloseTo(2, 12);
    expect(e.store.getState().cutAt).toBeCloseTo(50, 12);
  });
});
