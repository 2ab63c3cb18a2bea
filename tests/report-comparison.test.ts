/**
 * The report's cutout check (src/report/comparison.ts): printed when the document has a proposal,
 * with both outlines in one figure and the removed material shaded, the comparison table with
 * flags, the limits used, the net sections, every caution and the caution block; chosen by name,
 * else the active proposal, else the first. Printed to PDF on A4 and US Letter through Chromium
 * and read back with poppler's pdftotext / pdfinfo (an independent reader).
 *
 * Hand values: a plate 200 × 100 with a proposal that adds a notch [160, 200] × [70, 100] and three
 * holes Ø20 on y = 40. Composite method (Hibbeler, Statics, Sec. 10.4, composite areas, holes as
 * negative areas; circle A = πr², Gere & Goodno, plane areas, case 9; from memory):
 * A = 20000 − 1200 − 3·100π. Net width along y = 40 through the three hole centres:
 * 200 − 3·20 = 140 (a line through a circle's centre crosses it along its diameter).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, test } from 'vitest';
import { compareSections, evaluateDocument, sectionOf, type SectionDocument } from '../src';
import { renderReportHtml, reportProposal } from '../src/report';
import { chromiumPath, reportCommand } from '../cli/report';

const hole = (id: string, x: number) => ({ id, type: 'circle', center: [x, 40], radius: 10, op: 'subtract' });
const DOC = {
  format: 'kern-section',
  version: 2,
  units: 'mm',
  name: 'Splice plate SP-3 (invented)',
  shapes: [{ id: 'plate', name: 'Plate 200 × 100', type: 'rectangle', at: [0, 0], width: 200, height: 100 }],
  variants: [
    { name: 'Notch and holes', shapes: ['plate', { id: 'notch', name: 'Notch 40 × 30', type: 'rectangle', at: [160, 70], width: 40, height: 40, op: 'subtract' }, hole('h1', 40), hole('h2', 100), hole('h3', 160)] },
    { name: 'Unchanged', shapes: ['plate'] },
  ],
  limits: [{ property: 'area', maxLossPercent: 10 }],
  netLines: [{ name: 'Hole row', from: [-10, 40], to: [210, 40] }],
} as unknown as SectionDocument;

const report = (doc: SectionDocument, variant?: string | null) => renderReportHtml({ doc, evaluation: evaluateDocument(doc), variant });
const squash = (s: string) => s.replace(/\s+/g, ' ');

describe('which proposal the report checks', () => {
  it('the one asked for, else the active one, else the first; none without proposals', () => {
    expect(reportProposal(DOC, 'Unchanged')).toBe('Unchanged');
    expect(reportProposal(DOC)).toBe('Notch and holes');
    expect(reportProposal({ ...DOC, activeVariant: 'Unchanged' })).toBe('Unchanged');
    expect(reportProposal(DOC, null)).toBeNull();
    const plain = { ...DOC } as SectionDocument;
    delete plain.variants;
    expect(report(plain)).not.toContain('data-comparison');
    expect(report(DOC, null)).not.toContain('data-comparison');
  });
});

describe('the cutout check in the report', () => {
  const html = report(DOC);
  const c = compareSections(evaluateDocument(DOC).props!, evaluateDocument(sectionOf(DOC, 'Notch and holes')).props!);

  it('has the section, the caution block, the verdict and the intro on the first page', () => {
    expect(html).toContain('data-comparison="Notch and holes"');
    expect(html).toContain('a geometric screen, not a design check');
    expect(html).toMatch(/comparison-intro[^<]*cutout check of “Notch and holes”/);
    // A = 20000 − 1200 − 300π = 17857.5 (loss 10.71 % > 10 %): beyond.
    expect(html).toContain('data-verdict="beyond"');
  });
  it('lists every property with the change in per cent at full precision, and the flag', () => {
    for (const r of c.rows) {
      const m = new RegExp(`<tr data-compare="${r.key.replace('.', '\\.')}"[^>]*>(.*?)</tr>`).exec(html);
      expect(m, r.key).not.toBeNull();
      expect(m![1]).toContain(`data-value="${r.changePercent === null ? '' : String(r.changePercent)}"`);
    }
    const A = 20000 - 1200 - 300 * Math.PI;
    const area = c.rows.find((r) => r.key === 'area')!;
    expect(Math.abs(area.changePercent! - (100 * (A - 20000)) / 20000)).toBeLessThanOrEqual(1e-9);
    expect(/<tr data-compare="area" class="beyond">.*?BEYOND<\/td><\/tr>/.test(html)).toBe(true);
  });
  it('draws both outlines with the removed material shaded, and the net line', () => {
    const fig = /<svg[^>]*aria-label="Baseline and proposal[^"]*"[\s\S]*?<\/svg>/.exec(html)![0];
    for (const cls of ['proposal', 'removed', 'baseline', 'net']) expect(fig).toContain(`class="${cls}"`);
    expect(fig).toContain('>L1<');
    // Removed: notch 40 × 30 inside the plate + three holes = 1200 + 300π.
    expect(squash(html)).toContain(`material removed (${(1200 + 300 * Math.PI).toPrecision(4)} mm²)`);
  });
  it('gives the net section along the stored line: 200 gross, 200 − 3·20 = 140 net', () => {
    const row = /<tr data-net-line="0">(.*?)<\/tr>/.exec(html)![1];
    const cells = [...row.matchAll(/<td class="num">([^<]*)<\/td>/g)].map((m) => m[1]);
    expect(cells).toEqual(['200', '200', '200', '140']);
    expect(html).toContain('staggered holes');
  });
  it('lists the cautions: the notch corner and the holes against the rule set', () => {
    expect(html).toContain('data-caution-kind="re-entrant-corner"');
    expect(squash(html)).toContain('“Notch 40 × 30” (notch)');
    expect(html).toContain('EN 1993-1-8, Table 3.3');
  });
  it('names the other proposals and says when a proposal cannot be read', () => {
    expect(squash(html)).toContain('another proposal: “Unchanged”');
    const broken = { ...DOC, variants: [{ name: 'Broken', shapes: ['nowhere'] }] } as unknown as SectionDocument;
    expect(report(broken)).toContain('refers to the shape &quot;nowhere&quot;');
  });
});

const which = (cmd: string) => spawnSync('sh', ['-c', `command -v ${cmd}`]).status === 0;

describe('report --variant, printed through Chromium', () => {
  const dir = mkdtempSync(join(tmpdir(), 'kern-cmp-'));
  const file = join(dir, 'plate.json');
  writeFileSync(file, JSON.stringify(DOC, null, 2));

  it('refuses a proposal the file does not have (exit 2)', async () => {
    expect(await reportCommand([file, '--out', join(dir, 'x.html'), '--variant', 'Nope'])).toBe(2);
  });

  for (const paper of ['a4', 'letter'] as const) {
    test(`the comparison prints on ${paper}`, async () => {
      expect(existsSync(chromiumPath()), 'Chromium is needed (apt-get install -y chromium)').toBe(true);
      expect(which('pdftotext') && which('pdfinfo'), 'poppler-utils is needed').toBe(true);
      const pdf = join(dir, `r-${paper}.pdf`);
      expect(await reportCommand([file, '--out', join(dir, `r-${paper}.html`), '--pdf', pdf, '--paper', paper, '--variant', 'Notch and holes'])).toBe(0);
      expect(readFileSync(pdf).subarray(0, 5).toString()).toBe('%PDF-');
      const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
      // Page sizes in points: A4 595 × 842, US Letter 612 × 792 (ISO 216; ANSI/ASME Y14.1).
      expect(info).toMatch(paper === 'a4' ? /Page size:\s+595\.\d+ x 842\.\d+/ : /Page size:\s+612 x 792/);
      const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
      expect(pages).toBeGreaterThanOrEqual(3);
      expect(pages).toBeLessThanOrEqual(6);
      const t = squash(execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }));
      for (const s of ['Cutout check: “Notch and holes” against the baseline', 'Verdict: BEYOND the limits', 'Properties before and after', 'Limits used', 'Net section along the drawn lines', 'Cautions from the geometry', 'not a design check']) {
        expect(t, s).toContain(s);
      }
    }, 60_000);
  }
});
