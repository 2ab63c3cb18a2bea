/**
 * The examples shelf from the app: each example opens from the Examples menu in one undo step,
 * fits the view, and the panel shows its area, checked against the closed form of its parts
 * (composite areas, Gere & Goodno, ch. 12 and App. E; the circular segment from Roark, Table A.1,
 * from memory). The full headline values are pinned in tests/examples.test.ts.
 */
import assert from 'node:assert/strict';
import { close, doc, open, prop, settle } from './helpers.mjs';

const PI = Math.PI;
/** The spandrel a fillet of radius r leaves in a square corner: (1 − π/4)·r². */
const spandrel = (r) => (1 - PI / 4) * r * r;
/** Circular segment beyond a chord at c from the centre of a circle of radius R (Roark, Table A.1, from memory). */
const segment = (R, c) => {
  const a = Math.acos(c / R);
  return R * R * (a - Math.sin(a) * Math.cos(a));
};

const AREAS = {
  // Bent plate t 8, legs 100 and 120 to the outside, inside radius 8: straight legs and a quarter annulus, less three 18 × 8 hole gaps.
  'bent-plate-bracket.json': 8 * (100 + 120 - 2 * 16) + (PI * (16 ** 2 - 8 ** 2)) / 4 - 3 * 18 * 8,
  // Flanges 250 × 16 and 300 × 20, web 600 × 10, cap channel (web 380 × 10, flanges 2 × 16 × 90, two root spandrels r 12), rail 50 × 30.
  'crane-rail-girder.json': 250 * 16 + 600 * 10 + 300 * 20 + 380 * 10 + 2 * 16 * 90 + 2 * spandrel(12) + 50 * 30,
  // Two webs 300 × 10 and four cover-plate strips 110 × 12.
  'perforated-cover-plate.json': 2 * 300 * 10 + 4 * 110 * 12,
  // Tube 80 × 50 × 3 with outside radius 4 (inside 1), four bosses R 4.5 less the segment inside the wall (c = 3.5), less bores r 2.1.
  'aluminium-extrusion.json': 80 * 50 - 4 * spandrel(4) - (74 * 44 - 4 * spandrel(1)) + 4 * (PI * 4.5 ** 2 - segment(4.5, 3.5) - PI * 2.1 ** 2),
  // The proposal opens active: IPE 300 coped to 260 deep, a tee of the bottom flange, two root spandrels r 15 and the web.
  'cope-proposal.json': 150 * 10.7 + (260 - 10.7) * 7.1 + 2 * spandrel(15),
};

export const tests = [
  {
    name: 'examples: each example opens from the menu in one undo step, in view, with its area',
    async run(t) {
      const { page, errors } = await open(t, { seed: doc([{ id: 'mine', type: 'rectangle', at: [0, 0], width: 10, height: 10 }]) });
      await page.click('[data-testid="examples-menu"]');
      const listed = (await page.$$eval('[data-example]', (els) => els.map((e) => e.dataset.example))).filter((f) => f !== 'demo');
      for (const f of Object.keys(AREAS)) assert.ok(listed.includes(f), `the menu lists ${f}`);
      await page.keyboard.press('Escape');
      // Every example on the shelf opens; those whose area has a closed form here are checked against it.
      for (const file of listed) {
        const area = AREAS[file];
        const before = await page.evaluate(() => window.__kern.editor.store.getState().past.length);
        await page.click('[data-testid="examples-menu"]');
        await page.click(`[data-example="${file}"]`);
        await page.waitForFunction((n) => window.__kern.editor.store.getState().past.length === n + 1, before);
        await settle(page);
        if (area !== undefined) close(await prop(page, 'area'), area, `${file}: area`);
        else assert.ok((await prop(page, 'area')) > 0, `${file}: an area is shown`);
        // The view shows the whole section.
        const inView = await page.evaluate(() => {
          const s = window.__kern.editor.store.getState();
          const b = ['xmin', 'xmax', 'ymin', 'ymax'].map((k) => Number(document.querySelector(`[data-prop="bounds.${k}"]`).dataset.value));
          const [x0, x1] = [s.ox + b[0] * s.scale, s.ox + b[1] * s.scale];
          const [y0, y1] = [s.oy - b[3] * s.scale, s.oy - b[2] * s.scale];
          return x0 >= 0 && x1 <= s.width && y0 >= 0 && y1 <= s.height;
        });
        assert.ok(inView, `${file}: the whole section is in view`);
        assert.equal(await page.$('[data-testid="notice"]'), null, `${file}: opened without a notice`);
      }
      // Undo goes back through every example to the user's own section.
      for (let k = 0; k < listed.length; k++) await page.click('[data-command="undo"]');
      await settle(page);
      close(await prop(page, 'area'), 100, 'the section before the examples');
      assert.deepEqual(errors, []);
    },
  },
];
