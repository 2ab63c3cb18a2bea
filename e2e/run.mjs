/**
 * The e2e runner (no test framework installed): builds and serves the app, runs every test in
 * e2e/*.e2e.mjs in a fresh browser context, prints "N passed, M failed" and exits non-zero on a
 * failure. `node e2e/run.mjs <filter>` runs the tests whose name contains <filter>.
 */
import fs from 'node:fs';
import path from 'node:path';
import os from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { launchBrowser, startApp } from './serve.mjs';

const HERE = path.dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2] ?? '';
const TEST_TIMEOUT_MS = 60_000;

const files = fs.readdirSync(HERE).filter((f) => f.endsWith('.e2e.mjs')).sort();
const tests = [];
for (const f of files) {
  const mod = await import(pathToFileURL(path.join(HERE, f)).href);
  for (const t of mod.tests) if (t.name.includes(filter)) tests.push({ ...t, file: f });
}

const t0 = Date.now();
const app = await startApp();
const browser = await launchBrowser();
const shots = path.join(os.tmpdir(), 'kern-e2e-failures');
let passed = 0, failed = 0;
for (const t of tests) {
  const started = Date.now();
  const ctx = { browser, url: app.url, opened: [] };
  let timer;
  try {
    await Promise.race([
      t.run(ctx),
      new Promise((_, reject) => (timer = setTimeout(() => reject(new Error(`timed out after ${TEST_TIMEOUT_MS} ms`)), TEST_TIMEOUT_MS))),
    ]);
    passed++;
    console.log(`  ok   ${t.name} (${Date.now() - started} ms)`);
  } catch (e) {
    failed++;
    console.log(`  FAIL ${t.name} [${t.file}]\n       ${String(e?.stack ?? e).split('\n').slice(0, 6).join('\n       ')}`);
    for (const [k, c] of ctx.opened.entries()) {
      try {
        fs.mkdirSync(shots, { recursive: true });
        const pages = c.pages();
        if (pages[0]) await pages[0].screenshot({ path: path.join(shots, `${t.name.replace(/[^a-z0-9]+/gi, '-')}-${k}.png`) });
      } catch {
        /* the page may be gone */
      }
    }
  } finally {
    clearTimeout(timer);
    for (const c of ctx.opened) await c.close().catch(() => {});
  }
}
await browser.close();
await app.close();
console.log(`(${((Date.now() - t0) / 1000).toFixed(1)} s${failed ? `; screenshots of failures in ${shots}` : ''})`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed ? 1 : 0);
