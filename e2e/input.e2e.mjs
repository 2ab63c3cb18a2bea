/**
 * Input that does not trap a drafter: keys after a typed point are commands again, the decimal
 * comma rule with its hint, diameters, rounding a corner, arcs by radius and sweep, Open… given a
 * DXF, New asking first and resetting the view, placed profiles kept in view, the rolled-section
 * catalogue, nothing cut off, and the first-steps guide. Areas are checked against closed forms
 * named beside each check. The view is 2 px per mm, so the grid snap step is 10 mm.
 */
import assert from 'node:assert/strict';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { clickWorld, close, doc, docShapes, focusCanvas, open, prop, settle } from './helpers.mjs';

const PI = Math.PI;
const HERE = path.dirname(fileURLToPath(import.meta.url));

const active = (page) => page.evaluate(() => document.activeElement?.dataset?.testid ?? document.activeElement?.id ?? document.activeElement?.tagName);
const state = (page, f) => page.evaluate(f);
const pastLength = (page) => state(page, () => window.__kern.editor.store.getState().past.length);
const inputError = (page) => page.textContent('[data-testid="input-error"]');

/** Type on the keyboard as a drafter does (no fill), then Enter. */
async function key(page, text) {
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}

/** Every corner of every listed shape's outline is inside the canvas (screen pixels). */
async function onScreen(page, ids) {
  return page.evaluate((ids) => {
    const ed = window.__kern.editor;
    const s = ed.store.getState();
    const want = new Set(ids);
    let ok = true;
    for (const r of ed.results.shapesOf(s.doc)) {
      if (!want.has(r.id)) continue;
      for (const c of r.region)
        for (let i = 0; i < c.xy.length; i += 2) {
          const sx = s.ox + c.xy[i] * s.scale, sy = s.oy - c.xy[i + 1] * s.scale;
          if (sx < 0 || sy < 0 || sx > s.width || sy > s.height) ok = false;
        }
    }
    return ok;
  }, ids);
}

export const tests = [
  {
    name: 'input: after a typed point and Enter the keys are commands again (arc mode, subtract), unless a coordinate is being typed',
    async run(t) {
      const { page, errors } = await open(t, { seed: doc([{ id: 'plate', type: 'rectangle', at: [-50, -50], width: 300, height: 200 }]) });
      await focusCanvas(page);
      await page.keyboard.press('l'); // path tool
      await key(page, '0, 0'); // the first digit moves the keys to the entry box
      assert.equal(await active(page), 'canvas', 'after Enter the canvas has the keys');
      await key(page, 'd 100, 0'); // "d" starts an entry too
      assert.equal(await active(page), 'canvas');
      await page.keyboard.press('a'); // arc mode, not the letter a in the entry box
      assert.equal(await state(page, () => window.__kern.editor.store.getState().pathArc), true, 'A switched the path to arcs');
      assert.equal(await page.inputValue('[data-testid="typed-input"]'), '', 'nothing was typed into the entry box');
      await key(page, '150, 50'); // through
      await key(page, '100, 100'); // end: a half circle of radius 50 about (100, 50)
      await page.keyboard.press('a'); // back to lines
      await key(page, '0, 100');
      await page.keyboard.press('Enter'); // on the canvas: closes the path
      const shapes = await docShapes(page);
      assert.equal(shapes.length, 2);
      const p = shapes[1];
      assert.equal(p.type, 'path');
      assert.deepEqual(p.segments[1], { to: [100, 100], via: [150, 50] });
      // The new path is selected: Shift+S makes it subtract, from the keyboard.
      await page.keyboard.press('Shift+S');
      assert.equal((await docShapes(page))[1].op, 'subtract', 'Shift+S acted as the subtract command');
      // Plate 300 × 200 less the path: a 100 × 100 square and a half disc of radius 50 (Gere & Goodno, App. E).
      close(await prop(page, 'area'), 300 * 200 - (100 * 100 + (PI * 50 * 50) / 2), 'A = 60000 − (100² + π·50²/2)');
      // A click into the empty entry box does not trap the next command key.
      await page.click('[data-testid="typed-input"]');
      await page.keyboard.press('Shift+A');
      assert.equal((await docShapes(page))[1].op ?? 'add', 'add', 'Shift+A in an empty entry box is the add command');
      assert.equal(await active(page), 'canvas');
      // Once a coordinate is begun, letters belong to it (an arithmetic name here). Escape leaves
      // the path tool; the typed displacement then moves the selection.
      await page.keyboard.press('Escape');
      await page.click('[data-testid="typed-input"]');
      await page.keyboard.type('d 2*sqrt(4), 0');
      assert.equal(await page.inputValue('[data-testid="typed-input"]'), 'd 2*sqrt(4), 0');
      await page.keyboard.press('Enter');
      close((await docShapes(page))[1].start[0], 4, 'the selection moved by d 4, 0');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'input: every prompt, the entry box, the keys sheet and the refusals use Kern’s own notation only',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'a', type: 'rectangle', at: [0, 0], width: 40, height: 20 }]) });
      const seen = [];
      const read = async () => seen.push(await page.textContent('[data-testid="prompt"]'));
      seen.push(await page.getAttribute('[data-testid="typed-input"]', 'placeholder'), await page.getAttribute('[data-testid="typed-input"]', 'title'));
      for (const k of ['p', 'c', 'l', 'r', 't', 'w', 'i']) {
        await focusCanvas(page);
        await page.keyboard.press(k);
        await read();
        if (k === 'i') continue;
        await key(page, '0, 0');
        await read();
        if (k === 'l' || k === 't' || k === 'w') {
          await key(page, 'd 10, 0');
          await page.keyboard.press('a');
          await read();
          await page.keyboard.press('a');
        }
        await page.keyboard.press('Escape');
        await page.keyboard.press('Escape');
      }
      // Old-style entries get the same numbers back in the present notation.
      await page.keyboard.press('p');
      await key(page, '0, 0');
      for (const [old, hint] of [['@20,0', /“d 20, 0” \(Δ 20, 0\)/], ['50<30', /“50 a 30” \(50 ∠ 30\)/]]) {
        await page.fill('[data-testid="typed-input"]', old);
        await page.press('[data-testid="typed-input"]', 'Enter');
        const msg = await inputError(page);
        assert.match(msg, hint);
        seen.push(msg.replace(old, ''));
      }
      await page.keyboard.press('Escape');
      await page.click('[data-testid="keys-help"]');
      seen.push(await page.textContent('.keys-card'));
      const all = seen.join('\n');
      assert.doesNotMatch(all, /@|<|length<angle/, 'no other program’s entry syntax');
      for (const form of ['x, y', 'd dx, dy', 'L a θ', 'dia D', 'R arc φ']) assert.ok(all.includes(form), `${form} is shown`);
    },
  },
  {
    name: 'input: decimal commas are refused with the rule shown; a diameter where a radius is asked; the diameter in the panel',
    async run(t) {
      const { page } = await open(t);
      assert.match(await page.getAttribute('[data-testid="typed-input"]', 'title'), /Decimals take a point \(7\.5\); a comma only separates x and y/);
      await focusCanvas(page);
      await page.keyboard.press('c');
      await key(page, '0, 0');
      assert.match(await page.textContent('[data-testid="prompt"]'), /dia D .*decimals with a point: 7\.5/, 'the prompt states the rule where a number is asked');
      await key(page, '7,5');
      assert.match(await inputError(page), /“7,5” could be the number 7\.5 or the point 7, 5: type “7\.5” for the number, or “7, 5” \(with a space\) for the point\./);
      assert.equal((await docShapes(page)).length, 0, 'nothing was drawn from an ambiguous entry');
      await page.fill('[data-testid="typed-input"]', '7.5');
      await page.press('[data-testid="typed-input"]', 'Enter');
      close(await prop(page, 'area'), PI * 7.5 ** 2, 'A = πr², r = 7.5 (Gere & Goodno, App. E, circle)');
      // A diameter: Ø or the word dia.
      await key(page, '40, 0');
      await key(page, 'Ø15');
      await key(page, '80, 0');
      await key(page, 'dia 15');
      const circles = await docShapes(page);
      assert.deepEqual(circles.map((c) => c.radius), [7.5, 7.5, 7.5]);
      close(await prop(page, 'area'), 3 * PI * 7.5 ** 2, 'three circles of Ø15 (Gere & Goodno, App. E)');
      // A semicolon is refused with the comma form.
      await page.keyboard.press('p');
      await page.fill('[data-testid="typed-input"]', '10;20');
      await page.press('[data-testid="typed-input"]', 'Enter');
      assert.match(await inputError(page), /Separate x and y with a comma: “10, 20”/);
      await page.keyboard.press('Escape');
      // The circle's panel shows the diameter beside the radius, and takes a typed diameter.
      await page.keyboard.press('Escape');
      await page.click(`[data-shape="${circles[0].id}"]`);
      await page.waitForSelector('[data-field="diameter"]');
      assert.equal(await page.inputValue('[data-field="diameter"]'), '15');
      assert.equal(await page.inputValue('[data-field="radius"]'), '7.5');
      await page.fill('[data-field="diameter"]', '20');
      await page.press('[data-field="diameter"]', 'Enter');
      await settle(page);
      assert.equal((await docShapes(page))[0].radius, 10);
      assert.equal(await page.inputValue('[data-field="radius"]'), '10');
      close(await prop(page, 'area'), PI * (100 + 2 * 7.5 ** 2), 'Ø20 and two Ø15 (Gere & Goodno, App. E)');
    },
  },
  {
    name: 'input: round a polygon corner picked by its handle, then one picked by number; exact, one undo step each',
    async run(t) {
      const { page, errors } = await open(t, { seed: doc([{ id: 'p', type: 'polygon', name: 'Gusset', points: [[0, 0], [100, 0], [100, 60], [0, 60]] }]) });
      await page.click('[data-shape="p"]');
      await settle(page);
      const h0 = await pastLength(page);
      // Click (no drag) on the handle at (100, 60): the corner is picked.
      await clickWorld(page, 100, 60);
      await page.waitForFunction(() => document.querySelector('[data-field="corner"]').value === '2', null, { timeout: 5000 });
      assert.deepEqual(await state(page, () => window.__kern.editor.transient.getState().corner), { id: 'p', index: 2 });
      assert.equal(await pastLength(page), h0, 'picking a corner changes nothing');
      await page.fill('[data-field="corner-radius"]', '10');
      await page.press('[data-field="corner-radius"]', 'Enter');
      await settle(page);
      let s = (await docShapes(page))[0];
      assert.equal(s.type, 'path');
      assert.equal(s.id, 'p');
      assert.equal(s.name, 'Gusset', 'the shape keeps its name');
      assert.equal(await pastLength(page), h0 + 1, 'one undo step');
      // A square corner rounded with radius r loses (1 − π/4)·r² (Gere & Goodno, App. E: square minus quarter circle).
      const spandrel = (r) => (1 - PI / 4) * r * r;
      close(await prop(page, 'area'), 6000 - spandrel(10), 'A = 6000 − (1 − π/4)·10²');
      // The tangent points are exact: the arc runs from (90, 60)… through (100, 50).
      assert.ok(s.segments.some((g) => g.to[0] === 100 && g.to[1] === 50), 'tangent point on the right side');
      // By number: Start (0, 0), radius 20.
      await page.selectOption('[data-field="corner"]', '0');
      await page.fill('[data-field="corner-radius"]', '20');
      await page.click('[data-testid="round-corner-apply"]');
      await settle(page);
      close(await prop(page, 'area'), 6000 - spandrel(10) - spandrel(20), 'two corners rounded');
      // Too large: refused with the largest radius that fits, nothing changes.
      s = (await docShapes(page))[0];
      await page.selectOption('[data-field="corner"]', { index: 1 });
      await page.fill('[data-field="corner-radius"]', '70');
      await page.click('[data-testid="round-corner-apply"]');
      assert.match(await page.textContent('[data-testid="round-corner-error"]'), /does not fit/);
      assert.deepEqual((await docShapes(page))[0], s);
      await page.click('[data-command="undo"]');
      await page.click('[data-command="undo"]');
      await settle(page);
      assert.equal((await docShapes(page))[0].type, 'polygon', 'two undos give the polygon back');
      close(await prop(page, 'area'), 6000, 'A = b·h');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'input: a path arc by radius and sweep continues the last segment',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('l');
      await key(page, '0, 0');
      await key(page, 'd 100, 0');
      await key(page, '50 arc 180'); // turn left through 180° with radius 50: ends at (100, 100)
      await key(page, 'd -100, 0');
      await page.keyboard.press('Enter');
      const p = (await docShapes(page))[0];
      assert.deepEqual(p.segments[1].to, [100, 100]);
      assert.deepEqual(p.segments[1].via, [150, 50]);
      close(await prop(page, 'area'), 100 * 100 + (PI * 50 * 50) / 2, 'square 100² and a half disc of radius 50 (Gere & Goodno, App. E)');
      close(await prop(page, 'centroid.y'), 50, 'symmetric about y = 50');
    },
  },
  {
    name: 'input: Open… given a DXF drawing offers the DXF import, not a JSON error',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'a', type: 'circle', center: [0, 0], radius: 5 }]) });
      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('[data-command="file.open"]')]);
      await chooser.setFiles(path.join(HERE, 'fixtures', 'plate-holes.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      const notice = await page.textContent('[data-testid="notice"]');
      assert.match(notice, /“plate-holes\.dxf” is a DXF drawing, not a section document: it is offered for import/);
      assert.doesNotMatch(notice, /JSON/);
      assert.equal((await docShapes(page)).length, 1, 'nothing changes before the import is confirmed');
      await page.click('[data-testid="dxf-apply"]');
      await page.waitForSelector('[data-testid="dxf-review"]', { state: 'detached' });
      assert.equal((await docShapes(page)).length, 4, 'the outline and its two holes were added');
    },
  },
  {
    name: 'input: New asks before clearing a section with shapes, and resets the view',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'a', type: 'rectangle', at: [0, 0], width: 40, height: 20 }]) });
      await state(page, () => window.__kern.editor.store.setState({ scale: 37, ox: -900, oy: 2000 }));
      await page.click('[data-command="file.new"]');
      await page.waitForSelector('[data-question="new-section"]');
      assert.match(await page.textContent('[data-question="new-section"]'), /has one shape/);
      await page.keyboard.press('Escape');
      assert.equal(await page.$('[data-question="new-section"]'), null);
      assert.equal((await docShapes(page)).length, 1, 'kept');
      await page.click('[data-command="file.new"]');
      await page.click('[data-answer="yes"]');
      assert.equal((await docShapes(page)).length, 0);
      const v = await state(page, () => window.__kern.editor.store.getState());
      assert.ok(v.scale < 5 && v.scale > 0.5, `the view is reset (scale ${v.scale} px/mm)`);
      // The origin is in view, towards the lower left.
      assert.ok(v.ox > 0 && v.ox < v.width / 2 && v.oy > v.height / 2 && v.oy < v.height, 'origin near the lower left');
      await page.click('[data-command="undo"]');
      assert.equal((await docShapes(page)).length, 1, 'Undo brings the section back');
      // An empty section is cleared without a question.
      await state(page, () => window.__kern.editor.run('file.new', 'discard'));
      await page.click('[data-command="file.new"]');
      assert.equal(await page.$('[data-question]'), null);
    },
  },
  {
    name: 'input: the catalogue places a rolled section by its designation, in the document’s units, in view, in one undo step',
    async run(t) {
      const { page, errors } = await open(t, { seed: doc([], 'cm') });
      await state(page, () => window.__kern.editor.store.setState({ scale: 40, ox: -5000, oy: 7000 }));
      const h0 = await pastLength(page);
      await page.selectOption('[data-testid="catalogue-series"]', 'HEB');
      await page.selectOption('[data-testid="catalogue-size"]', 'HE 300 B');
      await page.click('[data-testid="catalogue-place"]');
      await settle(page);
      const [s] = await docShapes(page);
      assert.equal(s.type, 'i-beam');
      assert.equal(s.name, 'HE 300 B');
      // HE 300 B: h = b = 300 mm, tw 11, tf 19, r 27 (EN 10365, from memory), here in cm.
      assert.deepEqual([s.depth, s.flangeWidth, s.webThickness, s.flangeThickness, s.rootRadius], [30, 30, 1.1, 1.9, 2.7]);
      assert.equal(await pastLength(page), h0 + 1);
      assert.ok(await onScreen(page, [s.id]), 'the whole section is in view');
      // A = 2·b·tf + (h − 2tf)·tw + (4 − π)·r² (Gere & Goodno, App. E; composite areas), against the table's 149.1 cm² (from memory).
      const A = 2 * 30 * 1.9 + (30 - 3.8) * 1.1 + (4 - PI) * 2.7 ** 2;
      close(await prop(page, 'area'), A, 'A of HE 300 B from its dimensions');
      assert.ok(Math.abs(A / 149.1 - 1) < 0.01);
      // A profile placed by a typed point far out of view is brought into view too.
      await focusCanvas(page);
      await page.keyboard.press('i');
      await key(page, '900, 900');
      const shapes = await docShapes(page);
      assert.equal(shapes.length, 2);
      assert.ok(await onScreen(page, [shapes[1].id]), 'the typed placement is in view');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'input: the entry box placeholder and the long property labels are shown in full',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'a', type: 'rectangle', at: [0, 0], width: 40, height: 20 }]) });
      await settle(page);
      const fits = await page.evaluate(() => {
        const el = document.querySelector('[data-testid="typed-input"]');
        const probe = document.createElement('span');
        const cs = getComputedStyle(el);
        probe.style.font = cs.font;
        probe.style.whiteSpace = 'pre';
        probe.textContent = el.placeholder;
        document.body.appendChild(probe);
        const need = probe.getBoundingClientRect().width + parseFloat(cs.paddingLeft) + parseFloat(cs.paddingRight);
        probe.remove();
        return { need, have: el.clientWidth };
      });
      assert.ok(fits.need <= fits.have, `placeholder needs ${fits.need} px, the box is ${fits.have} px`);
      const cut = await page.$$eval('.prop-label', (els) => els.filter((e) => e.scrollWidth > e.clientWidth + 1).map((e) => e.textContent));
      assert.deepEqual(cut, [], 'no label is cut off');
      assert.ok((await page.$$('.prop-label')).length > 20);
    },
  },
  {
    name: 'input: the first-steps guide shows on the very first start only, leaves the demo, stays dismissed, and the keys sheet shows it again',
    async run(t) {
      const { page, errors } = await open(t, { seed: null, view: null });
      await page.waitForSelector('[data-testid="first-run-guide"]');
      const text = await page.textContent('[data-testid="first-run-guide"]');
      for (const job of ['Sketch a section', 'Check a cutout', 'Print the report']) assert.ok(text.includes(job), job);
      assert.ok((await docShapes(page)).length > 0, 'the demo section stays loaded');
      // Pointing at a step lights up the controls it names.
      await page.hover('[data-step="report"]');
      assert.equal(await page.$eval('[data-command="report.open"]', (e) => e.classList.contains('guide-spot')), true);
      await page.hover('[data-step="sketch"]');
      assert.equal(await page.$eval('.rail', (e) => e.classList.contains('guide-spot')), true);
      await page.click('[data-testid="guide-dismiss"]');
      assert.equal(await page.$('[data-testid="first-run-guide"]'), null);
      assert.equal(await page.$('.guide-spot'), null, 'no control is left lit');
      await page.reload();
      await page.waitForFunction(() => window.__kern && document.querySelector('[data-testid="canvas"] canvas'));
      await page.waitForTimeout(200);
      assert.equal(await page.$('[data-testid="first-run-guide"]'), null, 'dismissed, it does not come back');
      await page.click('[data-testid="keys-help"]');
      await page.click('[data-testid="show-guide"]');
      await page.waitForSelector('[data-testid="first-run-guide"]');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'input: no guide when a section was autosaved before (not a first start)',
    async run(t) {
      const { page } = await open(t);
      await page.waitForTimeout(200);
      assert.equal(await page.$('[data-testid="first-run-guide"]'), null);
    },
  },
];
