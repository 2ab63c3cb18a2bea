/**
 * The examples shelf (public/examples/): every file on the shelf is listed in the app's menu, is a
 * valid document, runs through the command line as a user runs it, and gives the headline values
 * of a hand calculation by the composite-area method (tests/composite-areas.ts; Gere & Goodno,
 * ch. 12 and App. E; Roark, Table A.1). Coordinates and dimensions come from each example's own
 * title block and notes; the hand calculation rebuilds the section from them part by part.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { catalogueSize, compareSections, evaluateDocument, evaluateLimits, formatIssue, overallVerdict, parseDocument, sectionOf, type SectionDocument } from '../src';
import { EXAMPLE_SHELF } from '../app/examples/shelf';
import { centroidal, circle, circularSegment, quarterCircle, rect, spandrel, sum, type Moments } from './composite-areas';
import { close, worst } from './helpers';

const DIR = join(__dirname, '..', 'public', 'examples');
/** The examples this file pins; the shelf may hold others, pinned by their own tests. */
const MINE = ['bent-plate-bracket.json', 'crane-rail-girder.json', 'perforated-cover-plate.json', 'aluminium-extrusion.json', 'cope-proposal.json'];

function load(file: string): SectionDocument {
  const r = parseDocument(readFileSync(join(DIR, file), 'utf8'));
  if (!r.ok) throw new Error(`${file}: ${r.errors.map(formatIssue).join('; ')}`);
  return r.doc;
}

function props(doc: SectionDocument) {
  const ev = evaluateDocument(doc);
  if (!ev.props) throw new Error(ev.message ?? 'no area');
  expect(ev.warnings).toEqual([]);
  return ev.props;
}

/** Kern's area, centroid and centroidal second moments against the hand calculation, to 1e-9. */
function expectHand(doc: SectionDocument, hand: Moments) {
  const p = props(doc);
  const h = centroidal(hand);
  const size = Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
  close(p.area, h.area, 1e-9);
  close(p.centroid.x, h.x, 1e-9, size);
  close(p.centroid.y, h.y, 1e-9, size);
  close(p.Ix, h.Ix, 1e-9);
  close(p.Iy, h.Iy, 1e-9);
  close(p.Ixy, h.Ixy, 1e-9, Math.max(h.Ix, h.Iy));
  return { p, h };
}

describe('the shelf', () => {
  it('lists every example file in the menu, each with a title and a line, and every menu entry has its file', () => {
    const files = readdirSync(DIR).filter((f) => f.endsWith('.json')).sort();
    expect(EXAMPLE_SHELF.map((e) => e.file).sort()).toEqual(files);
    for (const e of EXAMPLE_SHELF) expect(e.blurb, `${e.file} has a line in app/examples/shelf.ts`).not.toBe('');
    expect(files.length).toBeGreaterThanOrEqual(5);
  });

  it('every example is a valid version-2 document with a name, an invented title block and notes', () => {
    for (const { file } of EXAMPLE_SHELF) {
      const d = load(file);
      expect(d.version, file).toBe(2);
      expect(d.name, file).toBeTruthy();
      for (const k of ['project', 'section', 'author'] as const) expect(d.title?.[k], `${file} title.${k}`).toBeTruthy();
      expect(d.title?.project, file).toMatch(/example|invented/i);
      expect(d.notes, file).toBeTruthy();
    }
    for (const file of MINE) {
      const d = load(file);
      for (const k of ['date', 'revision'] as const) expect(d.title?.[k], `${file} title.${k}`).toBeTruthy();
      expect(d.title?.project, file).toMatch(/\(invented example\)$/);
    }
  });

  it('the command line runs on each example straight from public/', () => {
    for (const { file } of EXAMPLE_SHELF) {
      const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', 'props', `public/examples/${file}`, '--json'], { encoding: 'utf8' });
      expect(r.status, `${file}: ${r.stderr}`).toBe(0);
      expect(JSON.parse(r.stdout).area).toBe(evaluateDocument(load(file)).props!.area);
    }
  });
});

describe('bent-plate bracket', () => {
  it('net area, centroid and second moments: straight legs, quarter-annulus bend, three hole gaps', () => {
    const d = load('bent-plate-bracket.json');
    const t = 8, ri = 8, ro = ri + t, Lh = 100, Lv = 120;
    // Legs to the outside faces; the bend is the quarter annulus about (ro, ro) (Gere & Goodno, App. E, case 10, twice).
    const gross = sum(
      [1, rect(ro, 0, Lh - ro, t)],
      [1, rect(0, ro, t, Lv - ro)],
      [1, quarterCircle(ro, ro, ro, -1, -1)],
      [-1, quarterCircle(ro, ro, ri, -1, -1)],
    );
    // Holes Ø18 through the thickness: gaps of 18 × 8 in the section (centres y = 45, 90 and x = 65).
    const net = sum([1, gross], [-1, rect(0, 36, t, 18)], [-1, rect(0, 81, t, 18)], [-1, rect(56, 0, 18, t)]);
    const { p } = expectHand(d, net);
    // Headline: A = t(Lh + Lv − 2ro) + π(ro² − ri²)/4 − 3·18·t = 1222.796 mm².
    close(p.area, t * (Lh + Lv - 2 * ro) + (Math.PI * (ro ** 2 - ri ** 2)) / 4 - 3 * 18 * t, 1e-12);
    expect(p.area).toBeCloseTo(1222.796, 3);
    // An angle has a product of inertia of the sign of its legs' placement (negative here: legs along +x and +y from the heel).
    expect(p.Ixy).toBeLessThan(0);
  });
});

describe('crane runway girder', () => {
  it('area, neutral axis, Ix and the two elastic moduli of the welded I with cap channel and rail', () => {
    const d = load('crane-rail-girder.json');
    // Cap channel (d 380, b 100, tw 10, tf 16, r 12) turned −90° so its web lies on the top flange
    // (y 636…646) and its flanges hang down at x = ±(174…190): web, two flanges, two root spandrels.
    const channel = sum(
      [1, rect(-190, 636, 380, 10)],
      [1, rect(-190, 546, 16, 90)],
      [1, rect(174, 546, 16, 90)],
      [1, spandrel(-174, 636, 12, 1, -1)],
      [1, spandrel(174, 636, 12, -1, -1)],
    );
    const hand = sum([1, rect(-125, 0, 250, 16)], [1, rect(-5, 16, 10, 600)], [1, rect(-150, 616, 300, 20)], [1, channel], [1, rect(-25, 646, 50, 30)]);
    const { p, h } = expectHand(d, hand);
    // Headline values of the hand calculation (rounded for a reader): A = 24 242 mm², ȳ = 447.7 mm.
    expect(p.area).toBeCloseTo(24241.8, 1);
    expect(p.centroid.y).toBeCloseTo(447.678, 3);
    // S = I / c to each extreme fibre (Gere & Goodno §5.5): top of the rail at 676, bottom at 0.
    close(p.Sx_top, h.Ix / (676 - h.y), 1e-9);
    close(p.Sx_bottom, h.Ix / h.y, 1e-9);
  });
});

describe('perforated cover plates', () => {
  it('net section through the access holes, and the loss against the gross section', () => {
    const d = load('perforated-cover-plate.json');
    const webs = sum([1, rect(-110, -150, 10, 300)], [1, rect(100, -150, 10, 300)]);
    const strips = sum([1, rect(-180, 150, 110, 12)], [1, rect(70, 150, 110, 12)], [1, rect(-180, -162, 110, 12)], [1, rect(70, -162, 110, 12)]);
    const { p } = expectHand(d, sum([1, webs], [1, strips]));
    expect(p.area).toBe(2 * 3000 + 4 * 1320);
    // Doubly symmetric: centroid at the origin (round-off only).
    expect(Math.abs(p.centroid.x) + Math.abs(p.centroid.y)).toBeLessThan(1e-9);
    // The gross section is the same document without the holes: the net Ix is lower by exactly the
    // two 140 × 12 gaps about the centroid: 2·(140·12³/12 + 1680·156²).
    const gross = props({ ...d, shapes: d.shapes.filter((s) => s.op !== 'subtract') });
    close(gross.Ix - p.Ix, 2 * ((140 * 12 ** 3) / 12 + 140 * 12 * 156 ** 2), 1e-9);
  });
});

describe('aluminium extrusion', () => {
  it('tube with rounded corners plus four bosses merged 1 mm into the walls, less the screw bores', () => {
    const d = load('aluminium-extrusion.json');
    const B = 80, H = 50, t = 3, ro = 4, ri = ro - t;
    const outer = sum([1, rect(0, 0, B, H)], [-1, spandrel(0, 0, ro, 1, 1)], [-1, spandrel(B, 0, ro, -1, 1)], [-1, spandrel(0, H, ro, 1, -1)], [-1, spandrel(B, H, ro, -1, -1)]);
    const hollow = sum([1, rect(t, t, B - 2 * t, H - 2 * t)], [-1, spandrel(t, t, ri, 1, 1)], [-1, spandrel(B - t, t, ri, -1, 1)], [-1, spandrel(t, H - t, ri, 1, -1)], [-1, spandrel(B - t, H - t, ri, -1, -1)]);
    // A boss Ø9 whose centre is c = 3.5 from the wall's inner face adds the circle less the segment
    // already inside the wall (Roark, Table A.1, circular segment); the bore Ø4.2 is taken out.
    const R = 4.5, c = 3.5, rb = 2.1;
    const boss = (x: number, y: number, wall: 'y+' | 'y-') => sum([1, circle(x, y, R)], [-1, circularSegment(x, y, R, c, wall)], [-1, circle(x, y, rb)]);
    const hand = sum([1, outer], [-1, hollow], [1, boss(14, 43.5, 'y+')], [1, boss(66, 43.5, 'y+')], [1, boss(14, 6.5, 'y-')], [1, boss(66, 6.5, 'y-')]);
    const { p } = expectHand(d, hand);
    expect(p.area).toBeCloseTo(914.72, 2);
    close(p.centroid.x, 40, 1e-12);
    close(p.centroid.y, 25, 1e-12);
  });
});

describe('cope proposal', () => {
  const d = load('cope-proposal.json');
  const b = 150, h = 300, tw = 7.1, tf = 10.7, r = 15, xw = (b - tw) / 2;
  const bottom = sum([1, rect(0, 0, b, tf)], [1, spandrel(xw, tf, r, -1, 1)], [1, spandrel(xw + tw, tf, r, 1, 1)]);

  it('the baseline is IPE 300 from the catalogue, with the tabulated A and I within 1 %', () => {
    const beam = d.shapes[0];
    const z = catalogueSize('IPE', '300')!;
    expect(beam).toMatchObject({ type: 'i-beam', depth: z.depth, flangeWidth: z.flangeWidth, flangeThickness: z.flangeThickness, webThickness: z.webThickness, rootRadius: z.rootRadius });
    const top = sum([1, rect(0, h - tf, b, tf)], [1, spandrel(xw, h - tf, r, -1, -1)], [1, spandrel(xw + tw, h - tf, r, 1, -1)]);
    const { p } = expectHand(d, sum([1, bottom], [1, rect(xw, tf, tw, h - 2 * tf)], [1, top]));
    // European section tables (EN 10365 dimensions), IPE 300: A = 53.81 cm², Iy = 8356 cm⁴, Iz = 603.8 cm⁴ (from memory).
    expect(Math.abs(p.area / 5381 - 1)).toBeLessThan(0.01);
    expect(Math.abs(p.Ix / 8356e4 - 1)).toBeLessThan(0.01);
    expect(Math.abs(p.Iy / 603.8e4 - 1)).toBeLessThan(0.01);
  });

  it('the document opens on the proposal, which leaves a tee 260 deep: bottom flange, its root radii and the web', () => {
    expect(d.activeVariant).toBe('Top cope 40 deep');
    const cut = sectionOf(d, 'Top cope 40 deep');
    const { p } = expectHand(cut, sum([1, bottom], [1, rect(xw, tf, tw, 260 - tf)]));
    expect(p.bounds.ymax).toBe(260);
  });

  it('the document’s limits give area and Ix within, the critical-fibre modulus beyond', () => {
    const c = compareSections(props(d), props(sectionOf(d, 'Top cope 40 deep')));
    const res = evaluateLimits(c, d.limits!, d.units);
    expect(res.map((x) => [x.property, x.status])).toEqual([
      ['area', 'within'],
      ['Ix', 'within'],
      ['Sx_min', 'beyond'],
    ]);
    expect(overallVerdict(res)).toBe('beyond');
  });
});

describe('largest error', () => {
  it('prints the largest relative error against the hand calculations', () => {
    console.log(`examples: largest relative error against the hand calculation ${worst.value.toExponential(2)}`);
    expect(worst.value).toBeLessThan(1e-9);
  });
});
