/**
 * Materials and loads in the editor without a browser (app/ops/materials.ts, the commands and the
 * probe tool): every change is one undo step, refused changes say why and change nothing, unit
 * changes keep the physical values. Unit factors: 1 ksi = 6.894757293168361 MPa (NIST SP 811,
 * App. B); 1 kN = 1000 N and 1 m = 1000 mm by definition. Library values as src/materials/library.ts
 * (EN 1993-1-1 for S355, from memory).
 */
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { materialsUi } from '../app/materials/state';
import { addLibraryMaterial, addMaterial, removeMaterial, setForceUnit, setLoad, setMomentLength, setReference, setSelectionMaterial, setStressUnit, updateMaterial, materialIdFor } from '../app/ops/materials';
import { stressSectionOf, loadCaseOf } from '../app/materials/derived';
import { undo } from '../app/store/history';
import type { SectionDocument, Shape } from '../src';
import { close } from './helpers';

const rect = (id: string, x: number, y: number, w: number, h: number): Shape => ({ id, type: 'rectangle', at: [x, y], width: w, height: h }) as Shape;
function editor(more: Partial<SectionDocument> = {}) {
  return createEditor({ format: 'kern-section', version: 2, units: 'mm', shapes: [rect('timber', 0, 0, 100, 200), rect('plate', 0, -10, 100, 10)], ...more }, { worker: false });
}
const doc = (e: ReturnType<typeof editor>) => e.store.getState().doc;
const steps = (e: ReturnType<typeof editor>) => e.store.getState().past.length;

describe('materials in the document', () => {
  it('adds library materials (the first is the reference), one undo step each', () => {
    const e = editor();
    expect(addLibraryMaterial(e.ctx, 'softwood-c24')).toEqual({ id: 'softwood-c24' });
    expect(addLibraryMaterial(e.ctx, 'steel-s355')).toEqual({ id: 'steel-s355' });
    expect(doc(e).reference).toBe('softwood-c24');
    expect(doc(e).materials!.map((m) => m.E)).toEqual([11000, 210000]);
    expect(steps(e)).toBe(2);
    // The same library material twice gets a new id.
    expect(addLibraryMaterial(e.ctx, 'steel-s355')).toEqual({ id: 'steel-s355-2' });
    undo(e.store);
    undo(e.store);
    expect(doc(e).materials!.map((m) => m.id)).toEqual(['softwood-c24']);
    expect(addLibraryMaterial(e.ctx, 'unobtainium')).toEqual({ error: 'There is no library material "unobtainium".' });
  });

  it('in a ksi document, library values arrive in ksi', () => {
    const e = editor({ stressUnit: 'ksi' });
    addLibraryMaterial(e.ctx, 'steel-s355');
    close(doc(e).materials![0].E, 210000 / 6.894757293168361, 1e-14);
  });

  it('by hand: an id from the name; a bad value is refused with its path, and nothing changes', () => {
    const e = editor();
    expect(materialIdFor('Glulam GL28h', new Set())).toBe('glulam-gl28h');
    expect(addMaterial(e.ctx, { name: 'Glulam GL28h', E: 12600, fy: 28, density: 460 })).toEqual({ id: 'glulam-gl28h' });
    const before = doc(e);
    const err = updateMaterial(e.ctx, 'glulam-gl28h', { E: -5 });
    expect(err).toMatch(/^materials\[0\]\.E: the elastic modulus E must be a number greater than 0, got -5/);
    expect(doc(e)).toBe(before);
    expect(updateMaterial(e.ctx, 'glulam-gl28h', { nu: 0.7 })).toMatch(/materials\[0\]\.nu: Poisson's ratio/);
    expect(updateMaterial(e.ctx, 'glulam-gl28h', { name: 'Glulam GL28h, kiln dried' })).toBeNull();
    expect(doc(e).materials![0].name).toBe('Glulam GL28h, kiln dried');
    expect(addMaterial(e.ctx, { name: 'x', E: 1, fy: 0, density: 1 })).toEqual({ error: expect.stringMatching(/materials\[1\]\.fy/) });
  });

  it('assigns the material of the selection in one step; the evaluation then has two materials', () => {
    const e = editor();
    addLibraryMaterial(e.ctx, 'softwood-c24');
    addLibraryMaterial(e.ctx, 'steel-s355');
    e.store.setState({ selected: ['plate'] });
    const n = steps(e);
    expect(e.run('material.assign', 'steel-s355')).toBe(true);
    expect(steps(e)).toBe(n + 1);
    expect(doc(e).shapes[1].material).toBe('steel-s355');
    const d = doc(e);
    const s = stressSectionOf(d, e.results.evaluate(d)).section!;
    expect(s.parts.map((p) => p.material.id)).toEqual(['softwood-c24', 'steel-s355']);
    // Back to the reference: the field goes away.
    expect(setSelectionMaterial(e.ctx, null)).toBeNull();
    expect('material' in doc(e).shapes[1]).toBe(false);
    expect(setSelectionMaterial(e.ctx, 'nope')).toMatch(/There is no material "nope"/);
    undo(e.store);
    expect(doc(e).shapes[1].material).toBe('steel-s355');
  });

  it('refuses to remove a material in use or the reference, and removing the last leaves one material', () => {
    const e = editor();
    addLibraryMaterial(e.ctx, 'softwood-c24');
    addLibraryMaterial(e.ctx, 'steel-s355');
    e.store.setState({ selected: ['plate'] });
    setSelectionMaterial(e.ctx, 'steel-s355');
    expect(removeMaterial(e.ctx, 'steel-s355')).toBe('Structural steel S355 is used by 1 shape (Rectangle 2): give it another material first.');
    expect(removeMaterial(e.ctx, 'softwood-c24')).toMatch(/is the reference material: make another material the reference first/);
    setSelectionMaterial(e.ctx, null);
    expect(removeMaterial(e.ctx, 'steel-s355')).toBeNull();
    expect(setReference(e.ctx, 'softwood-c24')).toBeNull();
    expect(removeMaterial(e.ctx, 'softwood-c24')).toBeNull();
    expect(doc(e).materials).toBeUndefined();
    expect(doc(e).reference).toBeUndefined();
  });
});

describe('units and loads', () => {
  it('a new stress unit converts E and fy; a new force unit or moment length converts the loads', () => {
    const e = editor();
    addLibraryMaterial(e.ctx, 'steel-s355');
    expect(setStressUnit(e.ctx, 'ksi')).toBeNull();
    close(doc(e).materials![0].fy, 355 / 6.894757293168361, 1e-14);
    expect(setLoad(e.ctx, 'Mx', 12)).toBeNull(); // 12 kN·mm
    expect(setLoad(e.ctx, 'N', 5)).toBeNull();
    expect(setMomentLength(e.ctx, 'm')).toBeNull();
    close(doc(e).loads!.Mx!, 0.012, 1e-14);
    expect(setForceUnit(e.ctx, 'N')).toBeNull();
    close(doc(e).loads!.N!, 5000, 1e-14);
    close(doc(e).loads!.Mx!, 12, 1e-14);
    expect(doc(e).momentLength).toBe('m');
  });

  it('loads: one step each, an empty value removes one, a non-number is refused', () => {
    const e = editor();
    const n = steps(e);
    setLoad(e.ctx, 'Mx', 3);
    setLoad(e.ctx, 'Mx', 3); // unchanged: no step
    expect(steps(e)).toBe(n + 1);
    expect(setLoad(e.ctx, 'N', Infinity)).toBe('N must be a finite number.');
    expect(setLoad(e.ctx, 'Mx', null)).toBeNull();
    expect(doc(e).loads).toBeUndefined();
  });

  it('the load case follows the document: without materials the section is one material (flexure formula)', () => {
    const e = editor({ momentLength: 'm' });
    setLoad(e.ctx, 'Mx', 10);
    const d = doc(e);
    const s = stressSectionOf(d, e.results.evaluate(d)).section!;
    const lc = loadCaseOf(d, s, null);
    if ('error' in lc) throw new Error(lc.error);
    // 100 × 210 rectangle (timber and plate, one material): σ = M c / I (Gere & Goodno, Sec. 5.5).
    const I = (100 * 210 ** 3) / 12;
    close(lc.extremes.maxTension!.value, (10e6 * 105) / I, 1e-13);
    expect(loadCaseOf(d, s, null)).toBe(lc);
  });
});

describe('commands and the stress probe', () => {
  it('open the dialog, toggle the kern and stress views, and take a typed point with the probe', () => {
    const e = editor();
    e.run('materials.open');
    expect(materialsUi(e.store).getState().dialogOpen).toBe(true);
    const k = e.store.getState().overlays.kern;
    e.run('view.kern');
    expect(e.store.getState().overlays.kern).toBe(!k);
    e.run('view.stress');
    expect(e.store.getState().overlays.stress).toBe(false);
    e.run('tool.probe');
    expect(e.store.getState().tool).toBe('probe');
    expect(e.type('50, 200')).toBeNull();
    expect(materialsUi(e.store).getState().probe).toEqual([50, 200]);
    expect(e.type('d 0, -10')).toBeNull();
    expect(materialsUi(e.store).getState().probe).toEqual([50, 190]);
    // A new length unit carries the point with the section: 50 mm = 5 cm.
    e.run('units.set', 'cm');
    expect(materialsUi(e.store).getState().probe).toEqual([5, 19]);
    e.tool().key(e.env, 'escape');
    expect(e.store.getState().tool).toBe('select');
    expect(e.run('material.assign', 'x')).toBe(false); // nothing selected
  });
});
