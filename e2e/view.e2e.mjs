/**
 * The view and file commands: wheel zoom about the pointer, pan, fit, box selection, saving a
 * file, snapping onto an intersection and a refused typed entry.
 */
import assert from 'node:assert/strict';
import { close, doc, docShapes, focusCanvas, open, pagePoint, prop, settle, typeInput } from './helpers.mjs';

const view = (page) => page.evaluate(() => {
  const s = window.__kern.editor.store.getState();
  return { scale: s.scale, ox: s.ox, oy: s.oy };
});

export const tests = [
  {
    name: 'wheel zoom keeps the point under the pointer; middle-button and space-drag pan; fit',
    async run(t) {
      const { page } = await open(t, { seed: doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 60 }]) });
      const [px, py] = await pagePoint(page, 40, 20);
      await page.mouse.move(px, py);
      const v0 = await view(page);
      await page.mouse.wheel(0, -300);
      await page.waitForFunction((s0) => window.__kern.editor.store.getState().scale !== s0, v0.scale);
      const v1 = await view(page);
      assert.ok(v1.scale > v0.scale, 'zoomed in');
      const [qx, qy] = await pagePoint(page, 40, 20);
      close(qx, px, 'world point stays under the pointer (x)', 1e-6);
      close(qy, py, 'world point stays under the pointer (y)', 1e-6);
      // Middle-button pan by (30, −20) px.
      await page.mouse.down({ button: 'middle' });
      await page.mouse.move(px + 30, py - 20, { steps: 3 });
      await page.mouse.up({ button: 'middle' });
      const v2 = await view(page);
      close(v2.ox - v1.ox, 30, 'pan x');
      close(v2.oy - v1.oy, -20, 'pan y');
      // Space + drag pans too.
      await focusCanvas(page);
      await page.keyboard.down('Space');
      await page.mouse.down();
      await page.mouse.move(px + 50, py - 20, { steps: 3 });
      await page.mouse.up();
      await page.keyboard.up('Space');
      const v3 = await view(page);
      close(v3.ox - v2.ox, 20, 'space-drag pan x');
      assert.equal((await docShapes(page))[0].at[0], 0, 'panning moved no shape');
      // Fit puts the section's centre in the middle of the canvas below the proposals strip
      // (STRIP_PX = 28 px at the top, app/view.ts), so 14 px below the canvas's own middle.
      await page.keyboard.press('f');
      const box = await page.locator('[data-testid="canvas"]').boundingBox();
      const [cx, cy] = await pagePoint(page, 50, 30);
      close(cx, box.x + box.width / 2, 'fit centres x', 1e-3);
      close(cy, box.y + (box.height + 28) / 2, 'fit centres y', 1e-3);
    },
  },
  {
    name: 'box selection picks the shapes inside the box',
    async run(t) {
      const { page } = await open(t, {
        seed: doc([
          { id: 'a', type: 'circle', center: [20, 20], radius: 10 },
          { id: 'b', type: 'circle', center: [60, 20], radius: 10 },
          { id: 'c', type: 'circle', center: [200, 20], radius: 10 },
        ]),
      });
      const [x0, y0] = await pagePoint(page, -5, 45);
      const [x1, y1] = await pagePoint(page, 85, -5);
      await page.mouse.move(x0, y0);
      await page.mouse.down();
      await page.mouse.move(x1, y1, { steps: 5 });
      await page.mouse.up();
      const sel = await page.evaluate(() => window.__kern.editor.store.getState().selected);
      assert.deepEqual(sel.sort(), ['a', 'b']);
    },
  },
  {
    name: 'save writes the section document as JSON',
    async run(t) {
      const seed = { ...doc([{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 60 }]), name: 'Test plate' };
      const { page } = await open(t, { seed });
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('[data-command="file.save"]')]);
      assert.equal(download.suggestedFilename(), 'Test-plate.json');
      const stream = await download.createReadStream();
      const chunks = [];
      for await (const c of stream) chunks.push(c);
      const saved = JSON.parse(Buffer.concat(chunks).toString('utf8'));
      assert.equal(saved.format, 'kern-section');
      // The seed is a version-1 document: it opens, and is saved, as version 2.
      assert.equal(saved.version, 2);
      assert.deepEqual(saved.shapes, seed.shapes);
    },
  },
  {
    name: 'snapping onto the intersection of two outlines',
    async run(t) {
      const { page } = await open(t, {
        seed: doc([
          { id: 'a', type: 'rectangle', at: [0, 0], width: 100, height: 40 },
          { id: 'b', type: 'circle', center: [100.5, 40.5], radius: 30 },
        ]),
      });
      await page.click('[data-command="snap.grid"]');
      await focusCanvas(page);
      await page.keyboard.press('c');
      // The circle crosses the rectangle's top edge y = 40 at x = 100.5 − √(30² − 0.5²).
      const xi = 100.5 - Math.sqrt(900 - 0.25);
      const [px, py] = await pagePoint(page, xi, 40);
      await page.mouse.move(px + 3, py + 2, { steps: 2 });
      const snap = await page.evaluate(() => window.__kern.editor.transient.getState().snap);
      assert.equal(snap.kind, 'intersection');
      close(snap.p[0], xi, 'x of the crossing (circle–line intersection, exact)', 1e-12);
      close(snap.p[1], 40, 'y of the crossing', 1e-12);
    },
  },
  {
    name: 'a typed entry that cannot be read is refused with a message',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('r');
      await page.fill('[data-testid="typed-input"]', '10, 2*');
      await page.press('[data-testid="typed-input"]', 'Enter');
      assert.match(await page.textContent('[data-testid="input-error"]'), /^y: .*position/);
      await page.fill('[data-testid="typed-input"]', 'd 5, 5');
      await page.press('[data-testid="typed-input"]', 'Enter');
      assert.match(await page.textContent('[data-testid="input-error"]'), /no previous point/);
      assert.equal((await docShapes(page)).length, 0);
      // Typing on the canvas starts the entry; the same tool then accepts it.
      await focusCanvas(page);
      await page.keyboard.type('0,0');
      await page.keyboard.press('Enter');
      await typeInput(page, 'd 30, 20');
      await settle(page);
      close(await prop(page, 'area'), 600, 'A = b·h (Gere & Goodno, App. E)');
    },
  },
];
