/**
 * The cutout check in the browser, as a drafter does it: a proposal from the demo, a rectangular
 * notch drawn in the cover plate and switched to subtract, the comparison read from the panel
 * (Ix's change in per cent against a hand calculation by the composite method), its flag, a
 * caution marker on the canvas, a limit set at the loss and just past it (the verdict flips),
 * undo of a switch between baseline and proposal, and the report printed with its cutout check
 * and read back with pdftotext.
 *
 * Hand calculation (composite method with the notch as a negative area: Hibbeler, Statics,
 * Sec. 10.4 "Moments of inertia for composite areas"; rectangle about its own axis bh³/12,
 * Gere & Goodno, Mechanics of Materials, plane areas, case 1; section numbers from memory): the
 * notch drawn from (60, 205) to (70, 215) removes [60, 70] × [205, 210] of the cover plate,
 * A_R = 50, ȳ_R = 207.5, I_R = 10·5³/12. With the baseline's A, ȳ and Ix:
 *   ȳ' = (A ȳ − A_R ȳ_R)/(A − A_R),  Ix' = Ix + A(ȳ − ȳ')² − [I_R + A_R(ȳ_R − ȳ')²].
 */
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { clickWorld, close, focusCanvas, open, pagePoint, settle } from './helpers.mjs';

const OUT = path.join(os.tmpdir(), 'kern-e2e-shots');
const squash = (s) => s.replace(/\s+/g, ' ').trim();

const docState = (page) => page.evaluate(() => window.__kern.editor.store.getState().doc);
const row = (page, key) =>
  page.$eval(`[data-testid="compare-panel"] [data-compare="${key}"]`, (e) => ({ ...e.dataset }));

async function setLimit(page, property, field, text) {
  const sel = `[data-testid="limits-editor"] [data-limit="${property}"] input[data-limit-field="${field}"]`;
  await page.fill(sel, text);
  await page.press(sel, 'Enter');
  await settle(page);
}

/** The colour of the main canvas layer at a world point, a few pixels off (inside the marker). */
async function pixelNear(page, x, y, dx, dy) {
  const [px, py] = await pagePoint(page, x, y);
  return page.evaluate(
    ([px, py]) => {
      const canvases = [...document.querySelectorAll('[data-testid="canvas"] canvas')];
      const c = canvases[canvases.length - 1];
      const r = c.getBoundingClientRect();
      const k = c.width / r.width;
      const d = c.getContext('2d').getImageData(Math.round((px - r.left) * k), Math.round((py - r.top) * k), 1, 1).data;
      return [d[0], d[1], d[2]];
    },
    [px + dx, py + dy],
  );
}

export const tests = [
  {
    name: 'cutout: proposal from the demo, notch drawn, comparison, caution marker, limit flip, undo, report',
    async run(t) {
      const { context, page, errors } = await open(t, { seed: null, view: null }); // first start: the demo
      fs.mkdirSync(OUT, { recursive: true });

      // 1. A proposal from the demo: one click, shown at once, one undo step.
      const steps0 = await page.evaluate(() => window.__kern.editor.store.getState().past.length);
      await page.click('[data-testid="proposal-new"]');
      await settle(page);
      let doc = await docState(page);
      assert.equal(doc.activeVariant, 'Proposal 1');
      assert.deepEqual(doc.variants[0].shapes, ['beam', 'cover', 'opening'], 'the proposal starts as the baseline');
      assert.equal(await page.evaluate(() => window.__kern.editor.store.getState().past.length), steps0 + 1);
      await page.waitForSelector('[data-testid="compare-panel"] [data-compare="Ix"]');
      assert.equal((await row(page, 'Ix')).value, '0', 'an unchanged proposal changes nothing');

      // 2. A rectangular notch in the cover plate, drawn with the mouse, then switched to subtract.
      await page.evaluate(() => {
        const s = window.__kern.editor.store.getState();
        window.__kern.editor.store.setState({ scale: 4, ox: 300, oy: s.height + 450 });
      });
      await focusCanvas(page);
      await page.keyboard.press('r');
      await clickWorld(page, 60, 205);
      await clickWorld(page, 70, 215);
      await page.click('[data-testid="op-subtract"]');
      await settle(page);
      doc = await docState(page);
      assert.equal(doc.shapes.length, 3, 'the baseline is untouched');
      const notch = doc.variants[0].shapes[3];
      assert.deepEqual({ type: notch.type, at: notch.at, width: notch.width, height: notch.height, op: notch.op }, { type: 'rectangle', at: [60, 205], width: 10, height: 10, op: 'subtract' });

      // 3. The comparison against the composite method.
      const A = Number((await row(page, 'area')).baseline), yb = Number((await row(page, 'centroid.y')).baseline);
      const ix = await row(page, 'Ix');
      const Ix = Number(ix.baseline);
      const AR = 50, yR = 207.5, IR = (10 * 5 ** 3) / 12;
      const y2 = (A * yb - AR * yR) / (A - AR);
      const Ix2 = Ix + A * (yb - y2) ** 2 - (IR + AR * (yR - y2) ** 2);
      close(Number(ix.proposal), Ix2, 'Ix of the proposal', 1e-9);
      close(Number(ix.value), (100 * (Ix2 - Ix)) / Ix, 'Ix change in per cent', 1e-9);
      close(Number((await row(page, 'area')).value), (-100 * AR) / A, 'area change in per cent', 1e-9);
      close(Number((await row(page, 'centroid.y')).proposal), y2, 'ȳ of the proposal', 1e-9);
      // The flag: the example limit allows a 10 % loss of Ix.
      assert.equal(ix.status, 'within');
      assert.equal(await page.getAttribute('[data-testid="verdict"]', 'data-verdict'), 'within');
      assert.ok(await page.isVisible('[data-testid="limits-examples"]'), 'the example limits are labelled as examples');
      // The legend reports the removed material: the notch inside the plate, 10 × 5.
      await page.waitForFunction(() => document.querySelector('[data-testid="change-legend"]')?.dataset.removedArea);
      close(Number(await page.getAttribute('[data-testid="change-legend"]', 'data-removed-area')), 50, 'removed area', 1e-9);

      // 4. A caution marker: the notch's sharp inside corners, listed and drawn.
      const corners = await page.$$eval('[data-testid="caution-list"] [data-caution-kind="re-entrant-corner"]', (els) => els.map((e) => ({ x: Number(e.dataset.x), y: Number(e.dataset.y), n: e.dataset.number, text: e.textContent })));
      assert.deepEqual(corners.map((c) => [c.x, c.y]).sort((a, b) => a[0] - b[0]), [[60, 205], [70, 205]]);
      assert.match(corners[0].text, /“Rectangle 4”/, 'the caution names the shape');
      const [r, g, b] = await pixelNear(page, corners[0].x, corners[0].y, -6, 5);
      assert.ok(r > 130 && g < 90 && b < 90, `a red warning marker is drawn at (${corners[0].x}, ${corners[0].y}): rgb(${r}, ${g}, ${b})`);
      await page.screenshot({ path: path.join(OUT, 'cutout-notch.png') });

      // 5. A limit at the loss and just past it: the verdict flips.
      const loss = -Number(ix.value);
      await setLimit(page, 'Ix', 'maxLossPercent', String(loss));
      doc = await docState(page);
      assert.equal(doc.limits[0].maxLossPercent, loss, 'the limit is saved in the document at full precision');
      assert.equal((await row(page, 'Ix')).status, 'within', 'a loss exactly at the limit is within it');
      assert.equal(await page.getAttribute('[data-testid="verdict"]', 'data-verdict'), 'within');
      await setLimit(page, 'Ix', 'maxLossPercent', String(loss * (1 - 1e-6)));
      assert.equal((await row(page, 'Ix')).status, 'beyond', 'just past the limit');
      assert.equal(await page.getAttribute('[data-testid="verdict"]', 'data-verdict'), 'beyond');
      const pctShown = squash(await page.$eval('[data-testid="compare-panel"] [data-compare="Ix"] td:nth-child(5)', (e) => e.textContent));

      // 6. Switch to the baseline and undo the switch.
      await page.click('[data-testid="proposal-tab"][data-name=""]');
      await settle(page);
      assert.equal((await docState(page)).activeVariant, undefined);
      assert.equal(await page.$('[data-testid="compare-panel"]'), null, 'no comparison while the baseline is shown');
      await focusCanvas(page);
      await page.keyboard.press('Control+z');
      await settle(page);
      assert.equal((await docState(page)).activeVariant, 'Proposal 1', 'undo takes the switch back');
      await page.waitForSelector('[data-testid="compare-panel"] [data-compare="Ix"]');
      assert.equal((await row(page, 'Ix')).status, 'beyond');

      // 7. The report with its cutout check, printed and read back.
      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('[data-comparison="Proposal 1"]');
      assert.equal(await frame.getAttribute('[data-comparison] tr[data-compare="Ix"] td[data-value]', 'data-value'), ix.value, 'the report carries the same change in per cent');
      const html = await page.getAttribute('[data-testid="report-overlay"] iframe', 'srcdoc');
      const pdf = path.join(OUT, 'cutout-report.pdf');
      const p = await context.newPage();
      await p.route('**/*', (route) => route.abort());
      await p.setContent(html, { waitUntil: 'load' });
      await p.emulateMedia({ media: 'print' });
      await p.pdf({ path: pdf, format: 'A4', printBackground: true, preferCSSPageSize: true });
      await p.close();
      const text = squash(execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }));
      for (const s of ['Cutout check: “Proposal 1” against the baseline', 'Verdict: BEYOND the limits', 'Limits set in the document', 'Sharp inside corner at (60, 205) of “Rectangle 4”', 'a geometric screen, not a design check', pctShown]) {
        assert.ok(text.includes(s), `the printed report has "${s}"`);
      }
      const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }))[1]);
      assert.ok(pages >= 3 && pages <= 6, `baseline pages and the cutout check (${pages} pages)`);
      execFileSync('pdftoppm', ['-png', '-r', '60', pdf, path.join(OUT, 'cutout-report')]);
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'cutout: rename and delete a proposal (asked first), net-section line drawn across the section',
    async run(t) {
      const { page, errors } = await open(t, { seed: null, view: null });
      await page.click('[data-testid="proposal-new"]');
      await page.click('[data-testid="proposal-rename"]');
      await page.fill('[data-testid="proposal-name"]', 'Cope at the end');
      await page.press('[data-testid="proposal-name"]', 'Enter');
      assert.equal((await docState(page)).activeVariant, 'Cope at the end');
      assert.ok(await page.isVisible('[data-testid="proposal-tab"][data-name="Cope at the end"]'));

      // A net-section line across the cover plate and the flange, at y = 205 from x = −90 to 90.
      await page.evaluate(() => {
        const s = window.__kern.editor.store.getState();
        window.__kern.editor.store.setState({ scale: 2, ox: s.width / 2, oy: s.height - 120 });
      });
      await focusCanvas(page);
      await page.keyboard.press('n');
      await page.fill('[data-testid="typed-input"]', '-90, 205');
      await page.press('[data-testid="typed-input"]', 'Enter');
      await page.fill('[data-testid="typed-input"]', '90, 205');
      await page.press('[data-testid="typed-input"]', 'Enter');
      await settle(page);
      assert.deepEqual((await docState(page)).netLines, [{ from: [-90, 205], to: [90, 205] }]);
      // The cover plate is 160 wide: gross = net = 160 (no holes on the line).
      close(Number(await page.getAttribute('[data-net="gross"]', 'data-value')), 160, 'gross length');
      close(Number(await page.getAttribute('[data-net="net"]', 'data-value')), 160, 'net length');

      // Delete asks first; Keep changes nothing, Delete removes it and shows the baseline.
      await page.click('[data-testid="proposal-delete"]');
      await page.click('[data-testid="proposal-delete-cancel"]');
      assert.equal((await docState(page)).variants.length, 1);
      await page.click('[data-testid="proposal-delete"]');
      await page.click('[data-testid="proposal-delete-confirm"]');
      const doc = await docState(page);
      assert.equal(doc.variants, undefined);
      assert.equal(doc.activeVariant, undefined);
      assert.equal(await page.$('[data-testid="proposal-tab"][data-name="Cope at the end"]'), null);
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'cutout: the demo on its own raises the separate-parts caution for its web opening',
    async run(t) {
      const { page } = await open(t, { seed: null, view: null });
      await settle(page);
      await page.waitForSelector('[data-testid="caution-list"] [data-caution-kind="separate-parts"]');
      const text = await page.textContent('[data-testid="caution-list"] [data-caution-kind="separate-parts"]');
      assert.match(text, /falls into 2 separate parts/);
      assert.match(text, /“Conduit opening Ø60” \(opening\)/);
      assert.match(text, /tied together elsewhere/);
    },
  },
];
