/**
 * The CLI's `report --pdf` path end to end: headless Chromium prints the demo report, and
 * poppler's pdftotext / pdfinfo (an independent PDF reader) check that the title block, every
 * property value, the caution and the scale are on the pages, that the demo fits in two pages on
 * A4 and on US Letter, and that the figure really prints at its stated scale.
 * Nothing here is skipped: without Chromium or poppler-utils the tests fail and say what to install.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, test, vi } from 'vitest';
import { DEMO_DOCUMENT, evaluateDocument, formatProperty, PROPERTY_CATALOG } from '../src';
import { CAUTION_TEXT } from '../src/report';
import { chromiumPath, reportCommand } from '../cli/report';

const dir = mkdtempSync(join(tmpdir(), 'kern-report-'));
const demoFile = join(dir, 'demo.json');

function which(cmd: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${cmd}`]).status === 0;
}

function requireTools(): void {
  expect(existsSync(chromiumPath()), `Chromium not found at ${chromiumPath()}: install it (apt-get install -y chromium) or set KERN_CHROMIUM`).toBe(true);
  for (const t of ['pdftotext', 'pdfinfo']) expect(which(t), `${t} not found: install poppler-utils (apt-get install -y poppler-utils)`).toBe(true);
}

const pages = (pdf: string) => Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [pdf], { encoding: 'utf8' }))![1]);
const text = (pdf: string) => execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' });

beforeAll(() => {
  writeFileSync(demoFile, JSON.stringify(DEMO_DOCUMENT, null, 2));
});

describe('report --pdf through Chromium', () => {
  const props = evaluateDocument(DEMO_DOCUMENT).props!;

  for (const paper of ['a4', 'letter'] as const) {
    test(`demo report on ${paper}: contents and at most two pages`, async () => {
      requireTools();
      const html = join(dir, `r-${paper}.html`), pdf = join(dir, `r-${paper}.pdf`);
      let code: number;
      if (paper === 'a4') {
        // Through the real command line (cli/main.ts), as a user runs it.
        const r = spawnSync(join('node_modules', '.bin', 'tsx'), ['cli/main.ts', 'report', demoFile, '--out', html, '--pdf', pdf, '--cut', 'y=150'], { encoding: 'utf8' });
        code = r.status ?? -1;
        expect(code, r.stderr).toBe(0);
      } else {
        code = await reportCommand([demoFile, '--out', html, '--pdf', pdf, '--cut', 'y=150', '--paper', 'letter']);
        expect(code).toBe(0);
      }
      expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
      expect(pages(pdf)).toBeLessThanOrEqual(2); // issue 4: the demo fits in two pages
      const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
      // Page sizes in points: A4 595 × 842, US Letter 612 × 792 (ISO 216; ANSI/ASME Y14.1).
      expect(info).toMatch(paper === 'a4' ? /Page size:\s+595\.\d+ x 842\.\d+/ : /Page size:\s+612 x 792/);

      const t = text(pdf);
      const flat = t.replace(/\s+/g, ' ');
      const tokens = new Set(t.split(/\s+/));
      const title = DEMO_DOCUMENT.title!;
      for (const v of [title.project!, title.section!, title.author!, title.date!, DEMO_DOCUMENT.name!]) expect(flat).toContain(v);
      expect(tokens.has(title.revision!)).toBe(true);
      for (const info of PROPERTY_CATALOG) {
        const f = formatProperty(info, props, DEMO_DOCUMENT.units);
        // Engineering notation has spaces ("582.6 × 10³"): look for the whole text between spaces.
        expect(f.text.includes(' ') ? ` ${flat} `.includes(` ${f.text} `) : tokens.has(f.text), `${info.key} = ${f.text} not found in the PDF text`).toBe(true);
      }
      expect(flat).toContain(CAUTION_TEXT);
      expect(flat).toContain('to scale 1:2');
      expect(flat).toContain('Q/b diagram');
    }, 60_000);
  }

  test('the figure prints at its scale: the 160 and 210 dimension texts lie as far apart on paper as in the drawing', async () => {
    requireTools();
    const pdf = join(dir, 'r-a4.pdf'), htmlFile = join(dir, 'r-a4.html');
    if (!existsSync(pdf) || !existsSync(htmlFile)) expect(await reportCommand([demoFile, '--out', htmlFile, '--pdf', pdf, '--cut', 'y=150'])).toBe(0);
    // The drawing's own coordinates: the SVG's user unit is one paper millimetre and the section is
    // drawn at k = 0.5 (1:2, report-html.test.ts). The height text is centred 8 − 1 − 1.4 = 5.6 mm
    // right of the section's right edge (src/report/dimensions.ts), the width text on the width
    // dimension line (shifted along it, if at all, to clear the axes).
    const html = readFileSync(htmlFile, 'utf8');
    const svgX = (role: string) => Number(new RegExp(`<text x="([\\d.]+)"[^>]*data-dim="${role}"`).exec(html)![1]);
    const matrix = /<path class="section" transform="matrix\(([\d.]+) 0 0 [\d.]+ ([-\d.]+) /.exec(html)!;
    const k = Number(matrix[1]), tx = Number(matrix[2]);
    expect(k).toBe(0.5);
    expect(Math.abs(svgX('height') - (tx + 80 * k + 5.6))).toBeLessThan(1e-3);
    const drawn = svgX('height') - svgX('width');
    // On paper (1 pt = 25.4/72 mm, PDF 1.7 §8.3.2.3) the distance is the drawn one.
    const xml = execFileSync('pdftotext', ['-bbox', '-f', '1', '-l', '1', pdf, '-'], { encoding: 'utf8' });
    const word = (w: string) => {
      const m = new RegExp(`<word xMin="([\\d.]+)" yMin="([\\d.]+)" xMax="([\\d.]+)" yMax="([\\d.]+)">${w}</word>`).exec(xml);
      expect(m, `word ${w} not found`).not.toBeNull();
      return { x: (Number(m![1]) + Number(m![3])) / 2, y: (Number(m![2]) + Number(m![4])) / 2 };
    };
    const w160 = word('160'), h210 = word('210');
    const mm = ((h210.x - w160.x) * 25.4) / 72;
    expect(Math.abs(mm - drawn)).toBeLessThan(1); // within 1 mm (text boxes are rounded by the font)
  }, 60_000);

  test('without Chromium the command says how to install it and exits with 2', async () => {
    const saved = process.env.KERN_CHROMIUM;
    process.env.KERN_CHROMIUM = join(dir, 'no-such-chromium');
    const errs: string[] = [];
    const spy = vi.spyOn(process.stderr, 'write').mockImplementation((s: string | Uint8Array) => {
      errs.push(String(s));
      return true;
    });
    try {
      const code = await reportCommand([demoFile, '--out', join(dir, 'x.html'), '--pdf', join(dir, 'x.pdf')]);
      expect(code).toBe(2);
    } finally {
      spy.mockRestore();
      if (saved === undefined) delete process.env.KERN_CHROMIUM;
      else process.env.KERN_CHROMIUM = saved;
    }
    const all = errs.join('');
    expect(all).toContain('apt-get install -y chromium');
    expect(all).toContain('KERN_CHROMIUM');
    expect(existsSync(join(dir, 'x.pdf'))).toBe(false);
  });
});
