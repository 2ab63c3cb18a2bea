/**
 * The report in the browser: title-block editing kept in the document, the sandboxed report
 * view, "Print / Save as PDF", and the demo section's report printed with page.pdf() and read
 * back with pdftotext / pdfinfo (poppler): title block, every property value as the panel shows
 * it, the caution, the scale, and at most two pages on A4 and on US Letter.
 */
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { open, parseShown, settle } from './helpers.mjs';

const OUT = path.join(os.tmpdir(), 'kern-e2e-shots');

const squash = (s) => s.replace(/\s+/g, ' ').trim();
const escapeRe = (s) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Print report HTML to PDF in a fresh page of the same browser (no network), as the browser's "Save as PDF" would. */
async function printToPdf(context, html, file, format) {
  const page = await context.newPage();
  await page.route('**/*', (route) => route.abort());
  await page.setContent(html, { waitUntil: 'load' });
  await page.emulateMedia({ media: 'print' });
  await page.pdf({ path: file, format, printBackground: true, preferCSSPageSize: true });
  await page.close();
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
  // Reading order (no layout): a cell's wrapped text stays together.
  const flow = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' });
  return { info, text, flow, pages: Number(/Pages:\s+(\d+)/.exec(info)[1]), size: /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info).slice(1).map(Number) };
}

async function setTitle(page, field, value, how = 'Enter') {
  const sel = `[data-title-field="${field}"]`;
  await page.fill(sel, value);
  if (how === 'Enter') await page.press(sel, 'Enter');
  else await page.press(sel, 'Tab'); // leaving the field commits it too
}

const history = (page) => page.evaluate(() => window.__kern.editor.store.getState().past.length);
const title = (page) => page.evaluate(() => window.__kern.editor.store.getState().doc.title);

export const tests = [
  {
    name: 'report: title block edited in the app is kept in the document, one undo step per field',
    async run(t) {
      const { page } = await open(t, { seed: null, view: null }); // first start: the demo section
      await page.click('[data-command="doc.titleBlock"]');
      await page.waitForSelector('[data-testid="title-dialog"]');
      assert.equal(await page.inputValue('[data-title-field="project"]'), 'Riverside walkway canopy (demo)');
      const h0 = await history(page);
      await setTitle(page, 'checker', 'B. Checker');
      await setTitle(page, 'revision', 'B', 'Tab');
      assert.equal(await history(page), h0 + 2, 'two fields, two undo steps');
      assert.equal((await title(page)).checker, 'B. Checker');
      assert.equal((await title(page)).revision, 'B');
      // A field left unchanged records nothing.
      await page.focus('[data-title-field="author"]');
      await page.press('[data-title-field="author"]', 'Tab');
      assert.equal(await history(page), h0 + 2);
      await page.screenshot({ path: path.join(OUT, 'title-dialog.png') });
      await page.click('[data-testid="title-close"]');
      await page.click('[data-command="undo"]');
      assert.equal((await title(page)).revision, 'A', 'one undo restores the revision');
      assert.equal((await title(page)).checker, 'B. Checker', '... and only the revision');
      await page.click('[data-command="doc.titleBlock"]');
      assert.equal(await page.inputValue('[data-title-field="revision"]'), 'A', 'the dialog shows the undone value');
      // A name from a file is text, not markup.
      await setTitle(page, 'author', '<img src=x onerror="window.__pwned=1">');
      await page.click('[data-testid="title-close"]');
      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('[data-field="author"]');
      assert.equal(await frame.textContent('[data-field="author"]'), '<img src=x onerror="window.__pwned=1">');
      assert.equal(await frame.$('img'), null);
    },
  },
  {
    name: 'report: sandboxed view, Print / Save as PDF prints the report frame',
    async run(t) {
      const { page } = await open(t, { seed: null, view: null });
      await page.click('[data-command="report.open"]');
      const el = await page.waitForSelector('[data-testid="report-overlay"] iframe');
      assert.equal(await el.getAttribute('sandbox'), 'allow-same-origin allow-modals', 'no scripts run in the report');
      const frame = await el.contentFrame();
      await frame.waitForSelector('.caution');
      // A script in the report would not run: the sandbox has no allow-scripts.
      const ran = await frame.evaluate(() => {
        const s = document.createElement('script');
        s.textContent = 'document.body.dataset.ran = "1"';
        document.body.appendChild(s);
        return document.body.dataset.ran ?? null;
      });
      assert.equal(ran, null, 'a script inserted into the report does not execute');
      // The button calls print() on the report's own window (not the editor's).
      await page.evaluate(() => {
        const w = document.querySelector('[data-testid="report-overlay"] iframe').contentWindow;
        w.print = () => (window.__printed = (window.__printed ?? 0) + 1);
        window.print = () => (window.__editorPrinted = true);
      });
      await page.click('[data-testid="report-overlay"] button:has-text("Print / Save as PDF")');
      assert.equal(await page.evaluate(() => window.__printed), 1);
      assert.equal(await page.evaluate(() => window.__editorPrinted ?? false), false);
      await page.screenshot({ path: path.join(OUT, 'report-overlay.png') });
    },
  },
  {
    name: 'report: the demo printed to PDF carries the title block, every panel value, the caution and the scale in ≤ 2 pages',
    async run(t) {
      const { context, page } = await open(t, { seed: null, view: null });
      // The checker signs off in the app; the report must print what was typed.
      await page.click('[data-command="doc.titleBlock"]');
      await setTitle(page, 'checker', 'B. Checker');
      await page.click('[data-testid="title-close"]');
      await settle(page);
      const doc = await page.evaluate(() => window.__kern.editor.store.getState().doc);
      const panel = await page.$$eval('[data-testid="results"] [data-prop]', (els) =>
        els.map((e) => ({ key: e.dataset.prop, text: e.textContent, value: Number(e.dataset.value), unit: e.nextElementSibling.textContent })),
      );
      assert.ok(panel.length >= 25, `the panel shows ${panel.length} properties`);
      // The panel's text is its full-precision value at 4 significant figures (formatProperty), in
      // engineering form outside 0.001…9999; values that are zero up to round-off print as 0.
      for (const p of panel) {
        const shown = parseShown(p.text);
        assert.ok(Number.isFinite(shown), `${p.key}: "${p.text}" is a number`);
        if (shown === 0) assert.ok(Math.abs(p.value) <= 1e-9 * Math.max(...panel.map((q) => Math.abs(q.value))), `${p.key}: 0 shown for ${p.value}`);
        else assert.ok(Math.abs(shown - p.value) <= 5e-4 * Math.abs(p.value), `${p.key}: "${p.text}" is ${p.value} to 4 figures`);
      }
      const caution = squash(await page.textContent('[data-testid="caution"]'));

      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('.caution');
      // The report's cells carry the same digits as the panel (one formatter).
      for (const p of panel) {
        assert.equal(await frame.getAttribute(`tr[data-prop="${p.key}"] td[data-value]`, 'data-value'), p.text, `report cell of ${p.key}`);
      }
      const scale = await frame.getAttribute('[data-scale]', 'data-scale');
      assert.match(scale, /^\d+(\.\d+)?:\d+(\.\d+)?$/, `a drawing scale like 1:2 (${scale})`);
      // The stated scale is the drawn one: the figure's viewBox is in paper millimetres (width in mm
      // equals the viewBox width), and the section path is scaled by k mm of paper per mm of section.
      const fig = await frame.evaluate(() => {
        const svg = document.querySelector('.figure svg');
        const m = /matrix\(([^ ]+) 0 0 ([^ ]+) /.exec(svg.querySelector('path.section').getAttribute('transform'));
        return { width: svg.getAttribute('width'), vb: svg.getAttribute('viewBox').split(' ').map(Number), k: Number(m[1]), k2: Number(m[2]) };
      });
      const [num, den] = scale.split(':').map(Number);
      assert.equal(fig.width, `${fig.vb[2]}mm`, 'one viewBox unit is one millimetre of paper');
      assert.ok(Math.abs(fig.k - num / den) < 1e-12 && fig.k2 === fig.k, `path scale ${fig.k} = ${scale} (document in mm)`);
      const html = await page.getAttribute('[data-testid="report-overlay"] iframe', 'srcdoc');
      assert.match(html, /@page \{ size: A4 portrait; \}/);

      fs.mkdirSync(OUT, { recursive: true });
      const pdf = path.join(OUT, 'report-a4.pdf');
      const a4 = await printToPdf(context, html, pdf, 'A4');
      assert.ok(a4.pages <= 2, `the demo report fits in two A4 pages (${a4.pages})`);
      // ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt.
      assert.ok(Math.abs(a4.size[0] - 595.28) < 1 && Math.abs(a4.size[1] - 841.89) < 1, `A4 page (${a4.size})`);
      const text = a4.text;
      const flat = squash(a4.flow);
      for (const v of [doc.name, doc.title.project, doc.title.section, doc.title.author, 'B. Checker', doc.title.date, doc.title.revision]) {
        assert.ok(flat.includes(squash(v)), `the title block prints "${v}"`);
      }
      assert.match(text, /Units\s+Revision[\s\S]*mm\s+A/, 'units and revision in the title block');
      for (const p of panel) {
        // Each value on the line of its property, followed by its unit, exactly as the panel shows it.
        const re = new RegExp(`(^|\\s)${escapeRe(p.text)}\\s+${escapeRe(p.unit)}(\\s|$)`, 'm');
        assert.match(text, re, `${p.key}: "${p.text} ${p.unit}" is printed`);
      }
      assert.ok(flat.includes(caution), 'the caution is printed');
      assert.ok(flat.includes(`Section to scale ${scale} on the printed page`), `the scale ${scale} is printed`);
      execFileSync('pdftoppm', ['-png', '-r', '70', pdf, path.join(OUT, 'report-a4')]);

      // US Letter: the paper choice reaches the printed page size.
      await page.selectOption('[data-testid="report-paper"]', 'Letter');
      await page.waitForFunction(() => document.querySelector('[data-testid="report-overlay"] iframe')?.getAttribute('srcdoc')?.includes('size: letter'));
      const letterHtml = await page.getAttribute('[data-testid="report-overlay"] iframe', 'srcdoc');
      const letter = await printToPdf(context, letterHtml, path.join(OUT, 'report-letter.pdf'), 'A4');
      // ANSI/ASME Y14.1: Letter is 8.5 × 11 in = 612 × 792 pt (the page's CSS size wins over the A4 default).
      assert.deepEqual(letter.size.map(Math.round), [612, 792]);
      assert.ok(letter.pages <= 2, `the demo report fits in two Letter pages (${letter.pages})`);
      for (const p of panel) assert.ok(squash(letter.text).includes(`${p.text} ${p.unit}`) || new RegExp(`${escapeRe(p.text)}\\s+${escapeRe(p.unit)}`).test(letter.text), `Letter: ${p.key}`);
    },
  },
];
