/**
 * Line elements, weld groups and strips in the browser, as a drafter uses them: a weld group
 * drawn with the line tool by typed entries, read against a weld table, loaded off its centroid
 * and read against a hand calculation; a bent plate drawn by its centreline with the strip tool,
 * its bends rounded, read against the closed form and its thin-wall difference.
 *
 * Sources:
 * - Blodgett, Design of Welded Structures (1966), Table 5, weld treated as a line, C-shaped group
 *   (b flanges, d web): Nx = b²/(2b + d), Jw = (2b + d)³/12 − b²(b + d)²/(2b + d) (from memory);
 *   Sect. 7.4: f = F/L + (T/Jw)·k × r added as vectors (from memory).
 * - Bent plate: rectangles (Gere & Goodno, App. E) and annular quarter sectors (dA = ρ dρ dθ:
 *   A = (Ro² − Ri²)/2·Δθ, second moments (Ro⁴ − Ri⁴)/4·[θ/2 ± sin 2θ/4]; Roark, Table A.1, from
 *   memory, for the sector they generalise), parallel axes (Gere & Goodno, Sect. 12.5).
 */
import assert from 'node:assert/strict';
import { clickWorld, close, docShapes, focusCanvas, open, prop, settle, typeInput } from './helpers.mjs';

const PI = Math.PI;

/** Full-precision value of a line-group property from the panel. */
async function line(page, group, key) {
  await settle(page);
  const v = await page.getAttribute(`[data-line="${group}.${key}"]`, 'data-value');
  assert.ok(v !== null, `no value shown for ${group}.${key}`);
  return Number(v);
}

async function weld(page, key) {
  await settle(page);
  const v = await page.getAttribute(`[data-weld="${key}"]`, 'data-value');
  assert.ok(v !== null, `no weld value shown for ${key}`);
  return Number(v);
}

async function field(page, name, text) {
  const sel = `input[data-field="${name}"]`;
  await page.fill(sel, text);
  await page.press(sel, 'Enter');
  await settle(page);
}

/** Moments of pieces about the origin, and their centroidal Ix, Iy (the same helpers as tests/lines-example.test.ts). */
const sum = (ms) => ms.reduce((a, b) => ({ m00: a.m00 + b.m00, m10: a.m10 + b.m10, m01: a.m01 + b.m01, m20: a.m20 + b.m20, m02: a.m02 + b.m02 }));
function rectangle(x0, x1, y0, y1) {
  const b = x1 - x0, h = y1 - y0, A = b * h, xc = (x0 + x1) / 2, yc = (y0 + y1) / 2;
  return { m00: A, m10: A * xc, m01: A * yc, m20: A * xc * xc + (h * b ** 3) / 12, m02: A * yc * yc + (b * h ** 3) / 12 };
}
function annularSector(cx, cy, ri, ro, t1, t2) {
  const d = (f) => f(t2) - f(t1);
  const k2 = (ro ** 2 - ri ** 2) / 2, k3 = (ro ** 3 - ri ** 3) / 3, k4 = (ro ** 4 - ri ** 4) / 4;
  const m0 = k2 * (t2 - t1), mx = k3 * d(Math.sin), my = k3 * d((t) => -Math.cos(t));
  const mxx = k4 * d((t) => t / 2 + Math.sin(2 * t) / 4), myy = k4 * d((t) => t / 2 - Math.sin(2 * t) / 4);
  return { m00: m0, m10: mx + cx * m0, m01: my + cy * m0, m20: mxx + 2 * cx * mx + cx * cx * m0, m02: myy + 2 * cy * my + cy * cy * m0 };
}
function line2(ax, ay, bx, by) {
  const L = Math.hypot(bx - ax, by - ay), xm = (ax + bx) / 2, ym = (ay + by) / 2;
  return { m00: L, m10: L * xm, m01: L * ym, m20: L * (xm * xm + (bx - ax) ** 2 / 12), m02: L * (ym * ym + (by - ay) ** 2 / 12) };
}
function arc(cx, cy, r, t1, t2) {
  const d = (f) => f(t2) - f(t1);
  const m0 = r * (t2 - t1), mx = r * r * d(Math.sin), my = r * r * d((t) => -Math.cos(t));
  const mxx = r ** 3 * d((t) => t / 2 + Math.sin(2 * t) / 4), myy = r ** 3 * d((t) => t / 2 - Math.sin(2 * t) / 4);
  return { m00: m0, m10: mx + cx * m0, m01: my + cy * m0, m20: mxx + 2 * cx * mx + cx * cx * m0, m02: myy + 2 * cy * my + cy * cy * m0 };
}
function centroidal(m) {
  const x = m.m10 / m.m00, y = m.m01 / m.m00;
  return { A: m.m00, x, y, Ix: m.m02 - m.m00 * y * y, Iy: m.m20 - m.m00 * x * x };
}

export const tests = [
  {
    name: 'lines: a C-shaped weld group typed with the line tool, against Blodgett Table 5, then loaded off its centroid',
    async run(t) {
      const { page, errors } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('w');
      // Flanges b = 50, web d = 100 (mm): top flange tip, web, bottom flange tip.
      await typeInput(page, '50, 100');
      await typeInput(page, 'd -50, 0');
      await typeInput(page, 'd 0, -100');
      await typeInput(page, 'd 50, 0');
      await page.press('[data-testid="typed-input"]', 'Enter');
      const b = 50, d = 100, L = 2 * b + d;
      const Jw = (2 * b + d) ** 3 / 12 - (b * b * (b + d) ** 2) / (2 * b + d);
      close(await line(page, 'Lines', 'length'), L, 'L = 2b + d (Blodgett Table 5, C-shape)');
      close(await line(page, 'Lines', 'centroid.x'), (b * b) / (2 * b + d), 'Nx = b²/(2b + d) (Blodgett Table 5, C-shape)');
      close(await line(page, 'Lines', 'centroid.y'), 50, 'ȳ = d/2 (symmetry)');
      close(await line(page, 'Lines', 'J'), Jw, 'Jw = (2b + d)³/12 − b²(b + d)²/(2b + d) (Blodgett Table 5, C-shape)');
      close(await line(page, 'Lines', 'Ix'), 2 * b * (d / 2) ** 2 + d ** 3 / 12, 'Ix = 2b(d/2)² + d³/12 (flanges at ±d/2, web d³/12)');
      close(await line(page, 'Lines', 'Sx_top'), (2 * b * (d / 2) ** 2 + d ** 3 / 12) / (d / 2), 'Sw = Ix/(d/2) = bd + d²/6 (Blodgett Table 5, C-shape)');
      // Line elements only: the area results are absent, which the panel says without an error.
      assert.equal(await page.getAttribute('[data-testid="result-message"]', 'data-absent'), 'area');
      assert.match(await page.textContent('[data-testid="result-message"]'), /area properties are absent/);

      // A load: Add a load starts the point tool; click where the force acts, then type Fy.
      await page.click('[data-testid="weld-add-Lines"]');
      assert.equal(await page.evaluate(() => window.__kern.editor.store.getState().tool), 'weldPoint');
      await clickWorld(page, 200, 50);
      assert.equal(await page.evaluate(() => window.__kern.editor.store.getState().tool), 'select', 'the point tool returns to select');
      await field(page, 'weld.0.Fy', '-10');
      // Hand calculation (Blodgett Sect. 7.4): P = 10 kN down at e = 200 − 12.5 = 187.5 mm from G,
      // T = 1875 kN·mm clockwise; at the flange tips r = (37.5, ±50):
      // f = √((T·50/Jw)² + (P/L + T·37.5/Jw)²) = √(0.243243² + 0.232432²) = 0.336440 kN/mm.
      const T = 10 * 187.5;
      const f = Math.hypot((T * 50) / Jw, 10 / L + (T * 37.5) / Jw);
      close(f, 0.33644, 'the hand figure', 1e-5);
      close(await weld(page, '0.f'), f, 'largest force per length at the flange tips (Blodgett Sect. 7.4)');
      close(await weld(page, '0.M'), -T, 'moment about the centroid, clockwise');
      const tips = await page.$$eval('[data-weld^="0.at"], [data-weld^="0.also"]', (els) => els.map((e) => [Number(e.dataset.x), Number(e.dataset.y)]));
      assert.deepEqual(tips.sort((p, q) => p[1] - q[1]), [[50, 0], [50, 100]], 'both flange tips are marked');
      assert.match(await page.textContent('[data-testid="weld-caution"]'), /elastic vector method only/);
      // Kept in the document for the report and the CLI.
      const loads = await page.evaluate(() => window.__kern.editor.store.getState().doc.weldLoads);
      assert.deepEqual(loads, [{ group: 'Lines', at: [200, 50], Fx: 0, Fy: -10 }]);
      // One undo takes the force back; the load stays where it was picked.
      await page.click('[data-command="undo"]');
      await settle(page);
      assert.deepEqual(await page.evaluate(() => window.__kern.editor.store.getState().doc.weldLoads), [{ group: 'Lines', at: [200, 50], Fx: 0, Fy: 0 }]);
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'lines: a bent plate drawn by its centreline with the strip tool, bends rounded, exact against the closed form and the thin wall',
    async run(t) {
      const { page, errors } = await open(t);
      await page.click('[data-command="tool.strip"]');
      // The next strip's thickness is visible in the rail: set it before drawing.
      await field(page, 'strip-thickness', '6');
      assert.match(await page.textContent('[data-testid="prompt"]'), /t = 6 mm, mitred corners/);
      await focusCanvas(page);
      for (const p of ['75, 150', '0, 150', '0, 0', '75, 0']) await typeInput(page, p);
      await page.press('[data-testid="typed-input"]', 'Enter');
      await settle(page);
      const [s] = await docShapes(page);
      assert.equal(s.type, 'strip');
      assert.equal(s.thickness, 6);
      // Sharp corners first: A = t × centreline length at a mitred corner too (the mitre's outer
      // triangle equals the inner one it lacks): 6 × (75 + 150 + 75).
      close(await prop(page, 'area'), 6 * 300, 'A = t·L, mitred corners');
      // Bends of centreline radius 9 (inside radius 6 = t): round every corner.
      await field(page, 'corner-radius', '9');
      await page.click('[data-testid="round-all"]');
      await settle(page);
      const [bent] = await docShapes(page);
      assert.equal(bent.segments.filter((g) => g.via).length, 2, 'two bends');
      const plate = centroidal(sum([rectangle(-3, 3, 9, 141), rectangle(9, 75, 147, 153), rectangle(9, 75, -3, 3), annularSector(9, 141, 6, 12, PI / 2, PI), annularSector(9, 9, 6, 12, PI, 1.5 * PI)]));
      close(await prop(page, 'area'), 6 * (264 + 9 * PI), 'A = t × centreline length (annular sectors of mean radius 9)');
      close(await prop(page, 'Ix'), plate.Ix, 'Ix: rectangles and annular sectors (Gere & Goodno App. E; Roark Table A.1)');
      close(await prop(page, 'Iy'), plate.Iy, 'Iy: rectangles and annular sectors');
      close(await prop(page, 'centroid.x'), plate.x, 'x̄ of the bent plate');
      // The thin-wall values: the centreline's line moments × t.
      const c = centroidal(sum([line2(75, 150, 9, 150), arc(9, 141, 9, PI / 2, PI), line2(0, 141, 0, 9), arc(9, 9, 9, PI, 1.5 * PI), line2(9, 0, 75, 0)]));
      const read = async (attr, key) => Number(await page.getAttribute(`[data-${attr}="${key}"]`, 'data-value'));
      close(await read('exact', 'Ix'), plate.Ix, 'exact Ix in the thin-wall table');
      close(await read('thin', 'Ix'), 6 * c.Ix, 'thin-wall Ix = t × centreline Ix');
      close(await read('thin-wall', 'Ix'), (100 * (6 * c.Ix - plate.Ix)) / plate.Ix, 'difference in per cent', 1e-8);
      close(await read('thin-wall', 'area'), 0, 'A: no difference (bends are annular sectors)', 1e-9);
      const shown = await page.textContent('[data-thin-wall="Iy"]');
      assert.equal(shown.trim(), '-0.37 %', 'the thin wall underestimates Iy by 0.37 %');
      // Change the thickness in the panel: the bends stay on the centreline.
      await field(page, 'thickness', '4');
      close(await prop(page, 'area'), 4 * (264 + 9 * PI), 'A = t × centreline length, t = 4');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'lines: a weld all round the selected plate, trimmed to three sides, and its report',
    async run(t) {
      const { page, errors } = await open(t);
      await focusCanvas(page);
      await page.keyboard.press('r');
      await typeInput(page, '0, 0');
      await typeInput(page, '120, 200');
      await settle(page);
      await page.click('[data-command="tool.line"]');
      await page.click('[data-command="line.alongOutline"]');
      await settle(page);
      // Blodgett Table 5, box: Jw = (b + d)³/6 (from memory).
      close(await line(page, 'Lines', 'J'), (120 + 200) ** 3 / 6, 'Jw = (b + d)³/6, weld all round');
      const [, w] = await docShapes(page);
      const right = w.segments.findIndex((g, i) => (i === 0 ? w.start : w.segments[i - 1].to)[0] === 120 && g.to[0] === 120);
      await page.click(`[data-testid="segment-remove-${right}"]`);
      await settle(page);
      // Now a C-shape with b = 120, d = 200 (Blodgett Table 5).
      const b = 120, d = 200;
      close(await line(page, 'Lines', 'J'), (2 * b + d) ** 3 / 12 - (b * b * (b + d) ** 2) / (2 * b + d), 'Jw of the C-shape after trimming');
      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('section.lines');
      const text = await frame.textContent('section.lines');
      assert.match(text, /Line groups/);
      assert.ok(await frame.$('section.lines svg path.weld'), 'the report draws the weld as a stroke');
      assert.deepEqual(errors, []);
    },
  },
];
