/**
 * DXF import and drawing export in the browser: a hand-written plate with holes (LWPOLYLINE with
 * bulges) through the file chooser, a bar drawn as LINE and ARC entities in random order, a file
 * without units, an unclosed chain, files that cannot be read, a cut-out dropped onto a section,
 * SVG/PNG/JSON downloads, and export → import round trip.
 * Closed forms are named beside each check.
 */
import assert from 'node:assert/strict';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { close, doc, docShapes, open, prop, settle } from './helpers.mjs';

const HERE = path.dirname(fileURLToPath(import.meta.url));
const FIX = (name) => path.join(HERE, 'fixtures', name);
const SHOTS = path.join(os.tmpdir(), 'kern-e2e-shots');
const PI = Math.PI;

async function shot(page, name) {
  fs.mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`) });
}

/** Click the toolbar's Import DXF button and give the file chooser `files`. */
async function importThroughChooser(page, files) {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('[data-command="file.importDxf"]')]);
  await chooser.setFiles(files);
}

async function readDownload(download) {
  const chunks = [];
  for await (const c of await download.createReadStream()) chunks.push(c);
  return Buffer.concat(chunks);
}

/** Every property the panel shows: key -> full-precision value (data-value). */
async function panelValues(page) {
  await settle(page);
  return page.evaluate(() => Object.fromEntries([...document.querySelectorAll('[data-testid="results"] [data-prop]')].map((e) => [e.dataset.prop, Number(e.dataset.value)])));
}

// The fixture e2e/fixtures/plate-holes.dxf, by the composite method (Gere & Goodno, Mechanics of
// Materials, App. E for the rectangle, circle and semicircle; parallel-axis theorem; Hibbeler,
// Mechanics of Materials, "moments of inertia for composite areas"):
// plate 240 × 100 at the origin; hole Ø30 at (60, 50); slot centred at (160, 50): a 60 × 24
// rectangle plus two R12 semicircles whose diameters lie on x = 130 and x = 190.
function plateClosedForm() {
  const A1 = 240 * 100, x1 = 120;
  const r2 = 15, A2 = PI * r2 ** 2, x2 = 60;
  const r3 = 12, A3 = 60 * 24 + PI * r3 ** 2, x3 = 160;
  const A = A1 - A2 - A3;
  const xc = (A1 * x1 - A2 * x2 - A3 * x3) / A;
  const Ix = (240 * 100 ** 3) / 12 - (PI * r2 ** 4) / 4 - ((60 * 24 ** 3) / 12 + (PI * r3 ** 4) / 4);
  const As = (PI * r3 ** 2) / 2, c = (4 * r3) / (3 * PI); // semicircle area, centroid from its diameter
  const IySemi = (PI * r3 ** 4) / 8 - As * c ** 2; // about its own centroidal axis parallel to the diameter
  const IySlot = (24 * 60 ** 3) / 12 + 2 * (IySemi + As * (30 + c) ** 2);
  const Iy = (100 * 240 ** 3) / 12 + A1 * (x1 - xc) ** 2 - ((PI * r2 ** 4) / 4 + A2 * (x2 - xc) ** 2) - (IySlot + A3 * (x3 - xc) ** 2);
  return { A, xc, yc: 50, Ix, Iy };
}

export const tests = [
  {
    name: 'DXF import: plate with bulge holes through the file chooser matches the composite closed form',
    async run(t) {
      const { page, errors } = await open(t);
      await importThroughChooser(page, FIX('plate-holes.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      assert.match(await page.textContent('[data-testid="dxf-summary"]'), /1 closed outline and 2 holes.*Read in mm \(as the file states\)/);
      assert.match(await page.textContent('[data-testid="dxf-review"]'), /TEXT × 1/, 'the note is counted as not outline geometry');
      await shot(page, 'dxf-review-plate');
      assert.equal((await docShapes(page)).length, 0, 'nothing is added before the user confirms');
      await page.click('[data-testid="dxf-apply"]');
      await page.waitForSelector('[data-testid="dxf-review"]', { state: 'detached' });
      const shapes = await docShapes(page);
      assert.deepEqual(shapes.map((s) => [s.id, s.op ?? 'add']), [['dxf-1', 'add'], ['dxf-2', 'subtract'], ['dxf-3', 'subtract']]);
      const cf = plateClosedForm();
      close(await prop(page, 'area'), cf.A, 'A = 240·100 − π·15² − (60·24 + π·12²) (composite method, Gere & Goodno App. E)');
      close(await prop(page, 'centroid.x'), cf.xc, 'x̄ = ΣAᵢxᵢ / ΣAᵢ (composite method)');
      close(await prop(page, 'centroid.y'), cf.yc, 'ȳ = 50 by symmetry');
      close(await prop(page, 'Ix'), cf.Ix, 'Ix: bh³/12 − πr⁴/4 − (slot) (Gere & Goodno App. E)');
      close(await prop(page, 'Iy'), cf.Iy, 'Iy with the parallel-axis theorem (Hibbeler, composite areas)');
      close(await prop(page, 'Ixy'), 0, 'Ixy = 0: symmetric about y = 50', 1e-9 * cf.Ix);
      await shot(page, 'dxf-imported-plate');
      // One undoable step.
      await page.click('[data-command="undo"]');
      await settle(page);
      assert.equal((await docShapes(page)).length, 0, 'one undo removes the whole import');
      await page.click('[data-command="redo"]');
      close(await prop(page, 'area'), cf.A, 'redo brings the import back');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'DXF import: separate LINE and ARC entities in random order are joined into one outline',
    async run(t) {
      const { page } = await open(t);
      // Keyboard: Escape cancels the review and adds nothing; Enter confirms (the confirm button has the focus).
      await importThroughChooser(page, FIX('lines-arcs.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      await page.keyboard.press('Escape');
      await page.waitForSelector('[data-testid="dxf-review"]', { state: 'detached' });
      assert.equal((await docShapes(page)).length, 0, 'Escape adds nothing');
      await importThroughChooser(page, FIX('lines-arcs.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      assert.match(await page.textContent('[data-testid="dxf-summary"]'), /Found 1 closed outline \(/);
      assert.equal(await page.$('[data-testid="dxf-problems"]'), null, 'nothing left out');
      await page.keyboard.press('Enter');
      await page.waitForSelector('[data-testid="dxf-review"]', { state: 'detached' });
      // 80 × 40 bar plus a R20 semicircle on x = 80 (composite method; semicircle: area πr²/2,
      // centroid 4r/3π from the diameter, I about the symmetry axis πr⁴/8, I about its centroidal
      // axis parallel to the diameter (π/8 − 8/9π)r⁴ — Gere & Goodno, App. E).
      const r = 20, As = (PI * r * r) / 2, c = (4 * r) / (3 * PI);
      const A = 3200 + As;
      const xc = (3200 * 40 + As * (80 + c)) / A;
      close(await prop(page, 'area'), A, 'A = b·h + πr²/2');
      close(await prop(page, 'centroid.x'), xc, 'x̄ = ΣAᵢxᵢ / ΣAᵢ');
      close(await prop(page, 'centroid.y'), 20, 'ȳ = 20 by symmetry');
      close(await prop(page, 'Ix'), (80 * 40 ** 3) / 12 + (PI * r ** 4) / 8, 'Ix = bh³/12 + πr⁴/8');
      close(await prop(page, 'Iy'), (40 * 80 ** 3) / 12 + 3200 * (40 - xc) ** 2 + (PI / 8 - 8 / (9 * PI)) * r ** 4 + As * (80 + c - xc) ** 2, 'Iy by the parallel-axis theorem');
    },
  },
  {
    name: 'DXF import: a file without units asks for them and converts into the document units',
    async run(t) {
      const { page } = await open(t);
      await importThroughChooser(page, FIX('no-units.dxf'));
      await page.waitForSelector('[data-testid="dxf-units-dialog"]');
      assert.match(await page.textContent('[data-testid="dxf-units-dialog"]'), /does not state its units/);
      await shot(page, 'dxf-units-dialog');
      for (const u of ['mm', 'cm', 'm', 'in', 'ft']) assert.ok(await page.$(`[data-testid="dxf-units-${u}"]`), `unit ${u} offered`);
      await page.click('[data-testid="dxf-units-in"]');
      await page.waitForSelector('[data-testid="dxf-review"]');
      assert.match(await page.textContent('[data-testid="dxf-summary"]'), /Read in in \(as you chose\) and converted to mm/);
      await page.click('[data-testid="dxf-apply"]');
      // 4 × 2 in rectangle less a circle r = 0.5 in; 1 in = 25.4 mm exactly (international inch, 1959).
      const k = 25.4;
      close(await prop(page, 'area'), (8 - PI * 0.25) * k * k, 'A = (b·h − πr²)·25.4² (Gere & Goodno App. E)');
      close(await prop(page, 'Ix'), ixNoUnits() * k ** 4, 'Ix = bh³/12 − πr⁴/4 (both centroids at y = 1 in; Gere & Goodno App. E), in mm⁴');
    },
  },
  {
    name: 'DXF import: an unclosed chain is reported with layer and handle, marked, and left out',
    async run(t) {
      const { page } = await open(t);
      await importThroughChooser(page, FIX('unclosed.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      const rows = await page.$$eval('[data-testid="dxf-problems"] tbody tr', (trs) => trs.map((tr) => [...tr.children].map((td) => td.textContent)));
      assert.deepEqual(rows.map((r) => [r[0], r[1]]), [['SKETCH <b>draft</b>', '3B'], ['SKETCH <b>draft</b>', '3C'], ['SKETCH <b>draft</b>', '3D']]);
      for (const r of rows) assert.match(r[2], /not part of a closed outline: open end at \(160, 40\)/);
      // Names from the file are text: no element was made from the layer name.
      assert.equal(await page.$('[data-testid="dxf-review"] b'), null, 'the layer name is not HTML');
      // The marks are drawn on the canvas (a red stroke over the open chain at (140, 0)).
      const red = await page.evaluate(() => {
        const s = window.__kern.editor.store.getState();
        const [x, y] = [s.ox + 160 * s.scale, s.oy - 20 * s.scale];
        const canvases = [...document.querySelectorAll('[data-testid="canvas"] canvas')];
        const c = canvases[canvases.length - 1];
        const ratio = c.width / c.getBoundingClientRect().width;
        const d = c.getContext('2d').getImageData(Math.round(x * ratio) - 1, Math.round(y * ratio) - 1, 3, 3).data;
        let best = 0;
        for (let i = 0; i < d.length; i += 4) best = Math.max(best, d[i] - d[i + 2]);
        return best;
      });
      assert.ok(red > 80, `the open chain is marked red on the canvas (red − blue = ${red})`);
      await shot(page, 'dxf-unclosed-review');
      await page.click('[data-testid="dxf-apply"]');
      const shapes = await docShapes(page);
      assert.equal(shapes.length, 1, 'only the closed loop is added');
      close(await prop(page, 'area'), 5000, 'A = 100·50 (Gere & Goodno App. E): the open chain adds nothing');
      assert.match(await page.textContent('[data-testid="dxf-problem-chip"]'), /3 entities of “unclosed.dxf” left out/);
      await shot(page, 'dxf-unclosed-marked');
      await page.click('[data-testid="dxf-clear-problems"]');
      assert.equal(await page.$('[data-testid="dxf-problem-chip"]'), null);
    },
  },
  {
    name: 'DXF import: garbage and empty files leave the document untouched',
    async run(t) {
      const seed = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 60 }]);
      const { page } = await open(t, { seed });
      const before = await docShapes(page);
      // Binary garbage from a fixed linear congruential sequence (reproducible).
      const bytes = Buffer.alloc(2048);
      let x = 12345;
      for (let i = 0; i < bytes.length; i++) bytes[i] = (x = (1103515245 * x + 12345) % 2 ** 31) >> 23;
      for (const [name, buffer, msg] of [
        ['scan.dxf', bytes, /not a text DXF file: it contains binary data/],
        ['empty.dxf', Buffer.alloc(0), /The DXF file is empty/],
        ['half.dxf', Buffer.from('0\nSECTION\n2\nENTITIES\n0\nLINE\n8\n0\n10\n'), /truncated: the group code on line 9 has no value/],
      ]) {
        await importThroughChooser(page, { name, mimeType: 'application/dxf', buffer });
        await page.waitForSelector('[data-testid="notice"]');
        const text = await page.textContent('[data-testid="notice"]');
        assert.match(text, new RegExp(`"${name}" was not imported`));
        assert.match(text, msg);
        assert.match(text, /Your current section is unchanged/);
        if (name === 'scan.dxf') await shot(page, 'dxf-garbage-notice');
        assert.deepEqual(await docShapes(page), before, `${name}: the document is untouched`);
        assert.equal(await page.isDisabled('[data-command="undo"]'), true, `${name}: nothing was recorded`);
        assert.equal(await page.$('[data-testid="dxf-review"]'), null);
        await page.click('[data-testid="notice"] button');
      }
      close(await prop(page, 'area'), 6000, 'A = b·h still');
    },
  },
  {
    name: 'DXF import: a cut-out dropped onto an existing section is subtracted exactly',
    async run(t) {
      // A 300 × 200 plate; the plate-with-holes drawing (240 × 100, inside it) is cut out of it.
      const seed = doc([{ id: 'big', type: 'rectangle', at: [-50, -50], width: 300, height: 200 }]);
      const { page } = await open(t, { seed });
      await importThroughChooser(page, FIX('plate-holes.dxf'));
      await page.waitForSelector('[data-testid="dxf-review"]');
      await page.click('[data-testid="dxf-mode-subtract"]');
      await page.click('[data-testid="dxf-apply"]');
      // S − (plate − holes) = big − plate + the two holes' material (all of it lies inside big):
      // A = 300·200 − 240·100 + π·15² + (60·24 + π·12²) (composite method, Gere & Goodno App. E).
      close(await prop(page, 'area'), 60000 - 24000 + PI * 225 + 1440 + PI * 144, 'A of the section with the plate cut out, holes kept');
      const ops = (await docShapes(page)).map((s) => s.op ?? 'add');
      assert.deepEqual(ops.slice(0, 2), ['add', 'subtract']);
      assert.equal((await docShapes(page)).length, 4, 'the plate, the cut-out and the two holes kept');
      await page.click('[data-command="undo"]');
      close(await prop(page, 'area'), 60000, 'one undo restores the plate');
    },
  },
  {
    name: 'export DXF from the app, import it again: every panel value agrees to 1e-9',
    async run(t) {
      const { page } = await open(t, { seed: null }); // first start: the demo section (rolled I with root radii, cover plate, opening)
      const before = await panelValues(page);
      assert.ok(Object.keys(before).length > 20, 'the panel lists the properties');
      await page.click('[data-command="file.export"]');
      await page.waitForSelector('[data-testid="export-dialog"]');
      await shot(page, 'export-dialog');
      const [dl] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid="export-dxf"]')]);
      assert.match(dl.suggestedFilename(), /^Canopy-edge-beam-at-conduit-opening\.dxf$/);
      const dxf = await readDownload(dl);
      assert.match(dxf.toString('utf8'), /\$INSUNITS\n70\n4\n/, 'the units are stated (4 = millimetres, DXF reference)');
      assert.match(dxf.toString('utf8'), /\n42\n/, 'arcs leave as bulges');
      await page.click('[data-testid="export-dialog"] button:has-text("Close")');
      await page.click('[data-command="file.new"]');
      await page.click('[data-question="new-section"] [data-answer="yes"]'); // the demo has shapes: New asks first
      await settle(page);
      assert.equal((await docShapes(page)).length, 0);
      await importThroughChooser(page, { name: 'roundtrip.dxf', mimeType: 'application/dxf', buffer: dxf });
      await page.waitForSelector('[data-testid="dxf-review"]');
      await page.click('[data-testid="dxf-apply"]');
      const after = await panelValues(page);
      for (const [k, v] of Object.entries(before)) {
        // θ of a principal axis is defined modulo 180°.
        const got = k === 'theta' && Math.abs(after[k] - v) > 90 ? after[k] - Math.sign(after[k] - v) * 180 : after[k];
        // Values that can be zero by symmetry are compared against the size they come from:
        // coordinates against the depth, first moments against A·depth, Ixy against Ix.
        const depth = before['bounds.ymax'] - before['bounds.ymin'];
        const natural = /^(centroid|plasticAxis|bounds)\./.test(k) ? depth : k === 'Qx' || k === 'Qy' ? before.area * depth : k === 'Ixy' ? before.Ix : k === 'theta' ? 1 : 0;
        const scale = Math.max(Math.abs(v), natural);
        assert.ok(Math.abs(got - v) <= 1e-9 * Math.max(scale, 1e-300), `${k}: ${got} after the round trip, ${v} before`);
      }
    },
  },
  {
    name: 'export SVG, PNG at a chosen resolution and the section document',
    async run(t) {
      const seed = { ...doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 50 }, { id: 'h', type: 'circle', center: [50, 25], radius: 10, op: 'subtract' }]), name: 'Test plate' };
      const { page } = await open(t, { seed });
      await page.click('[data-command="file.export"]');
      const [svgDl] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid="export-svg"]')]);
      assert.equal(svgDl.suggestedFilename(), 'Test-plate.svg');
      const svg = (await readDownload(svgDl)).toString('utf8');
      // True size: the viewBox is the section plus 2 % of 100 on each side, width in mm at 1:1.
      assert.match(svg, /width="104mm" height="54mm"/);
      assert.match(svg, / A10 10 0 /, 'the hole leaves as exact SVG arcs of radius 10');
      await page.fill('[data-testid="export-png-ppu"]', '4');
      // Size: (100 + 2·4) × (50 + 2·4) units at 4 px per unit (margin 4 % of the larger extent).
      assert.match(await page.textContent('[data-testid="export-dialog"]'), /432 × 232 px/);
      const [pngDl] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid="export-png"]')]);
      assert.equal(pngDl.suggestedFilename(), 'Test-plate.png');
      const png = await readDownload(pngDl);
      // PNG signature and IHDR width/height (W3C PNG specification, 5.2 and 11.2.2).
      assert.deepEqual([...png.subarray(0, 8)], [137, 80, 78, 71, 13, 10, 26, 10]);
      assert.equal(png.readUInt32BE(16), 432);
      assert.equal(png.readUInt32BE(20), 232);
      await page.fill('[data-testid="export-png-ppu"]', '1000');
      assert.match(await page.textContent('[data-testid="export-dialog"]'), /largest side allowed is 8192 px/);
      assert.equal(await page.isDisabled('[data-testid="export-png"]'), true);
      const [jsonDl] = await Promise.all([page.waitForEvent('download'), page.click('[data-testid="export-json"]')]);
      assert.equal(jsonDl.suggestedFilename(), 'Test-plate.json');
      const saved = JSON.parse((await readDownload(jsonDl)).toString('utf8'));
      assert.deepEqual(saved.shapes, seed.shapes);
      fs.mkdirSync(SHOTS, { recursive: true });
      fs.writeFileSync(path.join(SHOTS, 'export.png'), png);
    },
  },
];

/** Ix of the no-units fixture about its centroid, in in⁴: rectangle 4 × 2 less a circle r 0.5 at (1, 1). */
function ixNoUnits() {
  // Parallel-axis theorem (Gere & Goodno App. E): rectangle centroid y = 1, circle centroid y = 1,
  // so both are already about y = 1 and the section's centroid is at y = 1 as well.
  return (4 * 2 ** 3) / 12 - (PI * 0.5 ** 4) / 4;
}
