/**
 * The report's geometry schedule (src/report/schedule.ts): a checker must be able to rebuild the
 * section from the printed report alone.
 *
 * The main check prints a bent bracket, a path with two arcs and a bolt hole, to PDF through the
 * real command line, reads the PDF back with poppler's pdftotext (an independent reader), and
 * rebuilds the section from that text only: the area from the listed vertices by the shoelace
 * formula plus the circular segments of the arcs, less the hole, must match the area the report
 * prints, to the figures it prints.
 *
 * Sources: the bracket's area in closed form, legs plus a quarter annulus π(R² − r²)/4, and the
 * hole πd²/4 (Gere & Goodno, Mechanics of Materials, App. E: circle and quarter circle); the
 * polygon area by the shoelace formula and the circular segment r²(φ − sin φ)/2 (Roark, Table A.1,
 * circular segment; from memory).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { DISPLAY_SIGFIGS, evaluateDocument, formatNumber, parseFormatted, PROFILE_FIELDS, type SectionDocument, type Shape } from '../src';
import { renderReportHtml } from '../src/report';
import { shapeSchedule } from '../src/report/schedule';
import { shapeDisplayName } from '../src/document/labels';
import { chromiumPath } from '../cli/report';
import { close } from './helpers';

const dir = mkdtempSync(join(tmpdir(), 'kern-schedule-'));

// Outer bend radius 20, inner 10, plate 10 thick; legs 120 (vertical) and 100 (horizontal).
const c45 = Math.SQRT1_2;
const BRACKET: SectionDocument = {
  format: 'kern-section',
  version: 2,
  units: 'mm',
  name: 'Bent bracket BR-7 (invented)',
  shapes: [
    {
      id: 'b',
      type: 'path',
      start: [0, 120],
      segments: [
        { to: [0, 20] },
        { to: [20, 0], via: [20 - 20 * c45, 20 - 20 * c45] },
        { to: [100, 0] },
        { to: [100, 10] },
        { to: [20, 10] },
        { to: [10, 20], via: [20 - 10 * c45, 20 - 10 * c45] },
        { to: [10, 120] },
        { to: [0, 120] },
      ],
    },
    { id: 'h', type: 'circle', center: [5, 90], radius: 4, op: 'subtract' },
  ],
};
// Closed form: vertical leg 10 × 100, horizontal leg 80 × 10, bend π(20² − 10²)/4, hole π·8²/4.
const BRACKET_AREA = 10 * 100 + 80 * 10 + (Math.PI * (20 ** 2 - 10 ** 2)) / 4 - (Math.PI * 8 ** 2) / 4;

/** Numbers in a line of pdftotext output, engineering notation included ("71.86 × 10³"). */
function numbersIn(line: string): number[] {
  return [...line.matchAll(/-?\d+(?:\.\d+)?(?: × 10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)?/g)].map((m) => parseFormatted(m[0]));
}

describe('a bracket printed to PDF can be rebuilt from the text alone', () => {
  test('every vertex and arc radius is listed, and the rebuilt area matches the printed one', () => {
    expect(existsSync(chromiumPath()), `Chromium not found at ${chromiumPath()}`).toBe(true);
    const file = join(dir, 'bracket.json'), pdf = join(dir, 'bracket.pdf');
    writeFileSync(file, JSON.stringify(BRACKET));
    const r = spawnSync(join('node_modules', '.bin', 'tsx'), ['cli/main.ts', 'report', file, '--pdf', pdf], { encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    const lines = text.split('\n');

    // The segment table: its caption names the shape by its display name.
    const at = lines.findIndex((l) => /Table S1 · Path 1: segments/.test(l));
    expect(at, 'the segment table of Path 1').toBeGreaterThan(-1);
    type Row = { kind: string; nums: number[] };
    const rows: Row[] = [];
    for (const l of lines.slice(at + 2)) {
      const m = /^\s*(\d+)\s+(start|line|arc)\b(.*)$/.exec(l);
      if (!m) break;
      rows.push({ kind: m[2], nums: numbersIn(m[3]) });
    }
    const path = BRACKET.shapes[0] as Extract<Shape, { type: 'path' }>;
    expect(rows.length).toBe(path.segments.length + 1);
    // Every vertex, to the figures shown (6 significant figures; these are exact).
    expect(rows[0].nums).toEqual(path.start);
    path.segments.forEach((g, k) => expect(rows[k + 1].nums.slice(0, 2), `segment ${k + 1}`).toEqual(g.to));
    // Each arc's radius (20 outside, 10 inside), centre (20, 20) and sweep (+90°, −90°).
    const arcs = rows.filter((row) => row.kind === 'arc');
    expect(arcs.map((a) => a.nums[6])).toEqual([20, 10]);
    expect(arcs.map((a) => a.nums.slice(4, 6))).toEqual([
      [20, 20],
      [20, 20],
    ]);
    expect(arcs.map((a) => a.nums[7])).toEqual([90, -90]);

    // The hole, from the list of shapes: centre and diameter.
    const holeLine = lines.find((l) => /Circle 2\s+Circle\s+subtract/.test(l))!;
    expect(holeLine).toMatch(/centre \(5, 90\); diameter 8/);
    const d = 8;

    // Rebuild: shoelace over the listed vertices, plus each arc's circular segment r²(φ − sin φ)/2
    // with the sign of its sweep, less the hole πd²/4.
    const pts = rows.map((row) => row.nums.slice(0, 2));
    let area = 0;
    for (let i = 1; i < pts.length; i++) area += (pts[i - 1][0] * pts[i][1] - pts[i][0] * pts[i - 1][1]) / 2;
    for (const a of arcs) {
      const rr = a.nums[6], phi = (a.nums[7] * Math.PI) / 180;
      area += (Math.sign(phi) * rr * rr * (Math.abs(phi) - Math.sin(Math.abs(phi)))) / 2;
      // The printed through-point lies on the printed circle, to the printed figures.
      expect(Math.abs(Math.hypot(a.nums[2] - a.nums[4], a.nums[3] - a.nums[5]) - rr)).toBeLessThan(1e-4);
    }
    area -= (Math.PI * d * d) / 4;
    close(area, BRACKET_AREA, 1e-12); // the rebuilt section is the closed form (Gere & Goodno)

    // The report's own area, as printed, is the rebuilt one to the shown figures.
    const areaLine = lines.find((l) => /^\s*Area\s+A\s/.test(l))!;
    const shown = numbersIn(areaLine.replace(/^\s*Area\s+A\s/, ''))[0];
    expect(formatNumber(area)).toBe(formatNumber(shown));
    const unit = Math.pow(10, Math.floor(Math.log10(area)) - DISPLAY_SIGFIGS + 1);
    expect(Math.abs(area - shown)).toBeLessThanOrEqual(unit / 2);

    // Dimensions on the figure: the hole's diameter and position, and the plate thickness.
    for (const t of ['Ø8', '90', '100', '120']) expect(text).toContain(t);
  }, 60_000);

  test('the evaluated bracket is the closed form (so the printed area is right, not just consistent)', () => {
    close(evaluateDocument(BRACKET).props!.area, BRACKET_AREA, 1e-12);
  });
});

describe('what the schedule lists', () => {
  test('one display name per shape: the name if set, else kind and place ("Path 1", "Circle 2")', () => {
    const html = renderReportHtml({ doc: BRACKET, evaluation: evaluateDocument(BRACKET) });
    const names = [...html.matchAll(/<td data-shape-name>([^<]*)<\/td>/g)].map((m) => m[1]);
    expect(names).toEqual(BRACKET.shapes.map((s, i) => shapeDisplayName(s, i)));
    expect(names).toEqual(['Path 1', 'Circle 2']);
    expect(shapeDisplayName({ id: 'x', name: 'Web stiffener', type: 'rectangle', at: [0, 0], width: 1, height: 1 }, 4)).toBe('Web stiffener');
    expect(shapeDisplayName({ id: 'x', name: '  ', type: 'i-beam', at: [0, 0], depth: 1, flangeWidth: 1, flangeThickness: 0.1, webThickness: 0.1, rootRadius: 0 }, 2)).toBe('I-beam 3');
  });

  test('a profile lists every parameter, its position, turn and mirror', () => {
    const s: Shape = { id: 'c', type: 'channel', at: [10, -5], rotation: 30, mirror: true, depth: 200, flangeWidth: 75, flangeThickness: 11.5, webThickness: 8.5, rootRadius: 12 };
    const sch = shapeSchedule(s, 0, 200);
    const labels = sch.params.map((p) => p[0]);
    for (const fl of PROFILE_FIELDS.channel) expect(labels).toContain(fl.label);
    expect(Object.fromEntries(sch.params)).toMatchObject({ 'Flange thickness': '11.5', 'Local origin at': '(10, -5)', Turned: '30°', Mirrored: 'yes' });
    expect(sch.frame).toMatch(/web on the left/);
  });

  test('a circle is given by centre and diameter', () => {
    expect(Object.fromEntries(shapeSchedule({ id: 'c', type: 'circle', center: [1.5, -2], radius: 12.5 }, 0, 100).params)).toEqual({ Centre: '(1.5, -2)', Diameter: '25' });
  });

  test('a polygon of 300 vertices: a summary in the list and every vertex in the appendix, none dropped', () => {
    const n = 300;
    const points: [number, number][] = Array.from({ length: n }, (_, i) => {
      const t = (2 * Math.PI * i) / n, r = 50 + 5 * Math.cos(7 * t);
      return [Number((r * Math.cos(t)).toFixed(3)) + 0, Number((r * Math.sin(t)).toFixed(3)) + 0]; // + 0: no −0
    });
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ id: 'p', type: 'polygon', points }] };
    const html = renderReportHtml({ doc, evaluation: evaluateDocument(doc) });
    expect(html).toContain('listed in Appendix, Table A1 (300 rows)');
    expect(html).toMatch(/points from x = -?[\d.]+ to [\d.]+, y = -?[\d.]+ to [\d.]+/);
    expect(html).not.toContain('Table S1');
    const appendix = html.slice(html.indexOf('<section class="appendix">'));
    expect(appendix).toContain('data-rows="300"');
    // Every vertex number 1..300 is in the appendix table, each with its coordinates.
    const cells = [...appendix.matchAll(/<td class="(?:group-start )?num">(\d+)<\/td><td class="num">([^<]*)<\/td><td class="num">([^<]*)<\/td>/g)];
    expect(cells.map((c) => Number(c[1])).sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i + 1));
    for (const c of cells) expect([parseFormatted(c[2]), parseFormatted(c[3])]).toEqual(points[Number(c[1]) - 1]);
  });
});
