/**
 * Build the app once and serve it with `vite preview` on a free port (no network needed).
 * Used by the e2e runner and the drag benchmark.
 */
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { build, preview } from 'vite';
import { chromium } from 'playwright-core';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

export function launchBrowser() {
  return chromium.launch({ executablePath: process.env.KERN_CHROMIUM || '/usr/bin/chromium', args: CHROMIUM_ARGS });
}

function freePort() {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

/** Build into a temporary folder and serve it. Returns { url, close }. */
export async function startApp() {
  const outDir = path.join(os.tmpdir(), `kern-e2e-dist-${process.pid}`);
  await build({ root: ROOT, logLevel: 'warn', build: { outDir, emptyOutDir: true, ...(process.env.KERN_NO_MINIFY ? { minify: false } : {}) } });
  const port = await freePort();
  const server = await preview({ root: ROOT, logLevel: 'warn', build: { outDir }, preview: { port, strictPort: true, host: '127.0.0.1', open: false } });
  return {
    url: `http://127.0.0.1:${port}/`,
    close: () =>
      new Promise((resolve) => server.httpServer.close(() => resolve())).then(() => fs.rmSync(outDir, { recursive: true, force: true })),
  };
}
