/**
 * The report's line groups, weld checks and strips: the values printed are the panel's digits,
 * the figure draws the lines as exact strokes (SVG arcs), the cautions are there, document strings
 * are escaped, and a document of line elements only gets a report that says its area properties
 * are absent. Sources for the values: Blodgett, Design of Welded Structures (1966), Table 5,
 * C-shaped group (from memory), as in tests/lines-cli.test.ts.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { chainFromPath, evaluateDocument, formatLineProperty, LINE_PROPERTY_CATALOG, parseDocument, THIN_WALL_CAUTION, WELD_GROUP_CAUTION, type SectionDocument } from '../src';
import { chainPathData, renderReportHtml } from '../src/report';
import { escapeHtml } from '../src/report';

function load(path: string): SectionDocument {
  const r = parseDocument(readFileSync(path, 'utf8'));
  if (!r.ok) throw new Error('bad fixture');
  return r.doc;
}

const render = (doc: SectionDocument) => renderReportHtml({ doc, evaluation: evaluateDocument(doc) });

describe('report: line groups, weld checks, strips', () => {
  const doc = load('public/examples/welded-bracket.json');
  const ev = evaluateDocument(doc);
  const html = render(doc);

  it('a table per line group with the panel\'s digits for every line property', () => {
    const p = ev.lines[0].props!;
    for (const info of LINE_PROPERTY_CATALOG) {
      const shown = formatLineProperty(info, p, doc.units).text;
      const cell = new RegExp(`data-line="Weld to column\\.${info.key.replace('.', '\\.')}">([^<]*)<`).exec(html);
      expect(cell?.[1], info.key).toBe(escapeHtml(shown));
    }
    expect(html).toContain('per unit throat for welds');
  });

  it('a figure with the lines as strokes (exact arcs), the group centroid, the load and the critical points', () => {
    const fig = /<section class="block lines">.*?<svg[^>]*>(.*?)<\/svg>/s.exec(html)![1];
    const weld = doc.shapes.find((s) => s.type === 'line')!;
    if (weld.type !== 'line') throw new Error();
    // The weld's path: M, L and A commands, each arc once (two bends).
    const d = chainPathData(chainFromPath(weld.start, weld.segments), String);
    expect(d.match(/A/g)).toHaveLength(2);
    expect(fig).toContain(`d="${d}"`);
    expect(fig).toMatch(/class="weld"/);
    expect(fig).toMatch(/>G</);
    expect(fig).toMatch(/>F1</);
    // Two critical points (the flange tips), each labelled with the force per length.
    expect(fig.match(/class="crit-ring"/g)).toHaveLength(2);
    expect(fig).toContain('f max 0.4597 kN/mm');
  });

  it('the weld check with its load, result and caution', () => {
    expect(html).toContain('Weld check by the elastic method');
    expect(html).toMatch(/<tr data-weld="f"><td>[^<]*<\/td><td class="num">0\.4597<\/td><td>kN\/mm<\/td>/);
    expect(html).toMatch(/<tr data-weld="at"><td>[^<]*<\/td><td class="num">\(75, 153\) mm<\/td>/);
    expect(html).toContain(escapeHtml(WELD_GROUP_CAUTION));
  });

  it('the strip exact against thin wall, with the thin-wall caution', () => {
    expect(html).toContain('Strips: exact against thin wall');
    expect(html).toMatch(/<tr data-thin-wall="Ix"><td>Ix<\/td><td class="num">6\.487 × 10⁶<\/td><td class="num">6\.479 × 10⁶<\/td><td class="num">-0\.12 %<\/td>/);
    expect(html).toContain(escapeHtml(THIN_WALL_CAUTION));
    // The strip is in the geometry schedule, by its kind.
    expect(html).toMatch(/<td>Strip<\/td>/);
  });

  it('a document of line elements only: the area properties absent, the line groups given', () => {
    const only = render(load('tests/fixtures/weld-three-sides.json'));
    expect(only).toContain('the area properties are absent (this is not an error)');
    expect(only).not.toContain('<h2>Section properties</h2>');
    expect(only).toMatch(/data-line="Weld\.J">385\.4</);
    expect(only).toMatch(/<tr data-weld="f"><td>[^<]*<\/td><td class="num">4\.483<\/td><td>kip\/in<\/td>/);
  });

  it('escapes the names of groups and loads', () => {
    const d = load('tests/fixtures/weld-three-sides.json');
    const evil = '<b>"x"</b>';
    const bad: SectionDocument = { ...d, shapes: d.shapes.map((s) => ({ ...s, group: evil })), weldLoads: [{ ...d.weldLoads![0], group: evil, name: evil }] };
    const out = render(bad);
    expect(out).not.toContain(evil);
    expect(out).toContain(escapeHtml(evil));
  });
});
