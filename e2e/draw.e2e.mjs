/**
 * Drawing every shape kind with the mouse and by typed input; the panel's values are checked
 * against closed forms (sources beside each check). The view is 2 px per mm, so the grid snap
 * step is 10 mm and clicks land on exact coordinates.
 */
import assert from 'node:assert/strict';
import { clickWorld, close, docShapes, focusCanvas, open, pagePoint, prop, setField, typeInput } from './helpers.mjs';

const PI = Math.PI;

export const tests = [
  {
    name: 'rectangle by two clicks',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('r');
      await clickWorld(page, 0, 0);
      await clickWorld(page, 100, 60, 2, -1); // a pixel off: the grid snap puts it on (100, 60)
      const b = 100, h = 60;
      close(await prop(page, 'area'), b * h, 'A = b·h (Gere & Goodno, App. E, rectangle)');
      close(await prop(page, 'Ix'), (b * h ** 3) / 12, 'Ix = b·h³/12 (Gere & Goodno, App. E, rectangle)');
      close(await prop(page, 'Iy'), (h * b ** 3) / 12, 'Iy = h·b³/12 (Gere & Goodno, App. E, rectangle)');
      close(await prop(page, 'centroid.x'), 50, 'x̄ = b/2');
      close(await prop(page, 'centroid.y'), 30, 'ȳ = h/2');
      close(await prop(page, 'Zx'), (b * h * h) / 4, 'Zx = b·h²/4 (Gere & Goodno, §6.10, rectangular section)');
    },
  },
  {
    name: 'rectangle by press-drag-release',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('r');
      const [x0, y0] = await pagePoint(page, 20, 10);
      const [x1, y1] = await pagePoint(page, 60, 90);
      await page.mouse.move(x0, y0);
      await page.mouse.down();
      await page.mouse.move(x1, y1, { steps: 6 });
      await page.mouse.up();
      close(await prop(page, 'area'), 40 * 80, 'A = b·h (Gere & Goodno, App. E)');
      close(await prop(page, 'Ix'), (40 * 80 ** 3) / 12, 'Ix = b·h³/12 (Gere & Goodno, App. E)');
    },
  },
  {
    name: 'rectangle by typed corner and size',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('r');
      await typeInput(page, '10, 20');
      await typeInput(page, 'd 120, 2*40');
      close(await prop(page, 'area'), 120 * 80, 'A = b·h (Gere & Goodno, App. E)');
      close(await prop(page, 'Iy'), (80 * 120 ** 3) / 12, 'Iy = h·b³/12 (Gere & Goodno, App. E)');
      close(await prop(page, 'centroid.x'), 70, 'x̄ = x0 + b/2');
      close(await prop(page, 'centroid.y'), 60, 'ȳ = y0 + h/2');
    },
  },
  {
    name: 'circle by centre and rim clicks',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('c');
      await clickWorld(page, 50, 50);
      await clickWorld(page, 80, 50);
      const r = 30;
      close(await prop(page, 'area'), PI * r * r, 'A = πr² (Gere & Goodno, App. E, circle)');
      close(await prop(page, 'Ix'), (PI * r ** 4) / 4, 'I = πr⁴/4 (Gere & Goodno, App. E, circle)');
      close(await prop(page, 'Sx_top'), (PI * r ** 3) / 4, 'S = πr³/4 (Gere & Goodno, App. E, circle)');
      close(await prop(page, 'Zx'), (4 * r ** 3) / 3, 'Z = 4r³/3 = d³/6 (Gere & Goodno, §6.10, circular section)', 1e-8);
    },
  },
  {
    name: 'circle by typed centre and an arithmetic radius',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('c');
      await typeInput(page, '0, 0');
      await typeInput(page, '2*12.5');
      close(await prop(page, 'area'), PI * 625, 'A = πr², r = 25 (Gere & Goodno, App. E, circle)');
      close(await prop(page, 'J0'), (PI * 25 ** 4) / 2, 'J = πr⁴/2 (Gere & Goodno, App. E, circle)');
    },
  },
  {
    name: 'polygon by clicks, closed on the first point',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('p');
      await clickWorld(page, 0, 0);
      await clickWorld(page, 60, 0);
      await clickWorld(page, 0, 90);
      await clickWorld(page, 0, 0, 3, 2); // near the first point: closes
      const b = 60, h = 90;
      assert.equal((await docShapes(page)).length, 1);
      close(await prop(page, 'area'), (b * h) / 2, 'A = b·h/2 (Gere & Goodno, App. E, right triangle)');
      close(await prop(page, 'centroid.x'), b / 3, 'x̄ = b/3 (Gere & Goodno, App. E, right triangle)');
      close(await prop(page, 'centroid.y'), h / 3, 'ȳ = h/3 (Gere & Goodno, App. E, right triangle)');
      close(await prop(page, 'Ix'), (b * h ** 3) / 36, 'Ix = b·h³/36 (Gere & Goodno, App. E, right triangle)');
      close(await prop(page, 'Ixy'), -(b * b * h * h) / 72, 'Ixy = −b²h²/72 (Gere & Goodno, App. E, right triangle)');
    },
  },
  {
    name: 'polygon by typed points (relative and polar), finished with Enter',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('p');
      await typeInput(page, '0, 0');
      await typeInput(page, 'Δ 80, 0');
      await typeInput(page, '80 a 90');
      await typeInput(page, '0, 80');
      await page.press('[data-testid="typed-input"]', 'Enter'); // empty entry finishes
      const a = 80;
      close(await prop(page, 'area'), a * a, 'A = a² (Gere & Goodno, App. E, square)');
      close(await prop(page, 'Ix'), a ** 4 / 12, 'I = a⁴/12 (Gere & Goodno, App. E, square)');
    },
  },
  {
    name: 'path by clicks with a three-point arc: semicircle',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('l');
      await clickWorld(page, -50, 0);
      await clickWorld(page, 50, 0);
      await page.keyboard.press('a'); // next segment is an arc
      await clickWorld(page, 0, 50); // through
      await clickWorld(page, -50, 0); // end on the start: closes
      const r = 50;
      const shapes = await docShapes(page);
      assert.equal(shapes.length, 1);
      assert.equal(shapes[0].type, 'path');
      close(await prop(page, 'area'), (PI * r * r) / 2, 'A = πr²/2 (Gere & Goodno, App. E, semicircle)');
      close(await prop(page, 'centroid.y'), (4 * r) / (3 * PI), 'ȳ = 4r/3π (Gere & Goodno, App. E, semicircle)');
      close(await prop(page, 'Ix'), (PI / 8 - 8 / (9 * PI)) * r ** 4, 'Ix = (π/8 − 8/9π)r⁴ (Gere & Goodno, App. E, semicircle)', 1e-8);
      close(await prop(page, 'Iy'), (PI * r ** 4) / 8, 'Iy = πr⁴/8 (Gere & Goodno, App. E, semicircle)');
    },
  },
  {
    name: 'path by typed points: rectangle with a semicircular end',
    async run(t) {
      const { page } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('l');
      await typeInput(page, '0, 0');
      await typeInput(page, 'd 60, 0');
      await page.click('[data-command="path.arcMode"]');
      await typeInput(page, 'd 20, 20'); // through (80, 20)
      await typeInput(page, '60, 40');
      await page.click('[data-command="path.arcMode"]');
      await typeInput(page, '0, 40');
      await page.press('[data-testid="typed-input"]', 'Enter'); // closes back to the start
      const r = 20;
      const A = 60 * 40 + (PI * r * r) / 2;
      // Composite area (Gere & Goodno, §12.3): rectangle plus semicircle, centroid of the semicircle at 4r/3π (App. E).
      close(await prop(page, 'area'), A, 'A = b·h + πr²/2');
      close(await prop(page, 'centroid.x'), (2400 * 30 + ((PI * r * r) / 2) * (60 + (4 * r) / (3 * PI))) / A, 'x̄ of the composite (Gere & Goodno, §12.3)');
      close(await prop(page, 'centroid.y'), 20, 'ȳ on the axis of symmetry');
    },
  },
  {
    name: 'I-beam placed by click, edited in the panel with arithmetic; bad values refused',
    async run(t) {
      const { page } = await open(t);
      await page.selectOption('[data-testid="profile-type"]', 'i-beam');
      await clickWorld(page, 0, 0);
      const shapes = await docShapes(page);
      assert.equal(shapes.length, 1);
      assert.equal(shapes[0].type, 'i-beam');
      await setField(page, 'rootRadius', '0');
      await setField(page, 'flangeThickness', '2*5');
      await setField(page, 'depth', '200');
      await setField(page, 'flangeWidth', '100');
      await setField(page, 'webThickness', '6');
      const d = 200, bf = 100, tf = 10, tw = 6;
      close(await prop(page, 'area'), 2 * bf * tf + (d - 2 * tf) * tw, 'A of an I by rectangles (Gere & Goodno, §12.3)');
      close(await prop(page, 'Ix'), (bf * d ** 3 - (bf - tw) * (d - 2 * tf) ** 3) / 12, 'Ix = [bf·d³ − (bf − tw)(d − 2tf)³]/12 (Gere & Goodno, §12.4, wide-flange by subtraction)');
      close(await prop(page, 'Iy'), (2 * tf * bf ** 3 + (d - 2 * tf) * tw ** 3) / 12, 'Iy = [2tf·bf³ + (d − 2tf)tw³]/12 (Gere & Goodno, §12.4)');
      // Bad input: a syntax error, then a geometric impossibility; neither is applied.
      const before = await prop(page, 'area');
      const sel = '[data-testid="selection-panel"] input[data-field="flangeThickness"]';
      await page.fill(sel, '2*');
      await page.press(sel, 'Enter');
      assert.match(await page.textContent('[data-error-for="flangeThickness"]'), /position/);
      await page.fill(sel, '150');
      await page.press(sel, 'Enter');
      assert.ok((await page.textContent('[data-error-for="flangeThickness"]')).length > 10, 'a message for an impossible flange');
      close(await prop(page, 'area'), before, 'area unchanged after refused input');
      assert.equal((await docShapes(page))[0].flangeThickness, 10);
      // Escape gives the stored value back and clears the message (the blur that follows does
      // not apply the refused text again).
      await page.press(sel, 'Escape');
      assert.equal(await page.inputValue(sel), '10');
      assert.equal(await page.$('[data-error-for="flangeThickness"]'), null, 'no message after Escape');
    },
  },
  {
    name: 'every other profile placed by click with its default dimensions',
    async run(t) {
      const { page } = await open(t);
      // Areas by decomposition into rectangles, quarter annuli and quarter-circular spandrels of
      // area (1 − π/4)·r² (Gere & Goodno, App. E; composite areas §12.3).
      const sp = (r) => (1 - PI / 4) * r * r;
      const cases = {
        channel: (s) => 2 * s.flangeWidth * s.flangeThickness + (s.depth - 2 * s.flangeThickness) * s.webThickness + 2 * sp(s.rootRadius),
        angle: (s) => s.thickness * (s.legVertical + s.legHorizontal - s.thickness) + sp(s.rootRadius),
        tee: (s) => s.flangeWidth * s.flangeThickness + (s.depth - s.flangeThickness) * s.stemThickness + 2 * sp(s.rootRadius),
        'rect-tube': (s) => {
          const ri = Math.max(s.outerRadius - s.wall, 0);
          return s.width * s.height - (4 - PI) * s.outerRadius ** 2 - ((s.width - 2 * s.wall) * (s.height - 2 * s.wall) - (4 - PI) * ri * ri);
        },
        rectangle: (s) => s.width * s.height - (4 - PI) * (s.cornerRadius ?? 0) ** 2,
      };
      for (const [type, area] of Object.entries(cases)) {
        await page.evaluate(() => window.__kern.editor.run('file.new', 'discard')); // without the question
        await page.selectOption('[data-testid="profile-type"]', type);
        await clickWorld(page, 0, 0);
        const s = (await docShapes(page))[0];
        assert.equal(s.type, type);
        close(await prop(page, 'area'), area(s), `${type} area`);
      }
    },
  },
  {
    name: 'round tube placed by typed point',
    async run(t) {
      const { page } = await open(t);
      await page.selectOption('[data-testid="profile-type"]', 'round-tube');
      await typeInput(page, '0, 0');
      const s = (await docShapes(page))[0];
      const D = s.outerDiameter, d = s.outerDiameter - 2 * s.wall;
      close(await prop(page, 'area'), (PI * (D * D - d * d)) / 4, 'A = π(D² − d²)/4 (Gere & Goodno, App. E, hollow circle)');
      close(await prop(page, 'Ix'), (PI * (D ** 4 - d ** 4)) / 64, 'I = π(D⁴ − d⁴)/64 (Gere & Goodno, App. E, hollow circle)');
    },
  },
  {
    name: 'bracket from typed dimensions: bent plate with a fillet and a hole',
    async run(t) {
      const { page } = await open(t);
      await page.selectOption('[data-testid="profile-type"]', 'bent-plate');
      await typeInput(page, '0, 0');
      await setField(page, 'legHorizontal', '150');
      await setField(page, 'legVertical', '100');
      await setField(page, 'thickness', '20');
      await setField(page, 'insideRadius', '10');
      await focusCanvas(page);
      await page.keyboard.press('c');
      await typeInput(page, '90, 10');
      await typeInput(page, '5');
      await page.click('[data-testid="op-subtract"]');
      const t_ = 20, ri = 10, ro = ri + t_, Lh = 150, Lv = 100, rh = 5;
      // Two straight legs, a quarter annulus at the bend, less the hole (Gere & Goodno, App. E: rectangle, circle; §12.3 composite).
      const A = (Lh - ro) * t_ + (Lv - ro) * t_ + (PI * (ro * ro - ri * ri)) / 4 - PI * rh * rh;
      close(await prop(page, 'area'), A, 'bracket area');
      const shapes = await docShapes(page);
      assert.deepEqual(shapes.map((s) => s.op ?? 'add'), ['add', 'subtract']);
    },
  },
];
