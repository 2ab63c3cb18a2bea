/**
 * Regressions named after the defects of the scale-and-precision issue: each input below once
 * gave a wrong or empty section.
 *
 * Sources: Roark's Formulas for Stress and Strain (Young & Budynas, 7th ed.), Table A.1 (hollow
 * circle; circular segment; regular polygon with n sides, I = A(6R² − a²)/24 about any centroidal
 * axis, from memory); Gere & Goodno, Mechanics of Materials, Appendix E (rectangle, circular
 * segment). Where a published closed form cancels for thin slivers, its value was evaluated once
 * with 60-digit arithmetic (mpmath) and is quoted below with the form it came from.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { booleanRegions, resolveOutline } from '../src/boolean';
import { circleContour, contourFrom, polygonContour, reverseContour, type Region } from '../src/geometry/contour';
import { regionMoments } from '../src/moments/kernel';
import { sectionProperties } from '../src/properties/section';
import { evaluateDocument, type SectionDocument } from '../src';
import { close, worst } from './helpers';

const TOL = 1e-9;
const PI = Math.PI;

function vertexCount(r: Region): number {
  return r.reduce((s, c) => s + (c.xy.length >> 1), 0);
}

describe('far from the origin', () => {
  it('the 10 × 2 rectangle at (1e6, 1e6) and at (1e8, 1e8) keeps Ix = bh³/12', () => {
    // Gere & Goodno, App. E, case 1. Once: Ix = 6.66797 at 1e6 and −32 (or 0) at 1e8.
    for (const off of [1e6, 1e8]) {
      const p = sectionProperties([polygonContour([[off, off], [off + 10, off], [off + 10, off + 2], [off, off + 2]])]);
      close(p.Ix, (10 * 8) / 12, TOL);
      close(p.Iy, (2 * 1000) / 12, TOL);
      close(p.Ixy, 0, TOL, p.J0);
      close(p.Zx, (10 * 4) / 4, TOL); // Gere & Goodno, plastic modulus bh²/4
    }
  });

  it('the lens of two r = 10 circles overlapping by 1e-5 keeps its Iy (thin-sliver cancellation)', () => {
    // Two circular segments back to back (Roark Table A.1, circular segment; about the chord by
    // the parallel-axis theorem), 60-digit values for D = 19.99999 (the double nearest):
    // A = 1.3333332332576134446e-7, Ix = 2.6666659521286024181e-12, Iy = 7.6190473005777535037e-19.
    // Once: Iy off by 4e-3.
    const lens = booleanRegions([circleContour(0, 0, 10)], [[circleContour(20 - 1e-5, 0, 10)]], 'intersection');
    const p = sectionProperties(lens);
    close(p.area, Number('1.3333332332576134446e-7'), TOL);
    close(p.Ix, Number('2.6666659521286024181e-12'), TOL);
    close(p.Iy, Number('7.6190473005777535037e-19'), TOL);
  });
});

describe('a small part far from a large one', () => {
  // An invented bracket near the origin (an L of two plates with a bolt hole) and a 1 × 1
  // square typed at (5e7, 5e7). Once: the square added 0.5 or 1.23 to A depending on the shape
  // order (sums about one point near the bracket), and 0 when it went through the grid with the
  // bracket (a later intersect shape): the grid step was 0.625 there and a sliver filter of
  // 4 grid cells dropped it. Composite area (Gere & Goodno): the square adds exactly 1, and its
  // own Ix = bh³/12 = 1/12.
  const bracket: SectionDocument['shapes'] = [
    { id: 'web', type: 'rectangle', at: [0, 0], width: 12, height: 150 },
    { id: 'flange', type: 'rectangle', at: [0, 0], width: 90, height: 10 },
    { id: 'bolt', type: 'circle', center: [50, 5], radius: 3, op: 'subtract' },
  ];
  const square = { id: 'far', type: 'rectangle' as const, at: [5e7, 5e7] as [number, number], width: 1, height: 1 };
  const keep = { id: 'keep', type: 'rectangle' as const, at: [-1e3, -1e3] as [number, number], width: 6e7, height: 6e7, op: 'intersect' as const };
  const doc = (shapes: SectionDocument['shapes']): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes });
  const areaOf = (shapes: SectionDocument['shapes']) => evaluateDocument(doc(shapes)).props!.area;
  it('adds exactly its own area in any order and through an intersect run', () => {
    const base = areaOf(bracket);
    close(areaOf([...bracket, square]) - base, 1, 1e-9);
    close(areaOf([square, ...bracket]) - base, 1, 1e-9);
    close(areaOf([...bracket, square, keep]) - areaOf([...bracket, keep]), 1, 1e-9);
    const p = evaluateDocument(doc([square])).props!;
    close(p.Ix, 1 / 12, 1e-9);
    close(p.Zx, 1 / 4, 1e-9);
  });
});

describe('vertices of different loops', () => {
  it('a hole 2e-8·r from its outer circle keeps its own vertices (merged vertices of different loops)', () => {
    // Roark Table A.1, hollow circle, with the hole off centre (composite area, parallel-axis
    // theorem). Once: 2.7e-8 off in area, the hole's vertex moved onto the outer circle.
    for (const gap of [2e-8, 3e-9, 1e-7]) {
      const r = 1, ri = 0.5, hx = r - ri - gap;
      const out = booleanRegions([circleContour(0, 0, r)], [[circleContour(hx, 0, ri)]], 'difference');
      const p = sectionProperties(out);
      const A1 = PI * r * r, A2 = PI * ri * ri;
      close(p.area, A1 - A2, TOL);
      const xb = (-A2 * hx) / (A1 - A2);
      close(p.centroid.x, xb, TOL, 1);
      close(p.Iy, (PI * r ** 4) / 4 + A1 * xb * xb - ((PI * ri ** 4) / 4 + A2 * (hx - xb) ** 2), TOL);
      close(p.Ix, (PI * (r ** 4 - ri ** 4)) / 4, TOL);
    }
  });

  it('the same hole while a cut through the outer circle sends every loop through the grid', () => {
    // Cutting the segment x < −0.9 off the outer circle makes it meet another loop, so the
    // hole's loop goes through clipper too; its vertex must still not move onto the outer
    // circle's vertex at the same grid point. Circular segment of half-angle α = acos(0.9):
    // A = r²(α − sinα cosα) (Roark Table A.1).
    const r = 1, ri = 0.5, gap = 2e-8, hx = r - ri - gap;
    const cut = polygonContour([[-2, -2], [-0.9, -2], [-0.9, 2], [-2, 2]]);
    const out = booleanRegions([circleContour(0, 0, r)], [[circleContour(hx, 0, ri)], [cut]], 'difference');
    const alpha = Math.acos(0.9);
    close(regionMoments(out).m00, PI * r * r - PI * ri * ri - (alpha - Math.sin(alpha) * Math.cos(alpha)), TOL);
  });

  it('two loops of one union that round to one grid point stay apart', () => {
    // A ring (R = 1, r = 0.5) and a disc of r = 0.5 − 2e-8 in its hole: they do not touch, so
    // the union is the three loops as they are (Roark Table A.1, hollow circle plus solid circle).
    const ring: Region = [circleContour(0, 0, 1), reverseContour(circleContour(0, 0, 0.5))];
    const disc = circleContour(0.3e-8, 0, 0.5 - 2e-8);
    const out = booleanRegions(ring, [[disc]], 'union');
    close(regionMoments(out).m00, PI * (1 - 0.25) + PI * (0.5 - 2e-8) ** 2, TOL);
  });
});

describe('every input vertex kept', () => {
  it('a dense regular polygon keeps every vertex and its exact area (dropped collinear vertices)', () => {
    // Roark Table A.1, regular polygon of n sides with circumradius R: A = n R² sin(2π/n)/2,
    // polar moment J = A(6R² − a²)/12 with side a = 2R sin(π/n). Once: 40 040 of 50 000 vertices
    // kept and an area off by 3e-9.
    const n = 50000, R = 100;
    const xy = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) {
      xy[2 * i] = R * Math.cos((2 * PI * i) / n);
      xy[2 * i + 1] = R * Math.sin((2 * PI * i) / n);
    }
    const out = resolveOutline([contourFrom(xy)]).region;
    expect(vertexCount(out)).toBe(n);
    const p = sectionProperties(out);
    const A = (n * R * R * Math.sin((2 * PI) / n)) / 2, a = 2 * R * Math.sin(PI / n);
    close(p.area, A, 1e-12);
    close(p.J0, (A * (6 * R * R - a * a)) / 12, 1e-12);
  });

  it('near-collinear vertices of a union keep their places (no invented corner)', () => {
    // A comb of vertices 1e-9 off a straight line, united with a square that touches nothing of
    // it: every comb vertex comes back exactly, and the area is the shoelace area of the input.
    const pts: [number, number][] = [];
    const m = 400;
    for (let i = 0; i <= m; i++) pts.push([i / m, i % 2 === 0 ? 0 : 1e-9]);
    pts.push([1, 1], [0, 1]);
    const comb = polygonContour(pts);
    const out = booleanRegions([comb], [[polygonContour([[0.25, 0.5], [0.75, 0.5], [0.75, 2], [0.25, 2]])]], 'union');
    const got = new Set<string>();
    for (const c of out) for (let i = 0; i < c.xy.length; i += 2) got.add(`${c.xy[i]},${c.xy[i + 1]}`);
    for (const [x, y] of pts.slice(0, m + 1)) expect(got.has(`${x},${y}`), `vertex (${x}, ${y})`).toBe(true);
    // Shoelace (Gere & Goodno composite areas): comb area plus the square's part above y = 1.
    close(regionMoments(out).m00, regionMoments([comb]).m00 + 0.5 * 1, 1e-12);
  });
});

describe('edges shorter than the grid', () => {
  it('a zigzag of 1e-9 edges inside one grid cell comes back vertex for vertex (collapsed vertices restored)', () => {
    // A unit square whose bottom edge carries 41 vertices 2.5e-9 apart, alternately 1e-10 below
    // the edge, united with a rectangle that overlaps the square: the zigzag is far below the
    // grid (1/4e7 of the extent) and must come back as drawn. Area by the shoelace formula
    // (Gere & Goodno, composite areas): the square's own area plus the rectangle's part outside it.
    const pts: [number, number][] = [[0, 0]];
    for (let i = 0; i <= 40; i++) pts.push([0.5 + i * 2.5e-9, i % 2 === 1 ? -1e-10 : 0]);
    pts.push([1, 0], [1, 1], [0, 1]);
    const sq = polygonContour(pts);
    const out = booleanRegions([sq], [[polygonContour([[0.8, 0.2], [1.5, 0.2], [1.5, 0.6], [0.8, 0.6]])]], 'union');
    const got = new Set<string>();
    for (const c of out) for (let i = 0; i < c.xy.length; i += 2) got.add(`${c.xy[i]},${c.xy[i + 1]}`);
    for (const [x, y] of pts) expect(got.has(`${x},${y}`), `vertex (${x}, ${y})`).toBe(true);
    close(regionMoments(out).m00, regionMoments([sq]).m00 + 0.5 * 0.4, 1e-13);
  });
});

describe('below what the grid resolves', () => {
  it('two rectangles overlapping by 2e-9 of their size keep the sliver between them', () => {
    // Rectangle areas (Gere & Goodno App. E, case 1): the overlap is a 2e-9 × 0.5 sliver, far
    // below the default grid (1/4e7 of the extent); the union and difference add up around it.
    const a = polygonContour([[0, 0], [1, 0], [1, 1], [0, 1]]);
    const b = polygonContour([[1 - 2e-9, 0.25], [2, 0.25], [2, 0.75], [1 - 2e-9, 0.75]]);
    const w = 1 - (1 - 2e-9); // the overlap's width as the doubles hold it
    close(regionMoments(booleanRegions([a], [[b]], 'intersection')).m00, w * 0.5, TOL);
    close(regionMoments(booleanRegions([a], [[b]], 'union')).m00, 1 + 0.5 * (1 + 2e-9) - w * 0.5, 1e-15);
    close(regionMoments(booleanRegions([a], [[b]], 'difference')).m00, 1 - w * 0.5, 1e-15);
  });

  it('a very flat arc closed by its chord keeps its area (the flat arc that vanished)', () => {
    // Circular segment (Roark Table A.1) of half-angle α on a chord L: A = r²(α − sinα cosα)
    // = r²(2α − sin 2α)/2, r = L/(2 sin α); for α = 2e-6 the series (2α)³/6 − (2α)⁵/120 is exact.
    const L = 1, alpha = 2e-6;
    const r = L / (2 * Math.sin(alpha));
    const A = (r * r * ((2 * alpha) ** 3 / 6 - (2 * alpha) ** 5 / 120)) / 2;
    const flat = contourFrom([0, 0, L, 0], [Math.tan(-alpha / 2), 0]); // bulges below the chord: CCW
    const out = resolveOutline([flat]).region;
    expect(out.length).toBe(1);
    close(regionMoments(out).m00, A, TOL);
    // The same drawn as a document path with a three-point arc: reported, not "empty".
    const sag = (L / 2) * Math.tan(alpha / 2);
    const doc: SectionDocument = {
      format: 'kern-section', version: 2, units: 'mm',
      shapes: [{ id: 's', type: 'path', start: [0, 0], segments: [{ to: [L, 0], via: [L / 2, -sag] }, { to: [0, 0] }] }],
    };
    // Touching a square at its end (so it goes through the grid with it): still there.
    const withSquare = booleanRegions([flat], [[polygonContour([[L, 0], [L + 1, 0], [L + 1, 1], [L, 1]])]], 'union');
    close(regionMoments(withSquare).m00, A + 1, 1e-15);
    close(regionMoments(withSquare.filter((c) => c.xy.length === 4)).m00, A, TOL);
    const ev = evaluateDocument(doc);
    expect(ev.props, ev.message ?? '').not.toBeNull();
    close(ev.props!.area, A, 1e-6); // the via point is rounded: 1e-6 is its own precision
  });

  it('two circles overlapping by 1e-9 of their radius intersect in a lens (the tiny lens reported empty)', () => {
    // Two circular segments back to back (Roark Table A.1), 60-digit value for r = 10,
    // D = 19.99999999 (the double nearest): A = 4.2163707365376757113e-12.
    const lens = booleanRegions([circleContour(0, 0, 10)], [[circleContour(20 - 1e-8, 0, 10)]], 'intersection');
    expect(lens.length).toBe(1);
    close(regionMoments(lens).m00, Number('4.2163707365376757113e-12'), TOL);
    // The same with each circle drawn from its top point, so that no vertex lies in the lens:
    // the lens is then two single chords on one pair of nodes (a digon) for clipper.
    const fromTop = (cx: number, r: number) => contourFrom([cx, r, cx, -r], [1, 1]);
    const lens2 = booleanRegions([fromTop(0, 10)], [[fromTop(20 - 1e-8, 10)]], 'intersection');
    close(regionMoments(lens2).m00, Number('4.2163707365376757113e-12'), TOL);
    const rest2 = booleanRegions([fromTop(0, 10)], [[fromTop(20 - 1e-8, 10)]], 'difference');
    close(regionMoments(rest2).m00, PI * 100 - Number('4.2163707365376757113e-12'), 1e-14);
    // And the difference keeps the full circle less exactly that lens.
    const rest = booleanRegions([circleContour(0, 0, 10)], [[circleContour(20 - 1e-8, 0, 10)]], 'difference');
    close(regionMoments(rest).m00, PI * 100 - Number('4.2163707365376757113e-12'), 1e-14);
  });
});

afterAll(() => {
  console.log(`precision-regressions: largest relative error ${worst.value.toExponential(2)}`);
});
