/**
 * Empty and degenerate sections (issue 8): the report is a page that says so in words, with no
 * figure (before, an empty section drew a phantom 1 × 1 box at 50:1), and `kern report` exits 0.
 * The PDF is read back with poppler's pdftotext.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { evaluateDocument, type SectionDocument } from '../src';
import { CAUTION_TEXT, renderReportHtml } from '../src/report';
import { chromiumPath } from '../cli/report';

const dir = mkdtempSync(join(tmpdir(), 'kern-empty-'));
const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', name: 'Nothing yet', shapes: [] };

function kernReport(doc: SectionDocument, name: string, pdf: boolean) {
  const file = join(dir, `${name}.json`), html = join(dir, `${name}.html`), out = join(dir, `${name}.pdf`);
  writeFileSync(file, JSON.stringify(doc));
  const args = ['cli/main.ts', 'report', file, '--out', html, ...(pdf ? ['--pdf', out] : [])];
  const r = spawnSync(join('node_modules', '.bin', 'tsx'), args, { encoding: 'utf8' });
  return { code: r.status, err: r.stderr, html: existsSync(html) ? readFileSync(html, 'utf8') : '', pdf: out };
}

describe('an empty document', () => {
  test('kern report exits 0; the PDF says the section is empty and has no figure', () => {
    expect(existsSync(chromiumPath()), `Chromium not found at ${chromiumPath()}`).toBe(true);
    const r = kernReport(EMPTY, 'empty', true);
    expect(r.code, r.err).toBe(0);
    expect(r.err).toMatch(/warning: .*empty/); // said on stderr too, not silently
    // No figure at all: no drawing, no scale, no dimensions.
    expect(r.html).not.toMatch(/<svg/);
    expect(r.html).not.toContain('data-scale');
    expect(r.html).toContain('data-empty="true"');
    const text = execFileSync('pdftotext', [r.pdf, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('The section is empty: the document has no shapes, so there is nothing to draw and there are no properties.');
    expect(text).not.toContain('Section to scale');
    // No scale printed (the phantom box read "scale 50:1"); the page footer's time of day may
    // itself read "22:50:16", so the check is for the scale's own words.
    expect(text).not.toMatch(/scale \d+:\d+/);
    expect(text).toContain(CAUTION_TEXT);
    expect(text).toContain('Revisions, notes and check'); // still a page a checker can sign
  }, 60_000);
});

describe('a degenerate section', () => {
  test('shapes that leave no area: a clear message, no figure, exit 0', () => {
    const doc: SectionDocument = {
      format: 'kern-section',
      version: 2,
      units: 'mm',
      shapes: [
        { id: 'a', type: 'rectangle', at: [0, 0], width: 10, height: 10 },
        { id: 'b', type: 'rectangle', at: [-5, -5], width: 20, height: 20, op: 'subtract' },
      ],
    };
    const r = kernReport(doc, 'gone', false);
    expect(r.code, r.err).toBe(0);
    expect(r.html).not.toMatch(/<svg/);
    expect(r.html).toMatch(/The section has no area, so there is nothing to draw and there are no properties\./);
    // The shapes are still listed, so the checker sees why.
    expect(r.html).toContain('<td data-shape-name>Rectangle 1</td>');
    expect(r.html).toContain('<td data-shape-name>Rectangle 2</td>');
  });

  test('the same from the renderer: no property table, no Q/b even when a cut is asked for', () => {
    const html = renderReportHtml({ doc: EMPTY, evaluation: evaluateDocument(EMPTY), cut: { axis: 'y', at: 0 } });
    expect(html).not.toContain('data-prop=');
    expect(html).not.toContain('Q/b diagram');
    expect(html).not.toContain('Input shapes');
  });
});
