/**
 * The welded bent-plate bracket example (public/examples/welded-bracket.json, invented): a 6 mm
 * plate bent to a channel (inside bend radius 6 mm, so the centreline bends at R = 9 mm), drawn by
 * its centreline, with a fillet weld along its outside faces and round the bends, loaded by
 * 25 kN downwards 250 mm from the column face. Its headline values against closed forms built
 * piece by piece:
 *
 * - Lines and arcs (the weld, and the plate's centreline): a straight line a→b of length L has
 *   ∫x ds = L·xm, ∫x² ds = L(xm² + (bx − ax)²/12), ∫xy ds = L(xm·ym + (bx − ax)(by − ay)/12); a circular
 *   arc of radius r about (cx, cy) from θ1 to θ2 has ds = r dθ, so ∫(x − cx) ds = r²[sin θ],
 *   ∫(y − cy) ds = −r²[cos θ], ∫(x − cx)² ds = r³[θ/2 + sin 2θ/4], ∫(y − cy)² ds = r³[θ/2 − sin 2θ/4],
 *   ∫(x − cx)(y − cy) ds = r³[sin² θ/2] (Hibbeler, Statics, inside back cover: centroid of a
 *   circular arc r·sin α/α, from memory; the second moments by the same integration).
 * - Areas: rectangles (Gere & Goodno, App. E, rectangle) and annular sectors, whose moments are the
 *   same integrals with dA = ρ dρ dθ between Ri and Ro: A = (Ro² − Ri²)/2·Δθ, first moments
 *   (Ro³ − Ri³)/3·[…], second moments (Ro⁴ − Ri⁴)/4·[…] (Roark, Table A.1, from memory, for the
 *   circular sector it generalises); parallel axes to the centroid (Gere & Goodno, Sect. 12.5).
 * - The weld force: Blodgett, Design of Welded Structures (1966), Sect. 7.4: f = |F/L + (M/J) k × r|
 *   with M = (P − G) × F (from memory).
 */
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { chainFromPath, evaluateDocument, formatLineProperty, formatNumber, LINE_PROPERTY_CATALOG, parseDocument, shapeToRegion, thinWallComparison, type SectionDocument, type StripShape } from '../src';
import { close, worst } from './helpers';

afterAll(() => console.log(`welded-bracket example: largest relative error against the closed forms ${worst.value.toExponential(2)}`));

const parsed = parseDocument(readFileSync('public/examples/welded-bracket.json', 'utf8'));
if (!parsed.ok) throw new Error(parsed.errors.map((e) => `${e.path}: ${e.message}`).join('; '));
const doc: SectionDocument = parsed.doc;
const ev = evaluateDocument(doc);
const PI = Math.PI;

/** Raw moments (about the origin) of a set of pieces: m00, m10 = ∫x, m01 = ∫y, m20 = ∫x², m02 = ∫y², m11 = ∫xy. */
type M = { m00: number; m10: number; m01: number; m20: number; m02: number; m11: number };
const add = (ms: M[]): M => ms.reduce((a, b) => ({ m00: a.m00 + b.m00, m10: a.m10 + b.m10, m01: a.m01 + b.m01, m20: a.m20 + b.m20, m02: a.m02 + b.m02, m11: a.m11 + b.m11 }));

function line(ax: number, ay: number, bx: number, by: number): M {
  const L = Math.hypot(bx - ax, by - ay), xm = (ax + bx) / 2, ym = (ay + by) / 2, dx = bx - ax, dy = by - ay;
  return { m00: L, m10: L * xm, m01: L * ym, m20: L * (xm * xm + (dx * dx) / 12), m02: L * (ym * ym + (dy * dy) / 12), m11: L * (xm * ym + (dx * dy) / 12) };
}

/** Centre-frame integrals [sin], [−cos], [θ/2 + sin2θ/4], [θ/2 − sin2θ/4], [sin²θ/2] from t1 to t2. */
function angular(t1: number, t2: number) {
  const d = (f: (t: number) => number) => f(t2) - f(t1);
  return {
    dt: t2 - t1,
    c1: d(Math.sin),
    s1: d((t) => -Math.cos(t)),
    cc: d((t) => t / 2 + Math.sin(2 * t) / 4),
    ss: d((t) => t / 2 - Math.sin(2 * t) / 4),
    cs: d((t) => Math.sin(t) ** 2 / 2),
  };
}

/** Moments about the origin from moments about the centre (cx, cy). */
function shifted(cx: number, cy: number, m0: number, mx: number, my: number, mxx: number, myy: number, mxy: number): M {
  return { m00: m0, m10: mx + cx * m0, m01: my + cy * m0, m20: mxx + 2 * cx * mx + cx * cx * m0, m02: myy + 2 * cy * my + cy * cy * m0, m11: mxy + cx * my + cy * mx + cx * cy * m0 };
}

function arc(cx: number, cy: number, r: number, t1: number, t2: number): M {
  const a = angular(t1, t2);
  return shifted(cx, cy, r * a.dt, r * r * a.c1, r * r * a.s1, r ** 3 * a.cc, r ** 3 * a.ss, r ** 3 * a.cs);
}

function rectangle(x0: number, x1: number, y0: number, y1: number): M {
  const b = x1 - x0, h = y1 - y0, A = b * h, xc = (x0 + x1) / 2, yc = (y0 + y1) / 2;
  return { m00: A, m10: A * xc, m01: A * yc, m20: A * xc * xc + (h * b ** 3) / 12, m02: A * yc * yc + (b * h ** 3) / 12, m11: A * xc * yc };
}

function annularSector(cx: number, cy: number, ri: number, ro: number, t1: number, t2: number): M {
  const a = angular(t1, t2);
  const k2 = (ro ** 2 - ri ** 2) / 2, k3 = (ro ** 3 - ri ** 3) / 3, k4 = (ro ** 4 - ri ** 4) / 4;
  return shifted(cx, cy, k2 * a.dt, k3 * a.c1, k3 * a.s1, k4 * a.cc, k4 * a.ss, k4 * a.cs);
}

/** Centroid and centroidal Ix, Iy, Ixy (parallel axes). */
function centroidal(m: M) {
  const x = m.m10 / m.m00, y = m.m01 / m.m00;
  return { L: m.m00, x, y, Ix: m.m02 - m.m00 * y * y, Iy: m.m20 - m.m00 * x * x, Ixy: m.m11 - m.m00 * x * y };
}

const t = 6, R = 9; // plate thickness; centreline bend radius = inside radius 6 + t/2

// The weld: outside faces, offset t/2 from the centreline; its bends have radius R + t/2 = 12.
const weld = centroidal(add([line(75, 153, 9, 153), arc(9, 141, 12, PI / 2, PI), line(-3, 141, -3, 9), arc(9, 9, 12, PI, 1.5 * PI), line(9, -3, 75, -3)]));
// The plate's centreline.
const centre = centroidal(add([line(75, 150, 9, 150), arc(9, 141, R, PI / 2, PI), line(0, 141, 0, 9), arc(9, 9, R, PI, 1.5 * PI), line(9, 0, 75, 0)]));
// The plate: web, flanges and the two bends (annular quarter sectors between R − t/2 and R + t/2).
const plate = centroidal(
  add([rectangle(-3, 3, 9, 141), rectangle(9, 75, 147, 153), rectangle(9, 75, -3, 3), annularSector(9, 141, 6, 12, PI / 2, PI), annularSector(9, 9, 6, 12, PI, 1.5 * PI)]),
);

describe('welded bent-plate bracket example (public/examples/welded-bracket.json)', () => {
  it('the weld group: length, centroid, Ix, Iy, Ixy, J against the pieces (lines and arcs)', () => {
    const g = ev.lines.find((x) => x.group === 'Weld to column')!;
    expect(ev.lines).toHaveLength(1);
    const p = g.props!;
    // L = 2·66 + 132 + 2·(π·12/2) = 264 + 12π = 301.699 mm
    close(p.length, 264 + 12 * PI, 1e-14);
    close(p.length, weld.L, 1e-14);
    close(p.centroid.x, weld.x, 1e-12); // 17.2334 mm
    close(p.centroid.y, 75, 1e-14);
    close(p.Ix, weld.Ix, 1e-12); // 1.1997 × 10⁶ mm³
    close(p.Iy, weld.Iy, 1e-12); // 192.93 × 10³ mm³
    close(p.Ixy, 0, 1e-12, p.Ix);
    close(p.J, weld.Ix + weld.Iy, 1e-12);
    // The headline numbers as the panel, the CLI and the report show them.
    const shown = (key: string) => formatLineProperty(LINE_PROPERTY_CATALOG.find((i) => i.key === key)!, p, doc.units).text;
    expect([shown('length'), shown('centroid.x'), shown('J')]).toEqual(['301.7', '17.23', '1.393 × 10⁶']);
  });

  it('the plate: exact area and second moments of its outline against rectangles and annular sectors', () => {
    const a = ev.props!;
    // A = t × centreline length exactly (a bend is an annular sector of mean radius R): 6(264 + 9π)
    close(a.area, t * (264 + 9 * PI), 1e-13);
    close(a.area, plate.L, 1e-13);
    close(a.centroid.x, plate.x, 1e-12);
    close(a.centroid.y, 75, 1e-14);
    close(a.Ix, plate.Ix, 1e-12); // 6.487 × 10⁶ mm⁴
    close(a.Iy, plate.Iy, 1e-12); // 1.039 × 10⁶ mm⁴
  });

  it('the plate against its thin-wall values (centreline × t)', () => {
    const s = doc.shapes.find((x): x is StripShape => x.type === 'strip')!;
    const cmp = thinWallComparison(chainFromPath(s.start, s.segments), s.thickness, shapeToRegion(s));
    close(cmp.thinWall.area, t * centre.L, 1e-14);
    close(cmp.thinWall.Ix, t * centre.Ix, 1e-12);
    close(cmp.thinWall.Iy, t * centre.Iy, 1e-12);
    close(cmp.exact.Ix, plate.Ix, 1e-12);
    // The thin-wall error of this plate, from the closed forms: A exact, Ix −0.12 %, Iy −0.37 %.
    close(cmp.percent.area, 0, 1e-12, 1);
    close(cmp.percent.Ix, (100 * (t * centre.Ix - plate.Ix)) / plate.Ix, 1e-9);
    close(cmp.percent.Iy, (100 * (t * centre.Iy - plate.Iy)) / plate.Iy, 1e-9);
    expect([formatNumber(cmp.percent.Ix, 2), formatNumber(cmp.percent.Iy, 2)]).toEqual(['-0.12', '-0.37']);
  });

  it('the weld load: largest force per length at the flange tips (Blodgett Sect. 7.4 method)', () => {
    const w = ev.welds[0];
    expect(w.message).toBeNull();
    const r = w.result!;
    const L = weld.L, J = weld.Ix + weld.Iy, P = 25;
    const M = -(250 - weld.x) * P; // clockwise, kN·mm
    close(w.moment!, M, 1e-12);
    const at = (x: number, y: number) => {
      const k = M / J;
      return Math.hypot(-k * (y - 75), -P / L + k * (x - weld.x));
    };
    // Candidates by hand: every segment end and the middle of each bend.
    const s2 = Math.SQRT1_2;
    const candidates: [number, number][] = [[75, 153], [9, 153], [-3, 141], [-3, 9], [9, -3], [75, -3], [9 - 12 * s2, 141 + 12 * s2], [9 - 12 * s2, 9 - 12 * s2]];
    const fTip = at(75, 153);
    for (const [x, y] of candidates) expect(at(x, y)).toBeLessThanOrEqual(fTip * (1 + 1e-12));
    close(r.critical.f, fTip, 1e-12); // 0.4597 kN/mm
    expect(formatNumber(r.critical.f)).toBe('0.4597');
    expect([r.critical, ...r.alsoCritical].map((p) => [p.x, p.y]).sort((a, b) => a[1] - b[1])).toEqual([[75, -3], [75, 153]]);
    expect(w.units.perLength).toBe('kN/mm');
  });
});
