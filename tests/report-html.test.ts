/**
 * The printable report (HTML): title block, to-scale figure, property table with the panel's
 * digits, shapes, Q/b diagram, caution and method, and escaping of every document string.
 * Requirements: issue 4 ("PDF-ready report"); scales: ISO 5455 standard series; closed forms:
 * Gere & Goodno, Mechanics of Materials, App. E (rectangle A = bh, I = bh³/12).
 */
import { describe, expect, test } from 'vitest';
import { DEMO_DOCUMENT, evaluateDocument, formatNumber, formatProperty, PROPERTY_CATALOG, type SectionDocument } from '../src';
import { CAUTION_TEXT, chooseScale, renderReportHtml, STANDARD_SCALES } from '../src/report';

const render = (doc: SectionDocument, cut: { axis: 'x' | 'y'; at: number } | null = null) =>
  renderReportHtml({ doc, evaluation: evaluateDocument(doc), cut });

/** The text content of the element carrying data-value for property `key`. */
function shownValue(html: string, key: string): string | null {
  const row = new RegExp(`<tr data-prop="${key.replace('.', '\\.')}">(.*?)</tr>`).exec(html);
  if (!row) return null;
  const cell = /data-value="([^"]*)">([^<]*)</.exec(row[1]);
  expect(cell![1]).toBe(cell![2]);
  return cell![2];
}

describe('report contents', () => {
  const html = render(DEMO_DOCUMENT, { axis: 'y', at: 150 });

  test('a complete self-contained document: no scripts, no external resources', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toMatch(/<\/html>\s*$/);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\b(src|href)\s*=/i);
    expect(html).toMatch(/@page\s*\{[^}]*margin/); // print stylesheet with page margins
    expect(html).toMatch(/break-inside:\s*avoid/); // tables are not split across pages
  });

  test('title block fields come from the document', () => {
    const t = DEMO_DOCUMENT.title!;
    for (const [label, value] of [
      ['project', t.project],
      ['section', t.section],
      ['author', t.author],
      ['checker', t.checker],
      ['date', t.date],
      ['revision', t.revision],
      ['units', DEMO_DOCUMENT.units],
    ]) {
      expect(html).toContain(`data-field="${label}">${value}</span>`);
    }
  });

  test('every property is shown with exactly the text formatProperty gives (the panel’s digits)', () => {
    const p = evaluateDocument(DEMO_DOCUMENT).props!;
    for (const info of PROPERTY_CATALOG) {
      const f = formatProperty(info, p, DEMO_DOCUMENT.units);
      expect(shownValue(html, info.key), info.key).toBe(f.text);
    }
  });

  test('the caution, in the wording of issue 4', () => {
    expect(CAUTION_TEXT).toBe('Geometric properties only. The design must be checked against the applicable code by a qualified engineer.');
    expect(html).toContain(CAUTION_TEXT);
  });

  test('the figure states its scale and is drawn at it (1:2 for the 160 × 210 mm demo)', () => {
    expect(html).toContain('data-scale="1:2"');
    expect(html).toContain('to scale 1:2 on the printed page');
    // One paper millimetre per SVG unit; the section is mapped by k = 0.5 paper mm per mm.
    expect(html).toMatch(/<path class="section" transform="matrix\(0\.5 0 0 0\.5 /);
    expect(html).toMatch(/data-dim="width">160</);
    expect(html).toMatch(/data-dim="height">210</);
  });

  test('input shapes with their dimensions and operations; the method note; the Q/b diagram', () => {
    for (const s of DEMO_DOCUMENT.shapes) expect(html).toContain(s.name!.replace(/&/g, '&amp;'));
    expect(html).toContain('<td>subtract</td>');
    expect(html).toContain('centre (0, 90); diameter 60'); // the geometry schedule gives circles by centre and diameter
    expect(html).toMatch(/Green’s theorem/);
    expect(html).toMatch(/clipper-lib/);
    expect(html).toContain('Q/b diagram');
    expect(render(DEMO_DOCUMENT)).not.toContain('Q/b diagram');
  });
});

describe('numbers against closed forms', () => {
  test('a 100 × 50 mm rectangle: A = bh, Ix = bh³/12, Iy = hb³/12 (Gere & Goodno App. E)', () => {
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 50 }] };
    const html = render(doc);
    expect(shownValue(html, 'area')).toBe(formatNumber(100 * 50));
    expect(shownValue(html, 'Ix')).toBe(formatNumber((100 * 50 ** 3) / 12));
    expect(shownValue(html, 'Iy')).toBe(formatNumber((50 * 100 ** 3) / 12));
    expect(shownValue(html, 'centroid.x')).toBe('50');
    expect(shownValue(html, 'Ixy')).toBe('0'); // symmetric: Ixy = 0
    // 100 mm wide fits 1:1 (ISO 5455 full size) in the 144 mm wide drawing area.
    expect(html).toContain('data-scale="1:1"');
  });

  test('Q/b at the neutral axis of a b × h rectangle: Q = bh²/8, Q/b = h²/8 (Gere & Goodno, shear formula)', () => {
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 50 }] };
    const html = render(doc, { axis: 'y', at: 25 });
    const cell = (label: string) => new RegExp(`<td>${label}</td><td class="num">([^<]*)</td>`).exec(html)?.[1];
    expect(cell('First moment Q of that area about the centroidal axis')).toBe(formatNumber((100 * 50 ** 2) / 8));
    expect(cell('Q/b')).toBe(formatNumber(50 ** 2 / 8));
    expect(cell('Cut width b')).toBe('100');
  });
});

describe('escaping: document strings are text, never markup', () => {
  test('names with <script> and quotes are escaped everywhere', () => {
    const evil = '<script>alert("x")</script>';
    const doc: SectionDocument = {
      format: 'kern-section',
      version: 2,
      units: 'mm',
      name: evil,
      title: { project: '<img src=x onerror=alert(1)>', section: '"quoted" & <b>bold</b>', author: "O'Brien", checker: '</td></tr></table>', date: '2026', revision: '<!--' },
      shapes: [{ id: 'a"><script>', name: '</style><script>bad()</script>', type: 'rectangle', at: [0, 0], width: 10, height: 5 }],
    };
    const html = render(doc);
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/<img/i);
    expect(html).not.toContain('<!--');
    expect(html).not.toContain('<b>bold');
    expect(html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;');
    expect(html).toContain('O&#39;Brien');
    // The name also appears in the CSS page footer, as hex escapes only.
    const style = /<style>([\s\S]*?)<\/style>/.exec(html)![1];
    expect(style).not.toContain('<'); // so no "</style>" can end the style sheet early
    expect(style).toContain('\\3c '); // '<' written as a CSS hex escape
  });

  test('an empty section renders a report with the message instead of numbers', () => {
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
    const html = render(doc);
    expect(html).toContain('Section properties');
    expect(html).not.toContain('data-prop=');
    expect(html).toContain(CAUTION_TEXT);
  });
});

describe('drawing scales (ISO 5455 series)', () => {
  test('the series is 50:1 … 2:1, 1:1, 1:2, 1:5, 1:10, 1:20, …', () => {
    expect(STANDARD_SCALES.slice(0, 12).map((s) => s.label)).toEqual(['50:1', '20:1', '10:1', '5:1', '2:1', '1:1', '1:2', '1:5', '1:10', '1:20', '1:50', '1:100']);
  });
  test('the largest scale that fits is chosen', () => {
    expect(chooseScale(210, 160, 150, 120).label).toBe('1:2'); // 105 × 80 fits, 210 × 160 does not
    expect(chooseScale(20, 10, 150, 120).label).toBe('5:1'); // 100 × 50 fits, 200 × 100 does not
    expect(chooseScale(12000, 800, 150, 120).label).toBe('1:100'); // 120 × 8
  });
});

describe('report: area change per shape', () => {
  test('the changes add up to the section area, and a hole removes only what it crosses', () => {
    // Plate 100 × 20 with a Ø10 bore half off its top edge at (50, 20): the bore removes a half
    // circle, π·5²/2 (Gere & Goodno, plane areas, semicircle).
    const doc: SectionDocument = {
      format: 'kern-section',
      version: 2,
      units: 'mm',
      shapes: [
        { id: 'p', type: 'rectangle', at: [0, 0], width: 100, height: 20 },
        { id: 'b', type: 'circle', center: [50, 20], radius: 5, op: 'subtract' },
      ],
    };
    const html = renderReportHtml({ doc, evaluation: evaluateDocument(doc), paper: 'A4' });
    expect(html).toContain('<td class="num">+2000</td>');
    expect(html).toContain(`<td class="num">−${formatNumber((Math.PI * 25) / 2)}</td>`);
    expect(html).toMatch(/@page \{[^}]*size: A4 portrait;/);
  });
});
