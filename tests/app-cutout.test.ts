/**
 * The cutout check in the editor, without a browser: proposals through the command table (one
 * undo step each, switching included), the baseline's live evaluation beside an active proposal
 * (evaluated once per baseline change, not per proposal edit), the limits editor's document
 * changes, and the net-section lines with their tool. Property values are checked against hand
 * calculations by the composite method (Hibbeler, Statics, Sec. 10.4, composite areas with holes
 * as negative areas; rectangle Ix = bh³/12, Gere & Goodno, plane areas, case 1; from memory).
 */
import { describe, expect, it } from 'vitest';
import { createEditor } from '../app/editor';
import { comparisonOf, limitCheckOf, limitsInForce, cautionsOf } from '../app/store/cutout';
import { activeSection } from '../app/store/section';
import { baselineSection } from '../app/store/baseline';
import { cutoutAnalysis } from '../app/store/analysis';
import { beginGesture, endGesture, previewGesture } from '../app/store/history';
import { withActiveShapes } from '../app/store/section';
import { exampleLimits, evaluateDocument, type SectionDocument, type Shape } from '../src';

const plate = (): SectionDocument => ({
  format: 'kern-section',
  version: 2,
  units: 'mm',
  shapes: [{ id: 'plate', type: 'rectangle', at: [0, 0], width: 200, height: 100 } as Shape],
});

const notch: Shape = { id: 'notch', type: 'rectangle', at: [120, 70], width: 40, height: 60, op: 'subtract' } as Shape;

function withNotch(e: ReturnType<typeof createEditor>) {
  e.run('proposal.new');
  e.env.addShape({ ...notch } as never);
}

const doc = (e: ReturnType<typeof createEditor>) => e.store.getState().doc;

describe('proposals through the command table', () => {
  it('New proposal is one undo step: a copy of the baseline, shown', () => {
    const e = createEditor(plate());
    const before = doc(e);
    e.run('proposal.new');
    expect(doc(e).variants).toEqual([{ name: 'Proposal 1', shapes: ['plate'] }]);
    expect(doc(e).activeVariant).toBe('Proposal 1');
    e.run('undo');
    expect(doc(e)).toBe(before);
  });
  it('an edit while a proposal is shown goes into the proposal, not the baseline', () => {
    const e = createEditor(plate());
    withNotch(e);
    expect(doc(e).shapes.map((s) => s.id)).toEqual(['plate']);
    expect(doc(e).variants![0].shapes).toEqual(['plate', expect.objectContaining({ id: 'notch', op: 'subtract' })]);
  });
  it('switching is one click and one undo step each way', () => {
    const e = createEditor(plate());
    withNotch(e);
    const steps = e.store.getState().past.length;
    e.run('proposal.baseline');
    expect(doc(e).activeVariant).toBeUndefined();
    expect(e.store.getState().past.length).toBe(steps + 1);
    e.run('proposal.show', 'Proposal 1');
    expect(doc(e).activeVariant).toBe('Proposal 1');
    e.run('undo');
    expect(doc(e).activeVariant).toBeUndefined();
    e.run('undo');
    expect(doc(e).activeVariant).toBe('Proposal 1');
    // Showing what is shown records nothing.
    const n = e.store.getState().past.length;
    e.run('proposal.show', 'Proposal 1');
    expect(e.store.getState().past.length).toBe(n);
  });
  it('rename keeps it shown; a taken or empty name changes nothing', () => {
    const e = createEditor(plate());
    e.run('proposal.new');
    e.run('proposal.new');
    e.run('proposal.rename', { from: 'Proposal 2', to: '  Cope at the end  ' });
    expect(doc(e).variants!.map((v) => v.name)).toEqual(['Proposal 1', 'Cope at the end']);
    expect(doc(e).activeVariant).toBe('Cope at the end');
    const d = doc(e);
    e.run('proposal.rename', { from: 'Cope at the end', to: 'Proposal 1' });
    e.run('proposal.rename', { from: 'Cope at the end', to: '   ' });
    e.run('proposal.rename', { from: 'Cope at the end', to: 'Baseline' });
    expect(doc(e)).toBe(d);
  });
  it('delete removes the proposal and shows the baseline when it was shown; undo brings it back', () => {
    const e = createEditor(plate());
    withNotch(e);
    const d = doc(e);
    e.run('proposal.delete', 'Proposal 1');
    expect(doc(e).variants).toBeUndefined();
    expect(doc(e).activeVariant).toBeUndefined();
    e.run('undo');
    expect(doc(e)).toBe(d);
  });
});

describe('the baseline evaluated beside an active proposal', () => {
  it('holds the baseline evaluation while a proposal is shown, none otherwise', () => {
    const e = createEditor(plate());
    expect(e.results.results.getState().baseline).toBeNull();
    withNotch(e);
    const r = e.results.results.getState();
    expect(r.baseline).not.toBeNull();
    // Plate 200 × 100: A = 20000, Ix = 200·100³/12 (Gere & Goodno, plane areas, case 1).
    expect(r.baseline!.evaluation.props!.area).toBeCloseTo(20000, 9);
    expect(Math.abs(r.baseline!.evaluation.props!.Ix - (200 * 100 ** 3) / 12)).toBeLessThanOrEqual(1e-12 * 1.7e7);
    expect(r.baseline!.doc).toBe(baselineSection(doc(e)));
    expect(e.results.idle()).toBe(true);
    e.run('proposal.baseline');
    expect(e.results.results.getState().baseline).toBeNull();
  });
  it('editing the proposal does not evaluate the baseline again', () => {
    const e = createEditor(plate());
    withNotch(e);
    const first = e.results.results.getState().baseline!.evaluation;
    // Move the notch: a proposal edit.
    e.run('select.all');
    e.store.setState({ selected: ['notch'] });
    e.run('edit.move', [-10, 0]);
    const r = e.results.results.getState();
    expect(r.baseline!.evaluation).toBe(first);
    expect(activeSection(doc(e)).shapes[1]).toMatchObject({ at: [110, 70] });
    expect(r.doc).toBe(activeSection(doc(e)));
  });
  it('compares every property by the composite method (notch as a negative area)', () => {
    const e = createEditor(plate());
    withNotch(e);
    const r = e.results.results.getState();
    const c = comparisonOf(r.baseline!.evaluation.props!, r.evaluation.props!);
    // Removed: [120, 160] × [70, 100], A2 = 1200, ȳ2 = 85, Ix2 = 40·30³/12.
    const A1 = 20000, y1 = 50, I1 = (200 * 100 ** 3) / 12, A2 = 1200, y2 = 85, I2 = (40 * 30 ** 3) / 12;
    const A = A1 - A2, yb = (A1 * y1 - A2 * y2) / A;
    const Ix = I1 + A1 * (y1 - yb) ** 2 - (I2 + A2 * (y2 - yb) ** 2);
    const row = c.rows.find((x) => x.key === 'Ix')!;
    expect(Math.abs(row.changePercent! - (100 * (Ix - I1)) / I1)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(c.centroidShift.dy - (yb - y1))).toBeLessThanOrEqual(1e-12 * 200);
  });
});

describe('the limits editor', () => {
  it('starts from the example limits, labelled as such, and the first edit saves the whole list', () => {
    const e = createEditor(plate());
    expect(limitsInForce(doc(e))).toEqual({ limits: exampleLimits(1e-3), examples: true });
    e.run('limits.set', { index: 0, field: 'maxLossPercent', value: 5 });
    expect(doc(e).limits).toEqual([{ property: 'Ix', maxLossPercent: 5 }, ...exampleLimits(1e-3).slice(1)]);
    expect(limitsInForce(doc(e)).examples).toBe(false);
    e.run('undo');
    expect(doc(e).limits).toBeUndefined();
  });
  it('a verdict flips at the limit and just past it', () => {
    const e = createEditor(plate());
    withNotch(e);
    const r = e.results.results.getState();
    const c = comparisonOf(r.baseline!.evaluation.props!, r.evaluation.props!);
    const loss = -c.rows.find((x) => x.key === 'Ix')!.changePercent!;
    e.run('limits.set', { index: 0, field: 'maxLossPercent', value: loss });
    // Keep only the Ix limit: remove the others, last first.
    for (let k = limitsInForce(doc(e)).limits.length - 1; k >= 1; k--) e.run('limits.remove', k);
    expect(doc(e).limits).toEqual([{ property: 'Ix', maxLossPercent: loss }]);
    expect(limitCheckOf(c, doc(e).limits!, 'mm').verdict).toBe('within');
    e.run('limits.set', { index: 0, field: 'maxLossPercent', value: loss * (1 - 1e-6) });
    expect(limitCheckOf(c, doc(e).limits!, 'mm').verdict).toBe('beyond');
  });
  it('adds and removes limits; refuses what the engine refuses; clearing the last field removes the limit', () => {
    const e = createEditor(plate());
    e.run('limits.add', { property: 'Iy' });
    expect(doc(e).limits!.at(-1)).toEqual({ property: 'Iy', maxLossPercent: 10 });
    const d = doc(e);
    e.run('limits.add', { property: 'Iy' }); // already limited
    e.run('limits.add', { property: 'Qx' }); // takes no limit
    e.run('limits.set', { index: 0, field: 'maxLossPercent', value: 120 }); // a loss above 100 %
    e.run('limits.set', { index: 0, field: 'maxLossPercent', value: -1 });
    e.run('limits.set', { index: 0, field: 'maxShift', value: 3 }); // not a field of Ix
    expect(doc(e)).toBe(d);
    const n = d.limits!.length;
    e.run('limits.set', { index: n - 1, field: 'maxLossPercent', value: null });
    expect(doc(e).limits!.length).toBe(n - 1);
    e.run('limits.examples');
    expect(doc(e).limits).toBeUndefined();
  });
  it('keeps the hole rules in the document', () => {
    const e = createEditor(plate());
    e.run('holeRules.set', 'aisc360');
    expect(doc(e).holeRules).toBe('aisc360');
    e.run('holeRules.set', 'nonsense');
    expect(doc(e).holeRules).toBe('aisc360');
  });
});

describe('net-section lines', () => {
  it('the tool takes two typed points and keeps the line in the document (one undo step)', () => {
    const e = createEditor(plate());
    e.run('tool.netline');
    expect(e.type('-10, 50')).toBeNull();
    expect(e.type('210, 50')).toBeNull();
    expect(doc(e).netLines).toEqual([{ from: [-10, 50], to: [210, 50] }]);
    e.run('netline.set', { index: 0, name: 'Mid-depth' });
    expect(doc(e).netLines![0].name).toBe('Mid-depth');
    e.run('netline.delete', 0);
    expect(doc(e).netLines).toBeUndefined();
    e.run('undo');
    e.run('undo');
    expect(doc(e).netLines).toEqual([{ from: [-10, 50], to: [210, 50] }]);
  });
});

describe('cautions for the active section', () => {
  it('with a proposal: only what is new; the baseline alone gives its own', () => {
    const e = createEditor(plate());
    withNotch(e);
    const r = e.results.results.getState();
    const c = cautionsOf(activeSection(doc(e)), r.evaluation, r.baseline);
    // The notch leaves two sharp inside corners, at (120, 70) and (160, 70).
    const corners = c.cautions.filter((k) => k.kind === 're-entrant-corner').map((k) => [k.at.x, k.at.y]);
    expect(corners.sort()).toEqual([[120, 70], [160, 70]]);
    expect(c.cautions.find((k) => k.kind === 're-entrant-corner')!.shape).toEqual({ id: 'notch', name: 'Rectangle 2' });
    expect(c.cautions.find((k) => k.kind === 're-entrant-corner')!.message).toContain('“Rectangle 2” (notch)');
    expect(c.baseline).toEqual([]);
    // Same result as the engine on the document itself.
    expect(evaluateDocument(baselineSection(doc(e))).props!.area).toBe(20000);
  });
});

describe('hole cautions follow the rule set kept in the document', () => {
  // EN 1993-1-8, Table 3.3: e1, e2 ≥ 1.2 d0; AISC 360-16, Table J3.4M (from memory, as in
  // src/cautions/hole-rules.ts). A Ø20 hole with its centre 1.0 d0 = 20 from the plate's edge fails
  // both; at 2.0 d0 = 40 it passes both.
  const withHole = (cx: number) => {
    const e = createEditor(plate());
    e.run('proposal.new');
    e.env.addShape({ id: 'bolt', type: 'circle', center: [cx, 50], radius: 10, op: 'subtract' } as never);
    return e;
  };
  const edgeCautions = (e: ReturnType<typeof createEditor>) => {
    const r = e.results.results.getState();
    return cautionsOf(activeSection(doc(e)), r.evaluation, r.baseline).cautions.filter((k) => k.kind === 'hole-edge-distance');
  };
  it('a hole at 1.0 d from the edge is flagged with the EN rule, then with AISC once chosen', () => {
    const e = withHole(20);
    const en = edgeCautions(e);
    expect(en).toHaveLength(1);
    expect(en[0].source).toMatch(/EN 1993-1-8/);
    expect(en[0].values!.centreDistance).toBeCloseTo(20, 12);
    e.run('holeRules.set', 'aisc360');
    const aisc = edgeCautions(e);
    expect(aisc).toHaveLength(1);
    expect(aisc[0].source).toMatch(/AISC 360-16, Section J3.4/);
  });
  it('a hole at 2.0 d from the edge is not', () => {
    expect(edgeCautions(withHole(40))).toEqual([]);
  });
});


describe('the cutout analysis beside the live results (main thread here; a worker in the browser)', () => {
  it('answers for the results shown, waits while a drag runs, and answers again when it ends', async () => {
    const e = createEditor(plate());
    withNotch(e);
    const a = cutoutAnalysis(e.store, e.results);
    await Promise.resolve();
    let s = a.getState();
    expect(s.forEvaluation).toBe(e.results.results.getState().evaluation);
    // Removed: the notch inside the plate, 40 × 30 (composite method: the notch's own area).
    expect(Math.abs(s.change!.removedArea - 1200)).toBeLessThanOrEqual(1e-9 * 1200);
    expect(s.cautions!.cautions.filter((c) => c.kind === 're-entrant-corner')).toHaveLength(2);
    expect(s.cautions!.baseline).toEqual([]);
    // A drag: the results follow, the analysis waits.
    beginGesture(e.store);
    const moved = activeSection(doc(e)).shapes.map((x) => (x.id === 'notch' ? { ...x, at: [100, 70] } : x)) as Shape[];
    previewGesture(e.store, withActiveShapes(doc(e), moved));
    expect(e.results.results.getState().evaluation).not.toBe(s.forEvaluation);
    expect(a.getState().forEvaluation).toBe(s.forEvaluation);
    endGesture(e.store);
    s = a.getState();
    expect(s.forEvaluation).toBe(e.results.results.getState().evaluation);
    expect(s.cautions!.cautions.filter((c) => c.kind === 're-entrant-corner').map((c) => c.at.x).sort()).toEqual([100, 140]);
  });
  it('a changed rule set is analysed again', async () => {
    const e = createEditor(plate());
    const a = cutoutAnalysis(e.store, e.results);
    await Promise.resolve();
    expect(a.getState().cautions!.rules).toBe('en1993');
    e.run('holeRules.set', 'aisc360');
    expect(a.getState().cautions!.rules).toBe('aisc360');
  });
});
