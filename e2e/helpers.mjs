/** Page helpers for the e2e tests: world <-> page coordinates, reading panel values. */
import assert from 'node:assert/strict';

export const AUTOSAVE_KEY = 'kern.autosave.v1';

export const doc = (shapes, units = 'mm') => ({ format: 'kern-section', version: 1, units, shapes });

/**
 * A fresh context and page. `seed` (a document) is put in the autosave slot before the first load
 * only, so a reload shows what the editor saved.
 */
export async function openApp(browser, url, { seed = doc([]), view = { scale: 2 } } = {}) {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 }, acceptDownloads: true });
  if (seed) {
    await context.addInitScript(
      ([key, text]) => {
        if (!sessionStorage.getItem('kern-e2e-seeded')) {
          localStorage.setItem(key, text);
          sessionStorage.setItem('kern-e2e-seeded', '1');
        }
      },
      [AUTOSAVE_KEY, JSON.stringify(seed)],
    );
  }
  const page = await context.newPage();
  const errors = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(url);
  await page.waitForFunction(() => window.__kern && document.querySelector('[data-testid="canvas"] canvas'));
  await page.waitForTimeout(100);
  if (view) await setView(page, view.scale);
  return { context, page, errors };
}

/** Put the world origin 150 px from the canvas's left and bottom edges at `scale` px per unit. */
export async function setView(page, scale) {
  await page.evaluate((scale) => {
    const s = window.__kern.editor.store.getState();
    window.__kern.editor.store.setState({ scale, ox: 150, oy: s.height - 150 });
  }, scale);
  await page.waitForTimeout(50);
}

/** Page coordinates of a world point. */
export async function pagePoint(page, x, y) {
  return page.evaluate(([x, y]) => {
    const el = document.querySelector('[data-testid="canvas"]');
    const r = el.getBoundingClientRect();
    const s = window.__kern.editor.store.getState();
    return [r.left + s.ox + x * s.scale, r.top + s.oy - y * s.scale];
  }, [x, y]);
}

export async function clickWorld(page, x, y, dx = 0, dy = 0) {
  const [px, py] = await pagePoint(page, x, y);
  await page.mouse.move(px + dx, py + dy, { steps: 2 });
  await page.mouse.down();
  await page.mouse.up();
}

export async function focusCanvas(page) {
  await page.focus('[data-testid="canvas"]');
}

/** Full-precision value of a property from the panel (data-value), after the frame settles. */
export async function prop(page, key) {
  await settle(page);
  const v = await page.getAttribute(`[data-prop="${key}"]`, 'data-value');
  assert.ok(v !== null, `no value shown for ${key}`);
  return Number(v);
}

export async function propUnit(page, key) {
  return page.evaluate((key) => document.querySelector(`[data-prop="${key}"]`).nextElementSibling.textContent, key);
}

/** Wait until the live results belong to the current document, then two frames for React. */
export async function settle(page) {
  await page.waitForFunction(() => window.__kern.editor.results.idle(), null, { polling: 'raf', timeout: 20000 });
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r()))));
}

export async function typeInput(page, text) {
  await page.fill('[data-testid="typed-input"]', text);
  await page.press('[data-testid="typed-input"]', 'Enter');
  const err = await page.$('[data-testid="input-error"]');
  if (err) throw new Error(`typed "${text}" was refused: ${await err.textContent()}`);
}

export async function setField(page, field, text) {
  const sel = `[data-testid="selection-panel"] input[data-field="${field}"]`;
  await page.fill(sel, text);
  await page.press(sel, 'Enter');
  await settle(page);
}

export async function state(page, fn) {
  return page.evaluate(fn);
}

export function docShapes(page) {
  return page.evaluate(() => window.__kern.editor.store.getState().doc.shapes);
}

/** |a − b| ≤ tol·max(|b|, 1) with a message. */
export function close(a, b, what, tol = 1e-9) {
  assert.ok(Number.isFinite(a), `${what}: ${a} is not a number`);
  assert.ok(Math.abs(a - b) <= tol * Math.max(Math.abs(b), 1), `${what}: got ${a}, expected ${b}`);
}

/** openApp for a runner test context (the runner closes the context afterwards). */
export async function open(t, opts) {
  const r = await openApp(t.browser, t.url, opts);
  t.opened.push(r.context);
  return r;
}

/**
 * A number as the panel and the report show it ("4113", "29.81 × 10⁶", "−0.5"), read back; the
 * same rule as the engine's parseFormatted (src/properties/catalog.ts).
 */
export function parseShown(text) {
  const sup = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const m = /^(-?\d+(?:\.\d+)?)(?:\s*×\s*10(⁻?[⁰¹²³⁴⁵⁶⁷⁸⁹]+))?$/.exec(text.trim().replace(/\u2212/g, '-'));
  if (!m) return NaN;
  if (m[2] === undefined) return Number(m[1]);
  const exp = [...m[2]].map((ch) => (ch === '⁻' ? '-' : String(sup.indexOf(ch)))).join('');
  return Number(`${m[1]}e${exp}`);
}
