/**
 * Materials, loads and the kern in the browser, as a user does it: add two materials from the
 * library, give the steel flat its material by clicking it and choosing in the selection panel,
 * read the centre of gravity and the transformed section from the panel's data-prop rows, enter N
 * and Mx, see the neutral axis on the canvas and the stress values in the panel, probe a point,
 * toggle the kern, and find it all in the report.
 *
 * Hand calculation (mm, N, MPa): timber 100 × 200 (y 0..200) on a steel flat 100 × 10 (y −10..0),
 * C24 the reference (E 11 000, ρ 420), S355 (E 210 000, ρ 7850), n = 210000/11000.
 * - Centre of gravity: Σ ρ A ȳ / Σ ρ A (Hibbeler, Statics, composite bodies).
 * - Transformed section: At = Σ n A, ȳt = Σ n A ȳ / At, It = Σ n (I + A d²) (Gere & Goodno,
 *   Mechanics of Materials, composite beams, transformed-section method, Sec. 6.3).
 * - Stress: σ = n (N/At + Mx (y − ȳt)/It) (ibid., with the axial term of combined loadings).
 */
import assert from 'node:assert/strict';
import { clickWorld, close, doc, open, pagePoint, prop, settle } from './helpers.mjs';

const n = 210000 / 11000;
const At = 20000 + n * 1000;
const yt = (20000 * 100 + n * 1000 * -5) / At;
const It = (100 * 200 ** 3) / 12 + 20000 * (100 - yt) ** 2 + n * ((100 * 10 ** 3) / 12 + 1000 * (-5 - yt) ** 2);
const cgY = (420 * 20000 * 100 + 7850 * 1000 * -5) / (420 * 20000 + 7850 * 1000);
const N = -100e3, M = 30e6; // −100 kN, 30 kN·m in N and N·mm
const sigma = (y, nn) => nn * (N / At + (M * (y - yt)) / It);

const seed = doc([
  { id: 'timber', name: 'Joist 100 × 200', type: 'rectangle', at: [0, 0], width: 100, height: 200 },
  { id: 'flat', name: 'Flat 100 × 10', type: 'rectangle', at: [0, -10], width: 100, height: 10 },
]);

/** Type a value into a committing field and press Enter. */
async function enter(page, field, text) {
  const sel = `[data-field="${field}"]`;
  await page.fill(sel, text);
  await page.press(sel, 'Enter');
  await settle(page);
}

/** RGBA of the canvas pixels under a world point and the rows `rows` above and below it (the drawing canvas). */
async function pixelsAt(page, x, y, rows = 0) {
  const [px, py] = await pagePoint(page, x, y);
  return page.evaluate(([px, py, rows]) => {
    const canvases = [...document.querySelectorAll('[data-testid="canvas"] canvas')];
    const c = canvases[canvases.length - 1];
    const r = c.getBoundingClientRect();
    const k = c.width / r.width;
    const out = [];
    for (let d = -rows; d <= rows; d++) out.push([...c.getContext('2d').getImageData(Math.round((px - r.left) * k), Math.round((py - r.top) * k) + d, 1, 1).data]);
    return out;
  }, [px, py, rows]);
}

export const tests = [
  {
    name: 'materials: two materials, centre of gravity and transformed section, loads, neutral axis, stresses, kern, report',
    async run(t) {
      const { page, errors } = await open(t, { seed });
      // One material so far: today's numbers, and no centre of gravity row.
      close(await prop(page, 'area'), 21000, 'A = 100·200 + 100·10');
      assert.equal(await page.$('[data-prop="cg.y"]'), null);

      // Materials from the library; the first added is the reference.
      // The dialog takes the focus when it opens: Escape closes it at once, and it opens again.
      await page.click('.topbar [data-command="materials.open"]');
      await page.waitForSelector('[data-testid="materials-dialog"]');
      await page.keyboard.press('Escape');
      assert.equal(await page.$('[data-testid="materials-dialog"]'), null, 'Escape closes the dialog it just opened');
      await page.click('.topbar [data-command="materials.open"]');
      await page.waitForSelector('[data-testid="materials-dialog"]');
      await page.selectOption('[data-testid="library-select"]', 'softwood-c24');
      await page.click('[data-testid="library-add"]');
      await page.selectOption('[data-testid="library-select"]', 'steel-s355');
      await page.click('[data-testid="library-add"]');
      assert.equal(await page.isChecked('[data-reference="softwood-c24"]'), true, 'the first material is the reference');
      assert.equal(await page.inputValue('[data-field="steel-s355.E"]'), '210000');
      await page.click('[data-testid="materials-close"]');

      // Click the flat on the canvas and give it steel.
      await clickWorld(page, 50, -5);
      await settle(page);
      assert.deepEqual(await page.evaluate(() => window.__kern.editor.store.getState().selected), ['flat']);
      const steps = await page.evaluate(() => window.__kern.editor.store.getState().past.length);
      await page.selectOption('[data-field="material"]', 'steel-s355');
      await settle(page);
      assert.equal(await page.evaluate(() => window.__kern.editor.store.getState().past.length), steps + 1, 'one undo step');

      // Centre of gravity and transformed section against the hand calculation.
      close(await prop(page, 'cg.x'), 50, 'G on the axis of symmetry');
      close(await prop(page, 'cg.y'), cgY, 'G = Σ ρ A ȳ / Σ ρ A (Hibbeler, composite bodies)');
      close(await prop(page, 'area_centroid.y'), (20000 * 100 - 1000 * 5) / 21000, 'C = Σ A ȳ / Σ A');
      close(await prop(page, 'mass_per_length'), 16.25, 'm = 420·0.02 + 7850·0.001 kg/m');
      close(await prop(page, 'transformed.area'), At, 'At = Σ n A (Gere & Goodno, transformed section)');
      close(await prop(page, 'transformed.centroid.y'), yt, 'ȳt = Σ n A ȳ / At');
      close(await prop(page, 'transformed.Ix'), It, 'It = Σ n (I + A d²)');
      close(await prop(page, 'area'), 21000, 'the geometric area is unchanged');
      close(await prop(page, 'by_material.steel-s355.area'), 1000, 'steel area');

      // Loads: moments in kN·m, then N = −100 kN and Mx = 30 kN·m.
      await page.selectOption('[data-testid="moment-length"]', 'm');
      await settle(page);
      await enter(page, 'load.N', '-100');
      await enter(page, 'load.Mx', '30');
      const loads = await page.evaluate(() => window.__kern.editor.store.getState().doc.loads);
      assert.deepEqual(loads, { N: -100, Mx: 30 });
      close(await prop(page, 'stress.max_tension'), sigma(200, 1), 'tension at the top of the timber');
      assert.equal(await page.getAttribute('[data-prop="stress.max_tension"]', 'data-material'), 'softwood-c24');
      close(await prop(page, 'stress.max_compression'), sigma(-10, n), 'compression at the bottom of the steel');
      close(await prop(page, 'stress.steel-s355.max'), sigma(0, n), 'steel at the joint');
      // Neutral axis: σ = 0 at y = ȳt − N It / (At Mx), horizontal.
      const yNa = yt - (N * It) / (At * M);
      close(await prop(page, 'stress.neutral_axis'), 0, 'the axis is horizontal');
      close(Number(await page.getAttribute('[data-prop="stress.neutral_axis"]', 'data-y')), yNa, 'the axis height');
      // It is drawn: a dark dash-dot line at that height somewhere across the section.
      let dark = 0;
      for (let x = 2; x < 100; x += 2) {
        // Within a pixel or two of the line's height (the line is 1.4 px wide); opaque and dark.
        if ((await pixelsAt(page, x, yNa, 2)).some(([r, g, b, a]) => a > 200 && r + g + b < 250)) dark++;
      }
      assert.ok(dark >= 10, `the neutral axis is drawn on the canvas (${dark} dark samples)`);
      assert.ok(await page.isVisible('[data-testid="stress-scale"]'), 'the stress scale bar is shown');

      // Stress at a typed point.
      await enter(page, 'probe.x', '50');
      await enter(page, 'probe.y', '150');
      close(await prop(page, 'stress.at'), sigma(150, 1), 'σ at (50, 150) in the timber');
      assert.match(await page.textContent('[data-testid="sign-convention"]'), /Tension is positive/);

      // The kern: drawn when toggled (computed at rest).
      const inside = [50, yt + 20];
      const [before] = await pixelsAt(page, ...inside);
      await page.click('[data-command="view.kern"]');
      await page.waitForFunction(() => document.querySelector('[data-testid="material-legend"]')?.textContent.includes('kern'));
      await page.waitForTimeout(100);
      await settle(page);
      const [after] = await pixelsAt(page, ...inside);
      assert.notDeepEqual(after, before, 'the kern fill shows inside the kern');
      await page.click('[data-command="view.kern"]');
      await settle(page);
      assert.deepEqual((await pixelsAt(page, ...inside))[0], before, 'and goes when the kern is turned off');

      // Undo takes back the last load.
      await page.keyboard.press('Escape');
      await page.click('[data-command="undo"]');
      await settle(page);
      assert.deepEqual(await page.evaluate(() => window.__kern.editor.store.getState().doc.loads), { N: -100 });

      // The report carries it.
      await page.click('[data-command="report.open"]');
      const frame = await (await page.waitForSelector('[data-testid="report-overlay"] iframe')).contentFrame();
      await frame.waitForSelector('[data-report="materials"]');
      const body = await frame.textContent('body');
      for (const s of ['Centre of gravity G', 'Transformed section', 'Results per material', 'Loads and stresses', 'Sign convention', 'full composite action']) assert.ok(body.includes(s), `report has "${s}"`);
      assert.ok(await frame.$('svg .kern'), 'the report draws the kern');
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'materials: a refused edit says why and changes nothing; a material in use cannot be removed',
    async run(t) {
      const { page } = await open(t, { seed });
      await page.click('.topbar [data-command="materials.open"]');
      await page.selectOption('[data-testid="library-select"]', 'steel-s355');
      await page.click('[data-testid="library-add"]');
      const docBefore = await page.evaluate(() => JSON.stringify(window.__kern.editor.store.getState().doc));
      await page.fill('[data-field="steel-s355.E"]', '-1');
      await page.press('[data-field="steel-s355.E"]', 'Enter');
      assert.match(await page.textContent('[data-error-for="steel-s355.E"]'), /materials\[0\]\.E: the elastic modulus E must be a number greater than 0, got -1/);
      assert.equal(await page.evaluate(() => JSON.stringify(window.__kern.editor.store.getState().doc)), docBefore);
      await page.press('[data-field="steel-s355.E"]', 'Escape');
      // A material typed in by hand: fill the fields and press Add straight away.
      await page.fill('[data-field="new.name"]', 'Glulam GL28h');
      await page.fill('[data-field="new.E"]', '12600');
      await page.fill('[data-field="new.fy"]', '28');
      await page.fill('[data-field="new.density"]', '460');
      await page.click('[data-testid="hand-add"]');
      const added = await page.evaluate(() => window.__kern.editor.store.getState().doc.materials.find((m) => m.id === 'glulam-gl28h'));
      assert.deepEqual(added, { id: 'glulam-gl28h', name: 'Glulam GL28h', E: 12600, density: 460, fy: 28 });
      // Give a shape the steel explicitly, then try to remove it.
      await page.click('[data-testid="materials-close"]');
      await page.click('[data-shape="flat"]');
      await page.selectOption('[data-field="material"]', 'steel-s355');
      await page.click('.topbar [data-command="materials.open"]');
      await page.click('[data-remove="steel-s355"]');
      assert.match(await page.textContent('[data-testid="materials-table"]'), /is used by 1 shape \(Flat 100 × 10\)/);
    },
  },
];
