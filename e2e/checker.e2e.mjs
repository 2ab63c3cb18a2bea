/**
 * Issue 8 in the browser: a report a checking engineer can verify and sign.
 * - The dimensions toggle draws the report figure's dimensions on the canvas (a hole's diameter
 *   and the position of its centre), following the zoom.
 * - One name per shape: an unnamed path is "Path 1" in the shape list, the selection, the canvas
 *   list and the report.
 * - The checker's fields (revision history, notes, checked by / date) typed in the app are in the
 *   document, one undo step each, and in the printed PDF (pdftotext).
 * - A cut at a flange underside shows b just above and just below, and which one Q/b uses; the
 *   Q/b diagram marks off-scale values near a hole edge and the panel shows the caution for an
 *   unsymmetric section.
 *
 * Sources: IPE 300 nominal dimensions, EN 10365 (h 300, b 150, tw 7.1, tf 10.7, r 15 mm; from
 * memory); b below the underside = tw + 2r, the root fillets being tangent quarter circles (circle
 * geometry); Q of the flange b·tf·(h − tf)/2 (Gere & Goodno, Mechanics of Materials, shear stresses
 * in the webs of beams with flanges). The plate's hole diameter and position are the input.
 */
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { close, open, parseShown, settle } from './helpers.mjs';

const OUT = path.join(os.tmpdir(), 'kern-e2e-shots');
const v2 = (shapes, extra = {}) => ({ format: 'kern-section', version: 2, units: 'mm', shapes, ...extra });

/** A 200 × 100 plate with a Ø20 hole, centre 60 from the left edge and 40 from the bottom. */
const plate = v2([
  { id: 'p', type: 'rectangle', at: [-30, 10], width: 200, height: 100, name: 'Plate 200 × 100' },
  { id: 'h', type: 'circle', center: [30, 50], radius: 10, op: 'subtract' },
]);

const c45 = Math.SQRT1_2;
/** An unnamed bent bracket (a path with two arcs) and an unnamed bolt hole. */
const bracket = v2([
  {
    id: 'b',
    type: 'path',
    start: [0, 120],
    segments: [
      { to: [0, 24] },
      { to: [24, 0], via: [24 - 24 * c45, 24 - 24 * c45] },
      { to: [90, 0] },
      { to: [90, 16] },
      { to: [24, 16] },
      { to: [16, 24], via: [24 - 8 * c45, 24 - 8 * c45] },
      { to: [16, 120] },
      { to: [0, 120] },
    ],
  },
  { id: 'h', type: 'circle', center: [8, 90], radius: 5, op: 'subtract' },
]);

const ipe = v2([{ id: 'i', type: 'i-beam', at: [-75, 0], depth: 300, flangeWidth: 150, flangeThickness: 10.7, webThickness: 7.1, rootRadius: 15 }]);

/** The canvas's pixels, to tell whether something was drawn. */
const canvasShot = (page) => page.locator('[data-testid="canvas"]').screenshot();

/** The dimensions listed under the canvas: role, value and text. */
const dimensionList = (page) =>
  page.$$eval('[data-testid="dimension-list"] li', (els) => els.map((e) => ({ role: e.dataset.dim, value: Number(e.dataset.value), text: e.textContent })));

/** Print the report frame's HTML to PDF in a fresh page and read it back with poppler. */
async function printReport(context, page, file) {
  const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
  await frame.waitForSelector('.caution');
  const html = await frame.content();
  const p = await context.newPage();
  await p.route('**/*', (route) => route.abort());
  await p.setContent(html, { waitUntil: 'load' });
  await p.emulateMedia({ media: 'print' });
  await p.pdf({ path: file, format: 'A4', printBackground: true, preferCSSPageSize: true });
  await p.close();
  return { frame, text: execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ') };
}

export const tests = [
  {
    name: 'checker: the dimensions toggle draws a hole’s diameter and position on the canvas, following the zoom',
    async run(t) {
      const { page, errors } = await open(t, { seed: plate, view: { scale: 3 } });
      await settle(page);
      const before = await canvasShot(page);
      assert.equal(await page.$('[data-testid="dimension-caption"]'), null, 'off at start');
      await page.click('[data-command="view.dimensions"]');
      await page.waitForSelector('[data-testid="dimension-caption"]');
      assert.equal(await page.getAttribute('[data-command="view.dimensions"]', 'aria-pressed'), 'true');
      const dims = await dimensionList(page);
      const by = (role) => dims.filter((d) => d.role === role);
      assert.deepEqual(by('diameter').map((d) => d.text), ['Ø20'], 'the hole’s diameter');
      assert.deepEqual(by('x-position').map((d) => d.value), [60], 'centre 60 from the left edge');
      assert.deepEqual(by('y-position').map((d) => d.value), [40], 'centre 40 from the bottom edge');
      assert.deepEqual(by('width').map((d) => d.text), ['200']);
      assert.deepEqual(by('height').map((d) => d.text), ['100']);
      assert.ok(!(await canvasShot(page)).equals(before), 'the dimensions are drawn on the canvas');
      await page.screenshot({ path: path.join(OUT, 'checker-dimensions.png') });
      // Zoomed far out the values have no room: they are thinned, and the caption says so.
      await page.evaluate(() => window.__kern.editor.store.setState({ scale: 0.08 }));
      await page.waitForFunction(() => /left off/.test(document.querySelector('[data-testid="dimension-caption"]')?.textContent ?? ''));
      // The key toggles it off again.
      await page.focus('[data-testid="canvas"]');
      await page.keyboard.press('m');
      await page.waitForSelector('[data-testid="dimension-caption"]', { state: 'detached' });
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'checker: one name per shape in the shape list, the selection and the report (an unnamed path is “Path 1”)',
    async run(t) {
      const { page } = await open(t, { seed: bracket, view: { scale: 3 } });
      await settle(page);
      const listed = await page.$$eval('[data-testid="shape-list"] .shape-name', (els) => els.map((e) => e.textContent));
      assert.deepEqual(listed, ['Path 1', 'Circle 2']);
      await page.click('[data-shape="b"]');
      assert.match(await page.textContent('[data-testid="selection-panel"] h2'), /^Path 1\s*Path$/);
      assert.equal(await page.getAttribute('[data-testid="selection-panel"] input[data-field="name"]', 'placeholder'), 'Path 1');
      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('[data-shape-name]');
      assert.deepEqual(await frame.$$eval('[data-shape-name]', (els) => els.map((e) => e.textContent)), ['Path 1', 'Circle 2']);
      // The schedule's table for the path is captioned with the same name.
      assert.match(await frame.textContent('body'), /Path 1: segments/);
      assert.doesNotMatch(await frame.textContent('body'), /\bs[0-9]\b|\bb\b: segments/);
    },
  },
  {
    name: 'checker: revision history, notes and checked by typed in the app are in the document and in the printed PDF',
    async run(t) {
      const { context, page } = await open(t, { seed: null, view: null }); // the demo
      const steps = () => page.evaluate(() => window.__kern.editor.store.getState().past.length);
      const doc = () => page.evaluate(() => window.__kern.editor.store.getState().doc);
      const h0 = await steps();
      // From the title block's dialog (the report's head has the same button).
      await page.click('[data-command="doc.titleBlock"]');
      await page.click('[data-testid="title-dialog"] [data-command="doc.checker"]');
      await page.waitForSelector('[data-testid="checker-dialog"]');
      assert.equal(await page.$('[data-testid="title-dialog"]'), null, 'one dialog at a time');
      await page.click('[data-command="doc.addRevision"]');
      assert.equal(await page.inputValue('[data-revision-row="0"] [data-revision-field="revision"]'), 'B', 'the mark after the title block’s A');
      // The new row is dated today: type another date, so that the edit is a step of its own
      // whatever day the test runs on.
      const today = await page.inputValue('[data-revision-row="0"] [data-revision-field="date"]');
      const typed = today === '2026-11-30' ? '2026-11-29' : '2026-11-30';
      await page.fill('[data-revision-row="0"] [data-revision-field="date"]', typed);
      await page.press('[data-revision-row="0"] [data-revision-field="date"]', 'Tab');
      await page.fill('[data-revision-row="0"] [data-revision-field="description"]', 'Conduit opening moved to mid-depth');
      await page.press('[data-revision-row="0"] [data-revision-field="description"]', 'Enter');
      await page.fill('[data-revision-row="0"] [data-revision-field="by"]', 'AD');
      await page.press('[data-revision-row="0"] [data-revision-field="by"]', 'Tab');
      await page.click('[data-command="doc.addRevision"]');
      await page.click('[data-revision-delete="1"]');
      await page.fill('[data-checker-field="notes"]', 'Opening edges ground smooth.\nWeb buckling at the opening checked separately.');
      await page.fill('[data-checker-field="checked-by"]', 'B. Checker'); // leaving the notes commits them
      await page.fill('[data-checker-field="checked-date"]', '2026-12-04'); // ... and leaving a field commits it
      await page.press('[data-checker-field="checked-date"]', 'Enter');
      const d = await doc();
      assert.deepEqual(d.revisions, [{ revision: 'B', date: typed, description: 'Conduit opening moved to mid-depth', by: 'AD' }]);
      assert.equal(d.notes, 'Opening edges ground smooth.\nWeb buckling at the opening checked separately.');
      assert.deepEqual(d.checked, { by: 'B. Checker', date: '2026-12-04' });
      // add, date, description, by, add, delete, notes, checked by, checked date: one step each.
      assert.equal((await steps()) - h0, 9);
      await page.screenshot({ path: path.join(OUT, 'checker-dialog.png') });
      await page.click('[data-testid="checker-close"]');
      // Undo takes back the last field only.
      await page.click('[data-command="undo"]');
      assert.deepEqual((await doc()).checked, { by: 'B. Checker', date: '' });
      await page.click('[data-command="redo"]');
      // The saved file keeps them (format version 2).
      const saved = await page.evaluate(() => JSON.parse(localStorage.getItem('kern.autosave.v1') ?? '{}'));
      assert.equal(saved.checked?.by, 'B. Checker');

      await page.click('[data-command="report.open"]');
      const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kern-checker-')), 'report.pdf');
      const { text } = await printReport(context, page, file);
      for (const s of ['Revisions, notes and check', 'Conduit opening moved to mid-depth', typed, 'AD', 'Opening edges ground smooth.', 'Web buckling at the opening checked separately.', 'B. Checker', '2026-12-04']) {
        assert.ok(text.includes(s), `the PDF holds "${s}"`);
      }
      const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))[1]);
      assert.ok(pages <= 2, `the demo with its checker fields still prints on two A4 pages (${pages})`);
    },
  },
  {
    name: 'checker: a cut at a flange underside shows b above and below and the side Q/b uses (IPE 300, EN 10365)',
    async run(t) {
      const { page } = await open(t, { seed: ipe, view: { scale: 1.5 } });
      await page.click('[data-command="view.cut"]');
      await page.waitForSelector('[data-testid="cut-panel"]');
      await page.fill('[data-field="cut-at"]', '300 - 10.7');
      await page.press('[data-field="cut-at"]', 'Enter');
      await settle(page);
      const num = async (k) => Number(await page.getAttribute(`[data-cut="${k}"]`, 'data-value'));
      const shown = async (k) => page.textContent(`[data-cut="${k}"]`);
      close(await num('width-above'), 150, 'b just above = flange width');
      close(await num('width-below'), 7.1 + 2 * 15, 'b just below = tw + 2r');
      assert.equal(await shown('width-below'), '37.1');
      const Q = (150 * 10.7 * (300 - 10.7)) / 2;
      close(await num('Q'), Q, 'Q of the flange, b·tf·(h − tf)/2 (Gere & Goodno)');
      close(await num('qb'), Q / 37.1, 'Q/b with the web side');
      assert.equal(await page.getAttribute('[data-qb-uses]', 'data-qb-uses'), 'width-below', 'Q/b is marked on the web side');
      assert.match(await page.textContent('[data-testid="cut-jump-note"]'), /just below the cut/);
      assert.equal(await page.$('[data-testid="qb-caution"]'), null, 'no caution for a doubly symmetric section');
      // Below the section Q is 0 to the shown precision, not round-off.
      await page.fill('[data-field="cut-at"]', '-5');
      await page.press('[data-field="cut-at"]', 'Enter');
      await settle(page);
      assert.equal(await shown('Q'), '0');
      assert.equal(parseShown(await shown('area')), parseShown(await page.textContent('[data-prop="area"]')));
      await page.screenshot({ path: path.join(OUT, 'checker-cut.png') });
    },
  },
  {
    name: 'checker: the Q/b diagram marks off-scale values at a hole edge, and an unsymmetric section gets the caution',
    async run(t) {
      // A bar 40 wide with a Ø39.8 hole: at the hole's mid-height two 0.1 mm ligaments remain.
      const bar = v2([
        { id: 'b', type: 'rectangle', at: [0, 0], width: 40, height: 200 },
        { id: 'h', type: 'circle', center: [20, 100], radius: 19.9, op: 'subtract' },
      ]);
      const { page } = await open(t, { seed: bar, view: { scale: 2 } });
      await page.click('[data-command="view.cut"]');
      await page.waitForSelector('[data-testid="qb-plot"]');
      assert.ok(Number(await page.getAttribute('[data-testid="qb-plot"]', 'data-off-scale')) >= 1, 'the spike is marked, not drawn');
      assert.ok((await page.$$('[data-testid="qb-plot"] .plot-off')).length >= 1);
      assert.match(await page.textContent('[data-testid="cut-panel"] .plot-legend-row'), /Off scale/);
      // Every point of the curve lies inside the plot.
      const inside = await page.$eval('[data-testid="qb-plot"] .plot-qb', (el) => {
        const svg = el.ownerSVGElement.viewBox.baseVal;
        return [...el.getAttribute('d').matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)].every(([, x, y]) => +x >= 0 && +x <= svg.width && +y >= 0 && +y <= svg.height);
      });
      assert.ok(inside, 'no spike leaves the plot');

      const { page: p2 } = await open(t, { seed: bracket, view: { scale: 3 } });
      await p2.click('[data-command="view.cut"]');
      await p2.waitForSelector('[data-testid="qb-caution"]');
      assert.match(await p2.textContent('[data-testid="qb-caution"]'), /principal axes are turned/);
    },
  },
];
