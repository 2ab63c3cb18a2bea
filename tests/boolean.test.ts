/**
 * Boolean module: analytic cases against closed forms, degenerate inputs, outline resolution.
 */
import { describe, expect, it } from 'vitest';
import { booleanRegions, resolveOutline } from '../src/boolean';
import { polygonContour, reverseContour, translateRegion, type Contour, type Region } from '../src/geometry/contour';
import { polygonMoments, regionMoments, type RawMoments } from '../src/moments/kernel';
import { circle, plateWithHole, rect, roundedRect, KEYS } from './fixtures/boolean/shapes';

/** Centroidal properties from raw moments. */
function centroidal(m: RawMoments) {
  const A = m.m00, xc = m.m10 / A, yc = m.m01 / A;
  return { A, xc, yc, Ix: m.m02 - A * yc * yc, Iy: m.m20 - A * xc * xc, Ixy: m.m11 - A * xc * yc };
}

function expectRel(actual: number, expected: number, tol: number, scale = Math.abs(expected)): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol * Math.max(scale, 1e-300));
}

function allFinite(r: Region): boolean {
  for (const c of r) {
    for (const v of c.xy) if (!Number.isFinite(v)) return false;
    if (c.bulge) for (const v of c.bulge) if (!Number.isFinite(v) || Math.abs(v) > 1 + 1e-12) return false;
  }
  return true;
}

/** Signed area of one contour (exact kernel). */
function contourArea(c: Contour): number {
  return regionMoments([c]).m00;
}

describe('plate with an off-centre circular hole (difference)', () => {
  // Composite-area method with the parallel-axis theorem (Gere & Goodno, Mechanics of Materials,
  // composite areas; Hibbeler, Statics, composite bodies): A = A1 - A2, each part's centroidal
  // I from the appendix tables (rectangle bh^3/12; circle pi r^4/4, Ixy = 0), shifted to the
  // composite centroid.
  function composite(b: number, h: number, x0: number, y0: number, hx: number, hy: number, r: number) {
    const A1 = b * h, x1 = x0 + b / 2, y1 = y0 + h / 2;
    const A2 = Math.PI * r * r;
    const A = A1 - A2;
    const xc = (A1 * x1 - A2 * hx) / A, yc = (A1 * y1 - A2 * hy) / A;
    const Ix = (b * h ** 3) / 12 + A1 * (y1 - yc) ** 2 - ((Math.PI * r ** 4) / 4 + A2 * (hy - yc) ** 2);
    const Iy = (h * b ** 3) / 12 + A1 * (x1 - xc) ** 2 - ((Math.PI * r ** 4) / 4 + A2 * (hx - xc) ** 2);
    const Ixy = A1 * (x1 - xc) * (y1 - yc) - A2 * (hx - xc) * (hy - yc);
    return { A, xc, yc, Ix, Iy, Ixy };
  }

  const cases: [string, number][] = [['unit', 1], ['0.5 mm part', 5e-4 / 10], ['50 m part', 50 / 10]];
  for (const [name, s] of cases) {
    it(`matches the composite method (${name})`, () => {
      const b = 10 * s, h = 6 * s, x0 = 3 * s, y0 = -2 * s, hx = x0 + 3.2 * s, hy = y0 + 2.1 * s, r = 1.4 * s;
      const out = booleanRegions([rect(x0, y0, x0 + b, y0 + h)], [[circle(hx, hy, r)]], 'difference');
      expect(allFinite(out)).toBe(true);
      const got = centroidal(regionMoments(out));
      const ref = composite(b, h, x0, y0, hx, hy, r);
      const L = 10 * s;
      // Gere & Goodno / Hibbeler composite method, relative 1e-9
      expectRel(got.A, ref.A, 1e-9);
      expectRel(got.xc, ref.xc, 1e-9, L);
      expectRel(got.yc, ref.yc, 1e-9, L);
      expectRel(got.Ix, ref.Ix, 1e-9);
      expectRel(got.Iy, ref.Iy, 1e-9);
      expectRel(got.Ixy, ref.Ixy, 1e-9, Math.abs(ref.Ix));
      // The hole comes back as the exact circle: one CW loop of arcs.
      const holes = out.filter((c) => contourArea(c) < 0);
      expect(holes.length).toBe(1);
      expect(holes[0].bulge).not.toBeNull();
    });
  }
});

/** Circular segment of radius r cut by a chord at distance d from the centre (half-angle alpha). */
function segmentClosedForm(r: number, alpha: number) {
  // Young & Budynas, Roark's Formulas for Stress and Strain (8th ed.), Appendix Table A.1,
  // circular segment; also Gere & Goodno, App. D (from memory of the table row):
  // A = r^2 (a - sin a cos a), centroid 2 r sin^3 a / (3 (a - sin a cos a)) from the centre,
  // I about the diameter parallel to the chord = r^4/4 (a - sin a cos a + 2 sin^3 a cos a),
  // I about the symmetry axis = r^4/12 (3a - 3 sin a cos a - 2 sin^3 a cos a).
  const s = Math.sin(alpha), c = Math.cos(alpha);
  const A = r * r * (alpha - s * c);
  const dbar = (2 * r * s ** 3) / (3 * (alpha - s * c));
  const Ipar = (r ** 4 / 4) * (alpha - s * c + 2 * s ** 3 * c);
  const Isym = (r ** 4 / 12) * (3 * alpha - 3 * s * c - 2 * s ** 3 * c);
  return { A, dbar, Ipar, Isym };
}

describe('circle and half-plane rectangle: circular segment', () => {
  for (const [cx, cy, r, d] of [[0, 0, 1, 0.5], [3.7, -1.2, 2.5, -0.9], [10, 20, 0.3, 0.29]] as const) {
    it(`segment r=${r}, d=${d}`, () => {
      const alpha = Math.acos(d / r);
      const ref = segmentClosedForm(r, alpha);
      const out = booleanRegions([circle(cx, cy, r)], [[rect(cx - 3 * r, cy + d, cx + 3 * r, cy + 3 * r)]], 'intersection');
      const m = regionMoments(out);
      // Roark Table A.1, circular segment
      expectRel(m.m00, ref.A, 1e-9);
      expectRel(m.m10 / m.m00, cx, 1e-9, r);
      expectRel(m.m01 / m.m00 - cy, ref.dbar, 1e-9, r);
      // Second moments about the circle centre's axes (chord parallel to x).
      const Iyy_c = m.m02 - 2 * cy * m.m01 + cy * cy * m.m00; // ∫(y - cy)^2
      const Ixx_c = m.m20 - 2 * cx * m.m10 + cx * cx * m.m00; // ∫(x - cx)^2
      expectRel(Iyy_c, ref.Ipar, 1e-9);
      expectRel(Ixx_c, ref.Isym, 1e-9, ref.Ipar);
    });
  }

  it('the complement (difference) adds up to the full circle', () => {
    const r = 1.3, d = 0.4;
    const C = [circle(0.2, 0.1, r)];
    const H = [rect(-5, 0.1 + d, 5, 5)];
    const seg = regionMoments(booleanRegions(C, [H], 'intersection')).m00;
    const rest = regionMoments(booleanRegions(C, [H], 'difference')).m00;
    // Gere & Goodno App. D: circle A = pi r^2; Roark Table A.1 segment for the cut part
    expectRel(rest, Math.PI * r * r - segmentClosedForm(r, Math.acos(d / r)).A, 1e-9);
    expectRel(seg + rest, Math.PI * r * r, 1e-12);
  });
});

describe('circle and quadrant square: quarter circle', () => {
  // Gere & Goodno, App. D, quarter circle: A = pi r^2/4, centroid 4r/(3pi) from both straight
  // edges, I about each straight edge = pi r^4/16, Ixy about the edges = r^4/8.
  for (const side of [2, 1]) {
    it(`square side ${side}r (side r: corners touch the circle)`, () => {
      const r = 1.7, cx = -0.4, cy = 2.2;
      const out = booleanRegions([circle(cx, cy, r)], [[rect(cx, cy, cx + side * r, cy + side * r)]], 'intersection');
      const m = regionMoments(out);
      const A = (Math.PI * r * r) / 4;
      expectRel(m.m00, A, 1e-9); // Gere & Goodno App. D quarter circle, area
      expectRel(m.m10 / A - cx, (4 * r) / (3 * Math.PI), 1e-9, r); // centroid
      expectRel(m.m01 / A - cy, (4 * r) / (3 * Math.PI), 1e-9, r);
      expectRel(m.m20 - 2 * cx * m.m10 + cx * cx * m.m00, (Math.PI * r ** 4) / 16, 1e-9); // I about edge
      expectRel(m.m02 - 2 * cy * m.m01 + cy * cy * m.m00, (Math.PI * r ** 4) / 16, 1e-9);
      expectRel(m.m11 - cx * m.m01 - cy * m.m10 + cx * cy * m.m00, r ** 4 / 8, 1e-9); // Ixy about edges
      // One loop: two straight edges and the exact arc (same centre and radius).
      expect(out.length).toBe(1);
      const c = out[0];
      const arcs = c.bulge ? Array.from(c.bulge).filter((b) => b !== 0) : [];
      expect(arcs.length).toBeGreaterThanOrEqual(1);
      const sweep = arcs.reduce((s, b) => s + 4 * Math.atan(b), 0);
      expectRel(sweep, Math.PI / 2, 1e-12);
    });
  }
});

describe('two overlapping circles: lens', () => {
  // The lens is two circular segments on the common chord (Roark Table A.1 circular segment,
  // applied to each circle); the chord lies at a = (D^2 + r1^2 - r2^2) / (2D) from centre 1.
  const cases = [[1, 0.8, 1.2], [2, 2, 1], [1, 0.5, 0.9]] as const;
  for (const [r1, r2, D] of cases) {
    it(`r1=${r1}, r2=${r2}, D=${D}`, () => {
      const ox = 0.3, oy = -0.7;
      const a = (D * D + r1 * r1 - r2 * r2) / (2 * D);
      const a1 = Math.acos(a / r1), a2 = Math.acos((D - a) / r2);
      const s1 = segmentClosedForm(r1, a1), s2 = segmentClosedForm(r2, a2);
      const A = s1.A + s2.A;
      const xbar = (s1.A * s1.dbar + s2.A * (D - s2.dbar)) / A; // from centre 1 along the centre line
      const Iaxis = s1.Isym + s2.Isym; // about the centre line
      const out = booleanRegions([circle(ox, oy, r1)], [[circle(ox + D, oy, r2)]], 'intersection');
      const m = regionMoments(out);
      expectRel(m.m00, A, 1e-9); // Roark Table A.1, two segments
      expectRel(m.m10 / m.m00 - ox, xbar, 1e-9, r1);
      expectRel(m.m01 / m.m00, oy, 1e-9, r1);
      expectRel(m.m02 - 2 * oy * m.m01 + oy * oy * m.m00, Iaxis, 1e-9);
      // Union by inclusion-exclusion of the same closed forms (Gere & Goodno App. D circle).
      const u = regionMoments(booleanRegions([circle(ox, oy, r1)], [[circle(ox + D, oy, r2)]], 'union')).m00;
      expectRel(u, Math.PI * (r1 * r1 + r2 * r2) - A, 1e-9);
    });
  }
});

describe('union of two overlapping rectangles', () => {
  it('equals the exact cross-shaped polygon', () => {
    const out = booleanRegions([rect(0, 0, 4, 1)], [[rect(1.5, -1, 2.5, 3)]], 'union');
    // The union traced by hand: exact polygon moments by Green's theorem (Hibbeler, composite:
    // A = A1 + A2 - A12 = 4 + 4 - 1).
    const cross = polygonMoments(Float64Array.from([0, 0, 1.5, 0, 1.5, -1, 2.5, -1, 2.5, 0, 4, 0, 4, 1, 2.5, 1, 2.5, 3, 1.5, 3, 1.5, 1, 0, 1]));
    const m = regionMoments(out);
    expectRel(m.m00, 7, 1e-12);
    for (const k of KEYS) expectRel(m[k], cross[k], 1e-12, 10);
    expect(out.length).toBe(1);
    expect(out[0].xy.length / 2).toBe(12);
  });
});

describe('composite sections built by union', () => {
  it('I-section from two flanges and a web (touching edges)', () => {
    // Hibbeler, Mechanics of Materials, composite I-section: A = 2 b tf + (h - 2 tf) tw,
    // Ix = b h^3/12 - (b - tw)(h - 2 tf)^3/12, Iy = 2 tf b^3/12 + (h - 2 tf) tw^3/12.
    const b = 0.2, h = 0.4, tf = 0.02, tw = 0.012;
    const top = [rect(-b / 2, h / 2 - tf, b / 2, h / 2)];
    const bot = [rect(-b / 2, -h / 2, b / 2, -h / 2 + tf)];
    const web = [rect(-tw / 2, -h / 2 + tf, tw / 2, h / 2 - tf)];
    const out = booleanRegions(web, [top, bot], 'union');
    const c = centroidal(regionMoments(out));
    expectRel(c.A, 2 * b * tf + (h - 2 * tf) * tw, 1e-12);
    expectRel(c.Ix, (b * h ** 3) / 12 - ((b - tw) * (h - 2 * tf) ** 3) / 12, 1e-12);
    expectRel(c.Iy, (2 * tf * b ** 3) / 12 + ((h - 2 * tf) * tw ** 3) / 12, 1e-12);
    expect(out.length).toBe(1);
  });

  it('a row of overlapping equal circles', () => {
    // Only neighbours overlap (r <= D < 2r): A = n pi r^2 - (n - 1) lens, each lens two equal
    // circular segments of half-angle acos(D / 2r) (Gere & Goodno App. D circle; Roark Table A.1
    // circular segment).
    const r = 0.05, D = 0.07, n = 12;
    const circles = Array.from({ length: n }, (_, k) => [circle(0.3 + k * D, -0.2, r)]);
    const out = booleanRegions(circles[0], circles.slice(1), 'union');
    const lens = 2 * segmentClosedForm(r, Math.acos(D / (2 * r))).A;
    expectRel(regionMoments(out).m00, n * Math.PI * r * r - (n - 1) * lens, 1e-10);
    expect(out.length).toBe(1);
    // Every output arc is one of the source circles: its centre and radius come back exactly.
    const c = out[0];
    const nv = c.xy.length / 2;
    for (let i = 0; i < nv; i++) {
      const bl = c.bulge ? c.bulge[i] : 0;
      expect(bl).not.toBe(0);
      const j = (i + 1) % nv;
      const phi = 4 * Math.atan(bl);
      const L = Math.hypot(c.xy[2 * j] - c.xy[2 * i], c.xy[2 * j + 1] - c.xy[2 * i + 1]);
      expectRel(L / (2 * Math.sin(Math.abs(phi) / 2)), r, 1e-9);
    }
  });
});

describe('exact placement', () => {
  it('surviving source vertices keep their exact coordinates; new vertices lie on both carriers', () => {
    // Exactness contract of the module (no external value: bitwise equality with the inputs and
    // the analytic line-circle intersection, Gere & Goodno App. D circle x^2 + y^2 = r^2).
    const a = rect(0.1234567891234, -0.3333333333333, 2.7182818284590, 1.4142135623730);
    const cx = 2.2360679774997, cy = 1.7320508075688, r = 0.9;
    const out = booleanRegions([a], [[circle(cx, cy, r)]], 'union');
    const src = new Set<string>();
    for (const c of [a, circle(cx, cy, r)]) for (let i = 0; i < c.xy.length; i += 2) src.add(`${c.xy[i]},${c.xy[i + 1]}`);
    let kept = 0, cut = 0;
    for (const c of out) {
      for (let i = 0; i < c.xy.length; i += 2) {
        const x = c.xy[i], y = c.xy[i + 1];
        if (src.has(`${x},${y}`)) kept++;
        else {
          cut++;
          // A new vertex: on the circle and on an edge of the rectangle.
          expect(Math.abs(Math.hypot(x - cx, y - cy) - r)).toBeLessThan(1e-15 * 4);
          const onEdge = Math.min(Math.abs(x - 2.7182818284590), Math.abs(y - 1.4142135623730));
          expect(onEdge).toBeLessThan(1e-15 * 4);
        }
      }
    }
    expect(kept).toBeGreaterThanOrEqual(4);
    expect(cut).toBe(2);
  });
});

describe('degenerate inputs never throw or give NaN', () => {
  const sq = (x: number, y: number, s = 1) => [rect(x, y, x + s, y + s)];
  const ops = ['union', 'difference', 'intersection'] as const;
  function run(a: Region, b: Region[]) {
    const res = ops.map((op) => booleanRegions(a, b, op));
    for (const r of res) expect(allFinite(r)).toBe(true);
    return res.map((r) => regionMoments(r));
  }

  it('shared edge: union is the rectangle, intersection empty', () => {
    const [u, d, i] = run(sq(0, 0), [sq(1, 0)]);
    expect(u.m00).toBeCloseTo(2, 12); // exact: two unit squares
    expect(d.m00).toBeCloseTo(1, 12);
    expect(Math.abs(i.m00)).toBeLessThan(1e-12);
    const out = booleanRegions(sq(0, 0), [sq(1, 0)], 'union');
    // Rectangle 2 x 1 (Gere & Goodno App. D rectangle: Iy about its base = b h^3/3)
    expect(regionMoments(out).m02).toBeCloseTo(2 / 3, 12);
  });

  it('partly shared edge and corner touch', () => {
    const [u, , i] = run(sq(0, 0), [sq(1, 0.4)]);
    expect(u.m00).toBeCloseTo(2, 12);
    expect(Math.abs(i.m00)).toBeLessThan(1e-12);
    const [u2, d2, i2] = run(sq(0, 0), [sq(1, 1)]);
    expect(u2.m00).toBeCloseTo(2, 12);
    expect(d2.m00).toBeCloseTo(1, 12);
    expect(Math.abs(i2.m00)).toBeLessThan(1e-12);
  });

  it('coincident shapes (square, circle, filleted rectangle)', () => {
    for (const s of [sq(0, 0), [circle(1, 2, 3)], [roundedRect(0, 0, 5, 2, 0.5)]]) {
      const A = regionMoments(s);
      const [u, d, i] = run(s, [s]);
      for (const k of KEYS) {
        // A ∪ A = A ∩ A = A, A − A = ∅ (set identities)
        expectRel(u[k], A[k], 1e-12, Math.abs(A.m00) * 10);
        expectRel(i[k], A[k], 1e-12, Math.abs(A.m00) * 10);
      }
      expect(Math.abs(d.m00)).toBeLessThan(1e-12 * A.m00);
    }
  });

  it('circle tangent to a square, inside and outside', () => {
    // Inscribed circle: square ∩ circle = circle; square − circle = s^2 − pi r^2 (Gere & Goodno App. D)
    const [u, d, i] = run(sq(-1, -1, 2), [[circle(0, 0, 1)]]);
    expectRel(u.m00, 4, 1e-12);
    expectRel(i.m00, Math.PI, 1e-12);
    expectRel(d.m00, 4 - Math.PI, 1e-12);
    // Touching from outside at one point: union adds, intersection is empty.
    const [u2, , i2] = run(sq(-1, -1, 2), [[circle(2, 0, 1)]]);
    expectRel(u2.m00, 4 + Math.PI, 1e-12);
    expect(Math.abs(i2.m00)).toBeLessThan(1e-12);
  });

  it('zero-length edges and repeated points', () => {
    const dup = polygonContour([[0, 0], [0, 0], [2, 0], [2, 0], [2, 1], [0, 1], [0, 0]]);
    const [u, d, i] = run([dup], [sq(1, 0)]);
    expectRel(u.m00, 2, 1e-12); // exact: 2 x 1 rectangle
    expectRel(d.m00, 1, 1e-12);
    expectRel(i.m00, 1, 1e-12);
    // Bulge on a zero-length edge, a contour of one point, empty inputs.
    const odd: Contour = { xy: Float64Array.of(0, 0, 0, 0, 1, 0, 1, 1), bulge: Float64Array.of(0.5, 0, 0, 0) };
    run([odd], [[{ xy: Float64Array.of(3, 3), bulge: null }]]);
    run([], [sq(0, 0)]);
    run(sq(0, 0), []);
    run([{ xy: Float64Array.of(0, 0, 1, 0), bulge: null }], [sq(0, 0)]);
  });

  it('tiny and huge scales keep full relative accuracy', () => {
    for (const s of [5e-4, 5e4]) {
      const A = [roundedRect(0, 0, 2 * s, s, 0.2 * s)];
      const B = translateRegion([circle(0, 0, 0.7 * s)], 1.6 * s, 0.9 * s);
      const [u, , i] = run(A, [B]);
      const mA = regionMoments(A), mB = regionMoments(B);
      for (const k of KEYS) {
        // additivity, exact identity (REFERENCES.md "Exact identities")
        const scale = Math.pow(2 * s, k === 'm00' ? 2 : k === 'm10' || k === 'm01' ? 3 : 4);
        expectRel(u[k] + i[k], mA[k] + mB[k], 1e-9, scale);
      }
    }
  });

  it('far offset from the origin', () => {
    const off = 1e6;
    const out = booleanRegions(translateRegion(plateWithHole(0, 0, 4, 2, 1, 1, 0.5), off, -off), [], 'union');
    expectRel(regionMoments(out).m00, 8 - Math.PI * 0.25, 1e-9); // composite method: plate minus hole
    const d = booleanRegions(translateRegion([rect(0, 0, 4, 2)], off, -off), [translateRegion([circle(1, 1, 0.5)], off, -off)], 'difference');
    expectRel(regionMoments(d).m00, 8 - Math.PI * 0.25, 1e-9); // Gere & Goodno composite area
  });
});

describe('resolveOutline', () => {
  it('bow-tie resolves into two triangles and reports the crossing', () => {
    const { region, selfIntersecting } = resolveOutline([polygonContour([[0, 0], [2, 2], [2, 0], [0, 2]])]);
    expect(selfIntersecting).toBe(true);
    // Two triangles of base 2 and height 1 (A = bh/2 each).
    expectRel(regionMoments(region).m00, 2, 1e-12);
    for (const c of region) expect(contourArea(c)).toBeGreaterThan(0);
  });

  it('normalises a clockwise outline without a warning', () => {
    const cw = reverseContour(roundedRect(0, 0, 3, 2, 0.4));
    const { region, selfIntersecting } = resolveOutline([cw]);
    expect(selfIntersecting).toBe(false);
    // Rectangle minus four corner spandrels (Gere & Goodno App. D: spandrel A = (1 - pi/4) r^2).
    expectRel(regionMoments(region).m00, 6 - 4 * (1 - Math.PI / 4) * 0.16, 1e-12);
  });

  it('even-odd: a nested loop of either winding becomes a hole', () => {
    const { region, selfIntersecting } = resolveOutline([circle(0, 0, 2), circle(0.3, 0, 1)]);
    expect(selfIntersecting).toBe(false);
    expectRel(regionMoments(region).m00, Math.PI * (4 - 1), 1e-12); // circle A = pi r^2 (Gere & Goodno)
    expect(region.filter((c) => contourArea(c) < 0).length).toBe(1);
  });

  it('overlapping loops: the overlap drops out and the warning is raised', () => {
    const { region, selfIntersecting } = resolveOutline([rect(0, 0, 2, 2), rect(1, 1, 3, 3)]);
    expect(selfIntersecting).toBe(true);
    expectRel(regionMoments(region).m00, 8 - 2, 1e-12); // even-odd: 4 + 4 − 2·1
  });

  it('an arc that crosses the outline', () => {
    // Rectangle 2 x 0.8 whose top edge is a half-circle (r = 1, centre (1, 0.8)) dipping below
    // the bottom edge. Even-odd: rectangle − (half-disc − segment below y = 0) + that segment,
    // the segment from Roark Table A.1 (r = 1, chord at d = 0.8).
    const c: Contour = { xy: Float64Array.of(0, 0, 2, 0, 2, 0.8, 0, 0.8), bulge: Float64Array.of(0, 0, -1, 0) };
    const { region, selfIntersecting } = resolveOutline([c]);
    expect(selfIntersecting).toBe(true);
    const seg = segmentClosedForm(1, Math.acos(0.8)).A;
    expectRel(regionMoments(region).m00, 1.6 - Math.PI / 2 + 2 * seg, 1e-12);
    expect(allFinite(region)).toBe(true);
  });
});
