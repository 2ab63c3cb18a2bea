/**
 * Section document version 2: the migration from version 1, ids assigned to shapes written
 * without one, proposals (variants) resolved and written back, and the validation of the new
 * fields with their paths. Behaviour of the format itself; no outside source.
 */
import { describe, expect, it } from 'vitest';
import { addVariant, allShapeIds, evaluateDocument, formatIssue, parseDocument, sectionOf, serialiseDocumentText, validateDocument, withSectionShapes, type SectionDocument } from '../src';

const v1 = {
  format: 'kern-section',
  version: 1,
  units: 'mm',
  name: 'Plate',
  shapes: [
    { id: 'plate', type: 'rectangle', at: [0, 0], width: 200, height: 100 },
    { id: 'bore', type: 'circle', center: [140, 35], radius: 20, op: 'subtract' },
  ],
};

function ok(value: unknown): SectionDocument {
  const r = validateDocument(value);
  if (!r.ok) throw new Error(r.errors.map(formatIssue).join('\n'));
  return r.doc;
}
function errors(value: unknown): string[] {
  const r = validateDocument(value);
  return r.ok ? [] : r.errors.map(formatIssue);
}

describe('version 1 → 2', () => {
  it('a version-1 file opens as a version-2 document with only a baseline, shapes unchanged', () => {
    const d = ok(v1);
    expect(d.version).toBe(2);
    expect(d.shapes).toEqual(v1.shapes);
    expect(d.variants).toBeUndefined();
    expect(sectionOf(d, null)).toBe(d);
  });
});

describe('shape ids', () => {
  it('a shape without an id gets a stable one; the file keeps it on save and reopens the same', () => {
    const text = JSON.stringify({ ...v1, version: 2, shapes: [{ type: 'rectangle', at: [0, 0], width: 10, height: 5 }, { id: 's1', type: 'circle', center: [5, 2], radius: 1, op: 'subtract' }, { type: 'circle', center: [1, 1], radius: 0.5 }] });
    const a = parseDocument(text);
    const b = parseDocument(text);
    if (!a.ok || !b.ok) throw new Error('not read');
    const ids = a.doc.shapes.map((s) => s.id);
    expect(new Set(ids).size).toBe(3);
    expect(ids[1]).toBe('s1');
    expect(b.doc.shapes.map((s) => s.id)).toEqual(ids);
    const again = parseDocument(serialiseDocumentText(a.doc));
    if (!again.ok) throw new Error('not reopened');
    expect(again.doc.shapes.map((s) => s.id)).toEqual(ids);
  });
  it('still refuses two shapes with the same id', () => {
    expect(errors({ ...v1, shapes: [v1.shapes[0], { ...v1.shapes[1], id: 'plate' }] })).toContain('shapes[1].id: id "plate" is already used by shapes[0]');
  });
});

describe('proposals', () => {
  const base = ok(v1);
  it('a new proposal starts as a copy of the baseline and gives the same properties', () => {
    const d = addVariant(base, 'Cope');
    expect(d.activeVariant).toBe('Cope');
    expect(d.variants![0].shapes).toEqual(['plate', 'bore']);
    expect(evaluateDocument(sectionOf(d, 'Cope')).props!.Ix).toBe(evaluateDocument(base).props!.Ix);
    // The resolved proposal holds the baseline's own records (the evaluator's caches hit).
    expect(sectionOf(d, 'Cope').shapes[0]).toBe(base.shapes[0]);
  });
  it('an edited proposal keeps references to the baseline shapes it did not change', () => {
    const d = addVariant(base, 'Cope');
    const shapes = [...sectionOf(d, 'Cope').shapes, { id: 'cope', type: 'rectangle' as const, at: [180, 80] as [number, number], width: 20, height: 20, op: 'subtract' as const }];
    const e = withSectionShapes(d, 'Cope', shapes);
    expect(e.variants![0].shapes.slice(0, 2)).toEqual(['plate', 'bore']);
    expect(e.shapes).toBe(d.shapes);
    // The baseline is untouched; the proposal lost exactly the 20 × 20 corner.
    expect(evaluateDocument(sectionOf(e, 'Cope')).props!.area).toBeCloseTo(evaluateDocument(base).props!.area - 400, 9);
    expect(allShapeIds(e)).toEqual(new Set(['plate', 'bore', 'cope']));
  });
  it('a baseline shape deleted from the baseline leaves the proposals that referred to it', () => {
    const d = addVariant(base, 'Cope');
    const e = withSectionShapes(d, null, [d.shapes[0]]);
    expect(e.variants![0].shapes).toEqual(['plate']);
  });
  it('a proposal that refers to a shape that does not exist is refused with its path', () => {
    const errs = errors({ ...v1, variants: [{ name: 'P1', shapes: ['plate', 'web'] }] });
    expect(errs).toEqual(['variants[0].shapes[1]: no baseline shape has the id "web"; name a shape of the baseline, or give the new shape in full']);
  });
  it('refuses duplicate names, an unknown active proposal, and bad shapes inside a proposal', () => {
    const errs = errors({
      ...v1,
      variants: [
        { name: 'P', shapes: ['plate'] },
        { name: 'P', shapes: ['plate', { id: 'x', type: 'circle', center: [0, 0], radius: -2 }, 'plate'] },
      ],
      activeVariant: 'Q',
    });
    expect(errs).toContain('variants[1].name: the name "P" is already used by variants[0]');
    expect(errs).toContain('variants[1].shapes[1].radius: radius must be greater than 0, got -2');
    expect(errs).toContain('variants[1].shapes[2]: the shape "plate" appears twice in this proposal (also at shapes[0])');
    expect(errs).toContain('activeVariant: there is no proposal named "Q" to show');
  });
  it('new shapes of a proposal written without ids get ids no other shape uses', () => {
    const d = ok({ ...v1, variants: [{ name: 'P', shapes: ['plate', { type: 'circle', center: [20, 20], radius: 5, op: 'subtract' }] }] });
    const added = d.variants![0].shapes[1];
    expect(typeof added === 'object' && !['plate', 'bore'].includes(added.id)).toBe(true);
  });
});

describe('materials, loads and checker fields', () => {
  const mats = { materials: [{ id: 'steel', name: 'Steel', E: 210000, density: 7850, fy: 355 }], reference: 'steel' };
  it('accepts a well-formed set', () => {
    const d = ok({ ...v1, ...mats, shapes: [{ ...v1.shapes[0], material: 'steel' }], loads: { N: -1000, Mx: 2e6 }, revisions: [{ revision: 'A', date: '2026-12-02', description: 'First issue', by: 'AD' }], notes: 'Checked against the shop drawing.', checked: { by: 'CK', date: '2026-12-03' } });
    expect(d.materials![0].id).toBe('steel');
  });
  it('an unknown material id and a missing reference are refused with their paths', () => {
    expect(errors({ ...v1, materials: mats.materials, shapes: [{ ...v1.shapes[0], material: 'timber' }] })).toEqual([
      'reference: name the reference material (one of steel): the transformed section is expressed in it',
      'shapes[0].material: unknown material "timber"; the document has steel',
    ]);
    expect(errors({ ...v1, reference: 'steel' })).toEqual(['reference: a reference material needs a list of materials']);
  });
  it('refuses bad values with their paths', () => {
    const errs = errors({ ...v1, materials: [{ id: 'm', name: 'M', E: 0, density: -1, fy: 'x' }], reference: 'm', loads: { N: 'big', T: 1 }, revisions: [{ revision: 'A' }], checked: 'yes' });
    expect(errs).toContain('materials[0].E: the elastic modulus E must be a number greater than 0, got 0');
    expect(errs).toContain('materials[0].density: density (kg/m³) must be a number of 0 or more, got -1');
    expect(errs).toContain('loads.N: must be a finite number, got "big"');
    expect(errs).toContain('loads.T: unknown load; use N, Mx, My or V');
    expect(errs).toContain('revisions[0].date: must be text (empty text if unknown)');
    expect(errs).toContain('checked: checked must be an object {by, date}');
  });
});

describe('units of a version-2 document', () => {
  it('a change of units scales the proposals, the length limits and the moments given per document length', async () => {
    const { convertDocumentUnits } = await import('../src');
    const d = ok({
      ...v1,
      variants: [{ name: 'P', shapes: ['plate', { id: 'cope', type: 'rectangle', at: [180, 80], width: 20, height: 20, op: 'subtract' }] }],
      limits: [{ property: 'centroid', maxShift: 2 }, { property: 'Ix', maxLossPercent: 10 }],
      loads: { N: 10, Mx: 5000 },
    });
    const cm = convertDocumentUnits(d, 'cm');
    // 1 cm = 10 mm exactly (SI).
    expect(cm.variants![0].shapes[1]).toMatchObject({ at: [18, 8], width: 2, height: 2 });
    expect(cm.limits).toEqual([{ property: 'centroid', maxShift: 0.2 }, { property: 'Ix', maxLossPercent: 10 }]);
    expect(cm.loads).toEqual({ N: 10, Mx: 500 });
    expect(convertDocumentUnits({ ...d, momentLength: 'm' }, 'cm').loads).toEqual({ N: 10, Mx: 5000 });
  });
});
