/**
 * Editing behaviour in the browser: operation switches, undo/redo, autosave across a reload,
 * a bad file, snapping onto a vertex, the live drag preview, unit switching, the cut line,
 * merging, handles and the report. Closed forms are named beside each check.
 */
import assert from 'node:assert/strict';
import { close, doc, docShapes, focusCanvas, open, pagePoint, prop, propUnit, settle, typeInput } from './helpers.mjs';

const PI = Math.PI;
const plateAndHole = (op) =>
  doc([
    { id: 'plate', type: 'rectangle', at: [0, 0], width: 100, height: 100 },
    { id: 'hole', type: 'circle', center: [50, 50], radius: 20, ...(op ? { op } : {}) },
  ]);
const rect100x60 = doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 60 }]);

async function selectInList(page, id) {
  await page.click(`[data-shape="${id}"]`);
  await settle(page);
}

export const tests = [
  {
    name: 'the name field follows undo and redo (regression: it kept the undone name)',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      await selectInList(page, 'r');
      await page.fill('[data-field="name"]', 'Base plate');
      await page.press('[data-field="name"]', 'Enter');
      await settle(page);
      assert.equal((await docShapes(page))[0].name, 'Base plate');
      await page.click('[data-command="undo"]');
      await settle(page);
      assert.equal(await page.inputValue('[data-field="name"]'), '', 'the field shows the name as it is after undo');
      await page.click('[data-command="redo"]');
      await settle(page);
      assert.equal(await page.inputValue('[data-field="name"]'), 'Base plate');
    },
  },
  {
    name: 'operation switches: add, subtract, intersect',
    async run(t) {
      const { page } = await open(t, { seed: plateAndHole() });
      close(await prop(page, 'area'), 10000, 'union with a circle inside = the square, b² (Gere & Goodno, App. E)');
      await selectInList(page, 'hole');
      await page.click('[data-testid="op-subtract"]');
      close(await prop(page, 'area'), 10000 - PI * 400, 'b² − πr² (Gere & Goodno, App. E)');
      close(await prop(page, 'Ix'), 100 ** 4 / 12 - (PI * 20 ** 4) / 4, 'b⁴/12 − πr⁴/4 (Gere & Goodno, App. E, concentric)');
      await page.click('[data-testid="op-intersect"]');
      close(await prop(page, 'area'), PI * 400, 'square ∩ circle = circle, πr² (Gere & Goodno, App. E)');
      await page.click('[data-testid="op-add"]');
      close(await prop(page, 'area'), 10000, 'back to the square, b²');
    },
  },
  {
    name: 'undo and redo round trips (keys and buttons)',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      const a0 = await prop(page, 'area');
      close(a0, 6000, 'A = b·h (Gere & Goodno, App. E)');
      await focusCanvas(page);
      await page.keyboard.press('c');
      await typeInput(page, '200, 30');
      await typeInput(page, '10');
      const a1 = await prop(page, 'area');
      close(a1, 6000 + PI * 100, 'b·h + πr² (Gere & Goodno, App. E; disjoint parts add)');
      await selectInList(page, 'r');
      await page.click('[data-testid="op-subtract"]'); // subtracting from nothing before it: only the circle remains
      close(await prop(page, 'area'), PI * 100, 'πr²');
      await focusCanvas(page);
      await page.keyboard.press('Control+z');
      close(await prop(page, 'area'), a1, 'after one undo');
      await page.keyboard.press('Control+z');
      close(await prop(page, 'area'), a0, 'after two undos');
      await page.keyboard.press('Control+Shift+z');
      close(await prop(page, 'area'), a1, 'after redo');
      await page.keyboard.press('Control+y');
      close(await prop(page, 'area'), PI * 100, 'after a second redo');
      await page.click('[data-command="undo"]');
      await page.click('[data-command="undo"]');
      close(await prop(page, 'area'), a0, 'undo buttons');
      assert.equal(await page.isDisabled('[data-command="undo"]'), true);
    },
  },
  {
    name: 'autosave restores the section after a reload',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      await focusCanvas(page);
      await page.keyboard.press('c');
      await typeInput(page, '200, 30');
      await typeInput(page, '15');
      const a = await prop(page, 'area');
      close(a, 6000 + PI * 225, 'b·h + πr² (Gere & Goodno, App. E)');
      await page.reload();
      await page.waitForFunction(() => window.__kern);
      close(await prop(page, 'area'), a, 'area after reload');
      assert.equal((await docShapes(page)).length, 2);
    },
  },
  {
    name: 'a file that fails validation shows its messages and leaves the section untouched',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      const before = await docShapes(page);
      const bad = { format: 'kern-section', version: 1, units: 'mm', shapes: [{ id: 'c', type: 'circle', center: [0, 0], radius: -3 }] };
      await page.setInputFiles('[data-testid="file-input"]', { name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
      await page.waitForSelector('[data-testid="notice"]');
      const text = await page.textContent('[data-testid="notice"]');
      assert.match(text, /broken\.json/);
      assert.match(text, /shapes\[0\]\.radius/);
      assert.match(text, /unchanged/);
      assert.deepEqual(await docShapes(page), before);
      close(await prop(page, 'area'), 6000, 'area unchanged');
      await page.setInputFiles('[data-testid="file-input"]', { name: 'junk.json', mimeType: 'application/json', buffer: Buffer.from('{ not json') });
      await page.waitForFunction(() => document.querySelector('[data-testid="notice"]')?.textContent.includes('junk.json'));
      assert.deepEqual(await docShapes(page), before);
      // A valid file does replace it.
      const good = doc([{ id: 'c', type: 'circle', center: [0, 0], radius: 10 }]);
      await page.setInputFiles('[data-testid="file-input"]', { name: 'good.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(good)) });
      await page.waitForFunction(() => window.__kern.editor.store.getState().doc.shapes[0]?.id === 'c');
      close(await prop(page, 'area'), PI * 100, 'πr² (Gere & Goodno, App. E)');
    },
  },
  {
    name: 'snapping onto a vertex (grid snap off), shown before the click',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'r', type: 'rectangle', at: [0.3, 0.7], width: 100, height: 60 }]) });
      await page.click('[data-command="snap.grid"]'); // grid off: only geometry snaps
      await focusCanvas(page);
      await page.keyboard.press('p');
      const [px, py] = await pagePoint(page, 100.3, 60.7);
      await page.mouse.move(px + 4, py - 3, { steps: 3 });
      const snap = await page.evaluate(() => window.__kern.editor.transient.getState().snap);
      assert.equal(snap?.kind, 'vertex', 'the snap target is shown before the click');
      await page.mouse.down();
      await page.mouse.up();
      await typeInput(page, 'd 50, 0');
      await typeInput(page, '50 ∠ 90');
      await page.press('[data-testid="typed-input"]', 'Enter');
      const shapes = await docShapes(page);
      assert.deepEqual(shapes[1].points[0], [100.3, 60.7], 'the first point is exactly the corner');
    },
  },
  {
    name: 'dragging a shape updates the values mid-drag and records one undo step',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      close(await prop(page, 'centroid.x'), 50, 'x̄ = b/2');
      const [x0, y0] = await pagePoint(page, 50, 30);
      await page.mouse.move(x0, y0);
      await page.mouse.down();
      const seen = [];
      for (let k = 1; k <= 8; k++) {
        await page.mouse.move(x0 + k * 10, y0); // 5 mm per step at 2 px/mm
        seen.push(await prop(page, 'centroid.x'));
      }
      const pastMid = await page.evaluate(() => window.__kern.editor.store.getState().past.length);
      assert.equal(pastMid, 0, 'nothing recorded during the drag');
      assert.ok(seen[3] > 50 && seen[3] < seen[7], `centroid moved during the drag: ${seen.join(', ')}`);
      await page.mouse.up();
      close(await prop(page, 'centroid.x'), 90, 'moved 40 mm (grid step 10 mm)');
      assert.equal(await page.evaluate(() => window.__kern.editor.store.getState().past.length), 1);
      await focusCanvas(page);
      await page.keyboard.press('Control+z');
      close(await prop(page, 'centroid.x'), 50, 'one undo restores');
    },
  },
  {
    name: 'a dragged shape snaps its corner onto another shape’s corner',
    async run(t) {
      const { page } = await open(t, {
        seed: doc([
          { id: 'a', type: 'rectangle', at: [0, 0], width: 100, height: 60 },
          { id: 'b', type: 'rectangle', at: [150.3, 0.7], width: 40, height: 40 },
        ]),
      });
      await page.click('[data-command="snap.grid"]'); // only the geometry pulls
      const [x0, y0] = await pagePoint(page, 170, 20);
      await page.mouse.move(x0, y0);
      await page.mouse.down();
      // Bring b's lower-left corner (150.3, 0.7) to about (101.5, 61) — near a's corner (100, 60).
      const [x1, y1] = await pagePoint(page, 170 - 48.8, 20 + 60.3);
      await page.mouse.move(x1, y1, { steps: 6 });
      const snap = await page.evaluate(() => window.__kern.editor.transient.getState().snap);
      assert.equal(snap?.kind, 'vertex', 'the target corner is shown during the drag');
      await page.mouse.up();
      const b = (await docShapes(page))[1];
      assert.deepEqual(b.at, [100, 60], 'corner on corner, exactly');
    },
  },
  {
    name: 'unit switching converts the section and shows units with powers',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      await page.selectOption('[data-testid="units"]', 'cm');
      close(await prop(page, 'area'), 60, '1 cm = 10 mm (SI): 10 cm × 6 cm');
      close(await prop(page, 'Ix'), (10 * 6 ** 3) / 12, 'Ix = b·h³/12 in cm (Gere & Goodno, App. E)');
      assert.equal(await propUnit(page, 'area'), 'cm²');
      assert.equal(await propUnit(page, 'Ix'), 'cm⁴');
      assert.equal(await propUnit(page, 'Sx_top'), 'cm³');
      await page.selectOption('[data-testid="units"]', 'in');
      close(await prop(page, 'area'), 6000 / 25.4 ** 2, '1 in = 25.4 mm exactly (international inch)');
      assert.equal(await propUnit(page, 'Ix'), 'in⁴');
      await page.selectOption('[data-testid="units"]', 'ft');
      close(await prop(page, 'centroid.x'), 50 / 304.8, '1 ft = 304.8 mm exactly');
      await page.selectOption('[data-testid="units"]', 'm');
      close(await prop(page, 'Ix'), (0.1 * 0.06 ** 3) / 12, 'Ix in m⁴');
      await page.selectOption('[data-testid="units"]', 'mm');
      close(await prop(page, 'area'), 6000, 'back in mm');
    },
  },
  {
    name: 'cut line: b, Q and the area beyond, dragged on the canvas',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      await page.click('[data-command="view.cut"]');
      await page.waitForSelector('[data-testid="cut-panel"]');
      const num = async (k) => Number(await page.getAttribute(`[data-cut="${k}"]`, 'data-value'));
      close(await num('width'), 100, 'b at the neutral axis');
      close(await num('Q'), (100 * 60 * 60) / 8, 'Qmax = b·h²/8 (Gere & Goodno, §5.8, rectangular beam)');
      close(await num('area'), 3000, 'half the area');
      // Drag the line from y = 30 to y = 45 (grip at the left end).
      const [, sy] = await pagePoint(page, 0, 30);
      const box = await page.locator('[data-testid="canvas"]').boundingBox();
      await page.mouse.move(box.x + 300, sy);
      await page.mouse.down();
      await page.mouse.move(box.x + 300, sy - 30, { steps: 4 });
      await page.mouse.up();
      await settle(page);
      const at = await page.evaluate(() => window.__kern.editor.store.getState().cutAt);
      close(at, 45, 'cut moved to y = 45', 1e-6);
      const y1 = 15; // distance from the cut to the top
      close(await num('Q'), 100 * y1 * (15 + y1 / 2), 'Q = b·y1·(y0 + y1/2) (Gere & Goodno, §5.8)');
      assert.ok(await page.isVisible('.cut-plot'));
    },
  },
  {
    name: 'vertical cut line: b, Q and the area to the right, dragged on the canvas',
    async run(t) {
      const { page } = await open(t, { seed: rect100x60 });
      await page.click('[data-command="view.cut"]');
      await page.waitForSelector('[data-testid="cut-panel"]');
      await page.click('[data-testid="cut-axis-x"]');
      await settle(page);
      const num = async (k) => Number(await page.getAttribute(`[data-cut="${k}"]`, 'data-value'));
      const at0 = await page.evaluate(() => window.__kern.editor.store.getState().cutAt);
      close(at0, 50, 'a vertical cut starts through the centroid, x̄ = b/2');
      close(await num('width'), 60, 'b of a vertical cut is the depth h');
      close(await num('Q'), (60 * 100 * 100) / 8, 'Qmax = h·b²/8 (Gere & Goodno, §5.8, rectangular beam, turned)');
      close(await num('area'), 3000, 'half the area');
      // Drag the line from x = 50 to x = 80 (30 units = 60 px at 2 px per unit).
      const [sx] = await pagePoint(page, 50, 0);
      const box = await page.locator('[data-testid="canvas"]').boundingBox();
      await page.mouse.move(sx, box.y + 200);
      await page.mouse.down();
      await page.mouse.move(sx + 60, box.y + 200, { steps: 4 });
      await page.mouse.up();
      await settle(page);
      close(await page.evaluate(() => window.__kern.editor.store.getState().cutAt), 80, 'cut moved to x = 80', 1e-6);
      // Part right of x = 80: 20 × 60, centroid 40 right of x̄: Q = A′·d (Gere & Goodno, §5.8).
      close(await num('Q'), 20 * 60 * 40, 'Q = A′ (x̄′ − x̄)');
      close(await num('area'), 1200, 'A′ = 20 · 60');
      await page.click('[data-testid="cut-axis-y"]');
      await settle(page);
      close(await num('width'), 100, 'back to a horizontal cut through the centroid: b');
    },
  },
  {
    name: 'merge into one outline keeps the properties (arcs preserved)',
    async run(t) {
      const { page } = await open(t, { seed: plateAndHole('subtract') });
      const A = await prop(page, 'area');
      close(A, 10000 - PI * 400, 'b² − πr² (Gere & Goodno, App. E)');
      await focusCanvas(page);
      await page.keyboard.press('Control+a');
      await page.click('[data-command="shape.merge"]');
      const shapes = await docShapes(page);
      assert.deepEqual(shapes.map((s) => [s.type, s.op]), [['path', 'add'], ['path', 'subtract']]);
      assert.ok(shapes[1].segments.every((g) => g.via), 'the hole is made of arcs');
      close(await prop(page, 'area'), A, 'area unchanged');
      close(await prop(page, 'Ix'), 100 ** 4 / 12 - (PI * 20 ** 4) / 4, 'b⁴/12 − πr⁴/4 (Gere & Goodno, App. E)');
    },
  },
  {
    name: 'vertex handle drag and arrow-key nudge',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'p', type: 'polygon', points: [[0, 0], [60, 0], [60, 40], [0, 40]] }]) });
      await selectInList(page, 'p');
      const [hx, hy] = await pagePoint(page, 60, 40);
      await page.mouse.move(hx, hy);
      await page.mouse.down();
      await page.mouse.move(hx + 20, hy - 40, { steps: 5 }); // to (70, 60)
      await page.mouse.up();
      const pts = (await docShapes(page))[0].points;
      assert.deepEqual(pts[2], [70, 60]);
      // Shoelace area of (0,0) (60,0) (70,60) (0,40) (Gauss's area formula).
      close(await prop(page, 'area'), 0.5 * Math.abs(0 * 0 - 60 * 0 + (60 * 60 - 70 * 0) + (70 * 40 - 0 * 60) + (0 * 0 - 0 * 40)), 'shoelace area');
      const x0 = await prop(page, 'centroid.x');
      await focusCanvas(page);
      await page.keyboard.press('ArrowRight');
      await page.keyboard.press('Shift+ArrowRight');
      close(await prop(page, 'centroid.x'), x0 + 11, '1 mm + 10 mm fixed steps');
    },
  },
  {
    name: 'convert a profile to outline, rotate by a typed angle, mirror and delete',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'T', type: 'tee', at: [0, 0], depth: 100, flangeWidth: 80, flangeThickness: 10, stemThickness: 8, rootRadius: 0 }]) });
      await selectInList(page, 'T');
      const A = await prop(page, 'area');
      close(A, 80 * 10 + 90 * 8, 'tee by rectangles (Gere & Goodno, §12.3)');
      const Ix = await prop(page, 'Ix');
      await page.fill('input[data-field="rotate-by"]', '45*2');
      await page.click('button[data-command="edit.rotate"]');
      close(await prop(page, 'Iy'), Ix, 'turned 90°: Iy′ = Ix (rotation of axes, Gere & Goodno, §12.8)', 1e-9);
      await page.click('[data-command="shape.toOutline"]');
      assert.ok((await docShapes(page)).every((s) => s.type === 'path'));
      close(await prop(page, 'area'), A, 'area kept by the conversion');
      await page.click('[data-command="edit.mirrorX"]');
      close(await prop(page, 'area'), A, 'area kept by the mirror');
      await page.click('[data-command="edit.delete"]');
      assert.equal((await docShapes(page)).length, 0);
      assert.match(await page.textContent('[data-testid="result-message"]'), /empty/);
    },
  },
  {
    name: 'principal axes of a rotated rectangle, overlays toggle',
    async run(t) {
      const { page, errors } = await open(t, { seed: doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 20, height: 100, rotation: 30 }]) });
      const b = 20, h = 100;
      // A rectangle's principal axes run along its sides (Gere & Goodno, §12.9): θ = 30°, I1 = b·h³/12, I2 = h·b³/12.
      close(await prop(page, 'theta'), 30, 'θ of I1 from x');
      close(await prop(page, 'I1'), (b * h ** 3) / 12, 'I1 = b·h³/12');
      close(await prop(page, 'I2'), (h * b ** 3) / 12, 'I2 = h·b³/12');
      // Rotated axes: Ix = (I1 + I2)/2 + (I1 − I2)/2·cos 2θ (Gere & Goodno, §12.8).
      close(await prop(page, 'Ix'), ((b * h ** 3) / 12 + (h * b ** 3) / 12) / 2 + (((b * h ** 3) / 12 - (h * b ** 3) / 12) / 2) * Math.cos(Math.PI / 3), 'Ix by the rotation of axes');
      for (const name of ['view.principal', 'view.fibres', 'view.centroid']) {
        const before = await page.getAttribute(`[data-command="${name}"]`, 'aria-pressed');
        await page.click(`[data-command="${name}"]`);
        assert.notEqual(await page.getAttribute(`[data-command="${name}"]`, 'aria-pressed'), before, `${name} toggles`);
      }
      await settle(page);
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'permanent caution, report overlay, first start shows the demo',
    async run(t) {
      const { page } = await open(t, { seed: null, view: null });
      assert.match(await page.textContent('[data-testid="caution"]'), /Geometric properties only\. The design must be checked against the applicable code by a qualified engineer\./);
      assert.ok((await docShapes(page)).length > 0, 'the demo section is loaded on first start');
      assert.ok((await prop(page, 'area')) > 0);
      await page.click('[data-command="report.open"]');
      await page.waitForSelector('[data-testid="report-overlay"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('body');
      const body = await frame.textContent('body');
      assert.match(body, /Geometric properties only/, 'the report carries the caution');
      const area = await prop(page, 'area');
      // The report prints the same digits as the panel (one formatter).
      const shown = await page.textContent('[data-prop="area"]');
      assert.ok(body.includes(shown), `report shows the area ${shown} (${area})`);
      assert.equal(await page.isEnabled('[data-testid="report-overlay"] button:has-text("Print")'), true);
      await page.click('[data-testid="report-overlay"] button:has-text("Close")');
      assert.equal(await page.$('[data-testid="report-overlay"]'), null);
    },
  },
];
