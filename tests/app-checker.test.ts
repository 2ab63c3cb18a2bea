/**
 * Issue 8 on the app side, without a browser: the checker's fields edited through the command
 * table (one undo step each, kept in the document, printed in the report), the one naming in
 * warnings and cautions, the cut readout with both one-sided widths, and the dimensions laid out
 * for the canvas.
 *
 * Sources:
 * - IPE 300 nominal dimensions, EN 10365: h = 300, b = 150, tw = 7.1, tf = 10.7, r = 15 mm (from
 *   memory, as in tests/width.test.ts). At the flange underside the width just above is the
 *   flange width b and just below it is tw + 2r, the root fillets being quarter circles tangent to
 *   the underside (circle geometry).
 * - Q of the flange about the neutral axis, b·tf·(h − tf)/2 (Gere & Goodno, Mechanics of Materials,
 *   shear stresses in the webs of beams with flanges).
 * - Plate with a hole: its diameter and the distances of its centre from the plate's left and
 *   bottom edges are the input (what the drawing must show), no outside source needed.
 * - Revision marks counting on (A → B, P1 → P2): common practice on drawings, no source.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { createEditor } from '../app/editor';
import { nextRevisionMark } from '../app/ops/checker';
import { cutReadout } from '../app/ops/cut-readout';
import { canvasDimensions, PX_PER_MM } from '../app/canvas/dimension-layout';
import { cutLabelLines } from '../app/canvas/layers/Cut';
import { DEMO_DOCUMENT, emptySectionText, evaluateDocument, formatShapeIssue, parseFormatted, type SectionDocument, type Shape } from '../src';
import { findDimensionFeatures, renderReportHtml } from '../src/report';
import { close } from './helpers';

const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
const doc = (shapes: Shape[]): SectionDocument => ({ ...EMPTY, shapes });

describe('checker fields in the app', () => {
  test('revision lines are added, edited and deleted, one undo step each, and kept in the document', () => {
    const e = createEditor({ ...DEMO_DOCUMENT });
    const st = () => e.store.getState();
    const steps = () => st().past.length;
    e.run('doc.addRevision', { date: '2026-12-03' });
    expect(st().doc.revisions).toEqual([{ revision: 'B', date: '2026-12-03', description: '', by: '' }]); // after the title block's A
    expect(steps()).toBe(1);
    e.run('doc.setRevision', { index: 0, field: 'description', value: 'Conduit opening\nadded' });
    e.run('doc.setRevision', { index: 0, field: 'by', value: 'AD' });
    e.run('doc.setRevision', { index: 0, field: 'by', value: 'AD' }); // unchanged: nothing recorded
    expect(steps()).toBe(3);
    expect(st().doc.revisions![0]).toEqual({ revision: 'B', date: '2026-12-03', description: 'Conduit opening added', by: 'AD' });
    e.run('doc.addRevision', { date: '2026-12-04' });
    expect(st().doc.revisions!.map((r) => r.revision)).toEqual(['B', 'C']);
    e.run('doc.setRevision', { index: 5, field: 'by', value: 'X' }); // no such line: nothing
    e.run('doc.setRevision', { index: 0, field: 'colour', value: 'X' }); // no such field: nothing
    expect(steps()).toBe(4);
    e.run('doc.deleteRevision', 0);
    expect(st().doc.revisions!.map((r) => r.revision)).toEqual(['C']);
    e.run('undo');
    expect(st().doc.revisions!.map((r) => r.revision)).toEqual(['B', 'C']);
    e.run('redo');
    e.run('doc.deleteRevision', 0);
    expect('revisions' in st().doc).toBe(false); // an empty history leaves the document
  });

  test('notes and checked by / date: one step each, empty values leave the document', () => {
    const e = createEditor(EMPTY);
    const st = () => e.store.getState();
    e.run('doc.setNotes', 'Edge of the opening ground smooth.\r\nWeb buckling checked separately.');
    expect(st().doc.notes).toBe('Edge of the opening ground smooth.\nWeb buckling checked separately.');
    e.run('doc.setChecked', { field: 'by', value: 'B. Checker' });
    e.run('doc.setChecked', { field: 'date', value: '2026-12-04' });
    expect(st().doc.checked).toEqual({ by: 'B. Checker', date: '2026-12-04' });
    expect(st().past.length).toBe(3);
    e.run('undo');
    expect(st().doc.checked).toEqual({ by: 'B. Checker', date: '' });
    e.run('doc.setChecked', { field: 'by', value: '' });
    expect('checked' in st().doc).toBe(false);
    e.run('doc.setNotes', '   ');
    expect('notes' in st().doc).toBe(false);
    const before = st().past.length;
    e.run('doc.setNotes', ' \n ');
    expect(st().past.length).toBe(before); // still nothing: no empty step
  });

  test('what was typed is what the report prints; the history and the sign-off fill the title block', () => {
    const e = createEditor({ ...DEMO_DOCUMENT });
    e.run('doc.addRevision', { revision: 'B', date: '2026-12-03', description: 'Opening <moved>', by: 'AD' });
    e.run('doc.setNotes', 'Bolt holes drilled, not punched.');
    e.run('doc.setChecked', { field: 'by', value: 'B. Checker' });
    const d = e.store.getState().doc;
    const html = renderReportHtml({ doc: d, evaluation: evaluateDocument(d) });
    expect(html).toContain('<td>Opening &lt;moved&gt;</td>');
    expect(html).toContain('Bolt holes drilled, not punched.');
    expect(html).toContain('data-field="checked-by">B. Checker</span>');
    expect(html).toContain('data-field="revision">B</span>'); // the latest line, not the title block's A
    expect(html).toContain('data-field="checker">B. Checker</span>');
    expect(html).toContain('data-field="date">2026-12-03</span>');
  });

  test('revision marks count on', () => {
    expect(['A', 'B', 'Z', 'c', 'P1', 'P09', 'rev 9', '', '—'].map(nextRevisionMark)).toEqual(['B', 'C', 'AA', 'd', 'P2', 'P10', 'rev 10', '', '']);
  });
});

describe('one name per shape', () => {
  // A bow tie: an outline that crosses itself, which the evaluator warns about.
  const crossing: Shape = { id: 'p', type: 'polygon', points: [[0, 0], [2, 2], [2, 0], [0, 2]] };
  test('warnings name the shape as the panel does', () => {
    const d = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 5, height: 5 }, crossing]);
    const ev = evaluateDocument(d);
    expect(ev.warnings.length).toBeGreaterThan(0);
    expect(formatShapeIssue(ev.warnings[0], d.shapes)).toMatch(/^Polygon 2 \(shapes\[1\]\): the outline crosses/);
    expect(formatShapeIssue({ path: 'units', message: 'x' }, d.shapes)).toBe('units: x');
    // A record the validator refuses still gets its own name when it has one, and no crash.
    expect(formatShapeIssue({ path: 'shapes[0].type', message: 'unknown' }, [{ id: 'q', type: 'blob', name: 'Odd' } as unknown as Shape])).toBe('Odd (shapes[0].type): unknown');
    expect(formatShapeIssue({ path: 'shapes[0].type', message: 'unknown' }, [{ id: 'q', type: 'blob' } as unknown as Shape])).toBe('shapes[0].type: unknown');
  });

  test('the CLI table, its JSON warnings and the report use the display name', () => {
    const d = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 5, height: 5 }, crossing]);
    const dir = mkdtempSync(join(tmpdir(), 'kern-names-'));
    const file = join(dir, 'cross.json');
    writeFileSync(file, JSON.stringify(d));
    const run = (...args: string[]) => spawnSync('npx', ['tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
    const table = run('props', file);
    expect(table.status).toBe(0);
    expect(table.stdout).toMatch(/warning: Polygon 2 \(shapes\[1\]\): the outline crosses/);
    const json = JSON.parse(run('props', file, '--json').stdout);
    expect(json.warnings.some((w: string) => w.startsWith('Polygon 2 (shapes[1]): '))).toBe(true);
    const html = renderReportHtml({ doc: d, evaluation: evaluateDocument(d) });
    expect(html).toContain('<li>Polygon 2 (shapes[1]): the outline crosses');
    expect(html).toContain('<td data-shape-name>Polygon 2</td>');
  }, 30_000);
});

describe('the cut readout (panel and canvas)', () => {
  const { h, b, tw, tf, r } = { h: 300, b: 150, tw: 7.1, tf: 10.7, r: 15 };
  const d = doc([{ id: 'ipe', type: 'i-beam', at: [0, 0], depth: h, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r }]);
  const ev = evaluateDocument(d);
  const p = ev.props!;
  const underside = p.bounds.ymax - tf;

  test('at the flange underside: b above = flange width, b below = web + fillets, Q/b on the web side (EN 10365 IPE 300; Gere & Goodno)', () => {
    const rd = cutReadout(ev.region, p, 'y', underside)!;
    expect(rd.jump).toBe(true);
    close(rd.cut.widthAbove, b, 1e-12);
    close(rd.cut.widthBelow, tw + 2 * r, 1e-12);
    close(rd.cut.Q, (b * tf * (h - tf)) / 2, 1e-12);
    expect(rd.qbSide).toBe('below');
    close(rd.cut.qOverB, rd.cut.Q / (tw + 2 * r), 1e-12);
    // Shown to 4 figures, the same digits as the report.
    expect(parseFormatted(rd.text.widthBelow)).toBe(37.1);
    const [first, second] = cutLabelLines(rd, 'y', 'mm');
    expect(first).toContain(`Q = ${rd.text.Q} mm³`);
    expect(second).toBe('b above = 150 mm · below = 37.1 mm; Q/b uses the width below the cut');
  });

  test('a cut below the section shows Q = 0, not round-off', () => {
    const far = doc([{ id: 'ipe', type: 'i-beam', at: [1e4, -3e4], depth: h, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r }]);
    const e2 = evaluateDocument(far);
    const rd = cutReadout(e2.region, e2.props!, 'y', -3e4 - 5)!;
    expect(rd.text.Q).toBe('0');
    expect(rd.text.qOverB).toBe('—'); // b = 0 below the section: Q/b is undefined
  });

  test('away from a jump: one width', () => {
    const rd = cutReadout(ev.region, p, 'y', p.centroid.y)!;
    expect(rd.jump).toBe(false);
    close(rd.cut.widthForQb, tw, 1e-12);
    expect(cutLabelLines(rd, 'y', 'mm')[1]).toBe('b = 7.1 mm');
  });
});

describe('dimensions on the canvas', () => {
  // A 200 × 100 plate with a Ø20 hole whose centre is 60 from the left edge and 40 from the bottom.
  const plate = doc([
    { id: 'p', type: 'rectangle', at: [-30, 10], width: 200, height: 100 },
    { id: 'h', type: 'circle', center: [30, 50], radius: 10, op: 'subtract' },
  ]);
  const ev = evaluateDocument(plate);
  const input = (scale: number) => ({ region: ev.region, shapes: ev.shapes, records: plate.shapes, props: ev.props!, scale, principal: true, centroid: true });

  test('the hole’s diameter and position, as on the report’s figure', () => {
    const lay = canvasDimensions(input(3))!;
    const by = (role: string) => lay.texts.filter((t) => t.role === role);
    expect(by('diameter').map((t) => t.text)).toEqual(['Ø20']);
    expect(by('x-position').map((t) => t.value)).toEqual([60]);
    expect(by('y-position').map((t) => t.value)).toEqual([40]);
    expect(by('width').map((t) => t.value)).toEqual([200]);
    expect(by('height').map((t) => t.value)).toEqual([100]);
    // Text boxes never overlap one another.
    for (const [i, a] of lay.texts.entries())
      for (const c of lay.texts.slice(i + 1)) expect(a.box.xmax <= c.box.xmin || c.box.xmax <= a.box.xmin || a.box.ymax <= c.box.ymin || c.box.ymax <= a.box.ymin).toBe(true);
    // Sized for the screen: the text is 2.9 mm high at 96 px per inch, at any zoom.
    close(lay.style.text * 3, 2.9 * PX_PER_MM, 1e-12);
    close(canvasDimensions(input(12))!.style.text * 12, 2.9 * PX_PER_MM, 1e-12);
  });

  test('the same input gives the same layout (memoised); zoomed far out the values are thinned, and said to be', () => {
    expect(canvasDimensions(input(3))).toBe(canvasDimensions(input(3)));
    const tiny = canvasDimensions(input(0.05))!;
    expect(tiny.omitted.length).toBeGreaterThan(0);
    expect(tiny.texts.length + tiny.omitted.length).toBeGreaterThanOrEqual(3);
  });

  test('a notch that overhangs the section is dimensioned only by the edges that shape it', () => {
    // Leg 90 × 16 with a 20 × 10 rectangle cut at (80, 10): only x = 80 and y = 10 touch material.
    const leg = doc([
      { id: 'l', type: 'rectangle', at: [0, 0], width: 90, height: 16 },
      { id: 'n', type: 'rectangle', at: [80, 10], width: 20, height: 10, op: 'subtract' },
    ]);
    const e = evaluateDocument(leg);
    const notch = findDimensionFeatures(e.region, [e.shapes[1].region]).find((f) => f.kind === 'notch');
    expect(notch && notch.kind === 'notch' ? [notch.x, notch.y] : null).toEqual([[80], [10]]);
  });
});

describe('empty and degenerate sections', () => {
  test('one wording for the panel and the report', () => {
    expect(emptySectionText(0, 'The section is empty: add a shape to see its properties.')).toMatch(/^The section is empty: the document has no shapes/);
    expect(emptySectionText(2, 'The section is empty: it has no area.')).toMatch(/^The section has no area, so there is nothing to draw and there are no properties\. Its 2 shapes, applied in order, leave no material/);
    expect(emptySectionText(1, 'There are line elements only: the section has no area, so there are no area properties.')).toMatch(/^There are line elements only/);
  });
});
