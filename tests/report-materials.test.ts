/**
 * The report's materials, loads and kern pages: what they hold for the flitch-beam example, that a
 * section of one material without loads gets none of it, that loads alone give the stresses on the
 * section taken as one material, and that the whole report prints on A4 and US Letter (Chromium,
 * read back with poppler's pdftotext / pdfinfo). Values are those of tests/example-flitch-beam.test.ts
 * (transformed-section hand calculation, Gere & Goodno, composite beams), as the formatter prints them.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CODE_DEFERRAL, DEMO_DOCUMENT, evaluateDocument, KERN_CAUTION, parseDocument, SIGN_CONVENTION, STRESS_CAUTION, TRANSFORMED_CAUTION, type SectionDocument } from '../src';
import { escapeHtml, renderReportHtml } from '../src/report';
import { reportCommand } from '../cli/report';

const flitch = (() => {
  const r = parseDocument(readFileSync('public/examples/flitch-beam.json', 'utf8'));
  if (!r.ok) throw new Error('invalid example');
  return r.doc;
})();
const html = (doc: SectionDocument, extra: { cut?: { axis: 'x' | 'y'; at: number }; kern?: boolean } = {}) => renderReportHtml({ doc, evaluation: evaluateDocument(doc), ...extra });

describe('materials pages of the report', () => {
  it('flitch beam: materials, C beside G, transformed section, per material, figure, loads with the sign convention, cautions', () => {
    const h = html(flitch, { cut: { axis: 'y', at: 105.65 } });
    for (const key of ['materials', 'transformed', 'by-material', 'plastic', 'materials-figure', 'loads', 'neutral-axis', 'sign-convention', 'shear', 'material-cautions']) expect(h).toContain(`data-report="${key}"`);
    expect(h).toContain('Softwood C24 (reference)');
    expect(h).toContain('Structural steel S355');
    // C and G in one table: ȳ = 111.8 and 105.7 mm; mass 26.04 kg/m; It = 214.8 × 10⁶ mm⁴.
    expect(h).toMatch(/Centroid of the area C<\/td><td class="num">68<\/td><td class="num">111\.8</);
    expect(h).toMatch(/Centre of gravity G \(by density\)<\/td><td class="num">68<\/td><td class="num">105\.7</);
    expect(h).toContain('26.04');
    expect(h).toMatch(/data-prop="transformed\.Ix"><td>Moment of inertia, x<\/td><td>Ix,t<\/td><td class="num">214\.8 × 10⁶/);
    // The numbered marks: 119 MPa tension and −104.9 MPa compression in the steel.
    expect(h).toMatch(/<tr data-mark="1"><td class="num">1<\/td><td>largest tension<\/td><td>Structural steel S355<\/td><td class="num">119<\/td><td class="num">\(63, 10\)/);
    expect(h).toMatch(/data-mark="2".*largest compression.*-104\.9/);
    expect(h).toContain('at 0° from x; the fibres below it are in tension.');
    expect(h).toContain(escapeHtml(SIGN_CONVENTION));
    for (const c of [TRANSFORMED_CAUTION, STRESS_CAUTION, KERN_CAUTION, CODE_DEFERRAL]) expect(h).toContain(escapeHtml(c));
    // The stress map is exact: one linear gradient per material; the kern is drawn.
    expect((h.match(/<linearGradient /g) ?? []).length).toBe(2);
    expect(h).toContain('class="kern"');
  });

  it('a section of one material without loads adds nothing, unless the kern is asked for', () => {
    const plain = html(DEMO_DOCUMENT);
    expect(plain).not.toContain('data-report=');
    const withKern = html(DEMO_DOCUMENT, { kern: true });
    expect(withKern).toContain('data-report="materials-figure"');
    expect(withKern).toContain('class="kern"');
    expect(withKern).not.toContain('data-report="loads"');
  });

  it('loads without materials: the stresses of the section taken as one material', () => {
    const h = html({ ...DEMO_DOCUMENT, momentLength: 'm', loads: { Mx: 50 } });
    expect(h).toContain('data-report="loads"');
    expect(h).toContain('The section has no materials: it is taken as one material.');
    expect(h).not.toContain('data-report="materials"');
  });
});

describe('the report with materials prints on A4 and US Letter', () => {
  const dir = mkdtempSync(join(tmpdir(), 'kern-report-mat-'));
  for (const paper of ['a4', 'letter'] as const) {
    it(`flitch beam on ${paper}`, async () => {
      const pdf = join(dir, `f-${paper}.pdf`);
      expect(await reportCommand(['public/examples/flitch-beam.json', '--pdf', pdf, '--cut', 'y=105.65', '--paper', paper])).toBe(0);
      const info = execFileSync('pdfinfo', [pdf], { encoding: 'utf8' });
      // Page sizes in points: A4 595 × 842, US Letter 612 × 792 (ISO 216; ANSI/ASME Y14.1).
      expect(info).toMatch(paper === 'a4' ? /Page size:\s+595\.\d+ x 842\.\d+/ : /Page size:\s+612 x 792/);
      const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
      expect(pages).toBeLessThanOrEqual(5);
      const t = execFileSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      for (const s of ['Centre of gravity G (by density)', 'Transformed section', 'Results per material', 'Loads and stresses', 'Sign convention.', 'full composite action', 'local buckling, shear lag, residual stresses', 'licensed engineer', 'largest tension']) expect(t).toContain(s);
    }, 60_000);
  }
});
