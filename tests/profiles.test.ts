/**
 * Parametric profiles (src/document/profiles.ts): outlines checked through the exact moment
 * kernel against closed forms, composite-area sums and a published rolled-shape table.
 *
 * Closed-form building blocks used throughout (the composite-area method of Hibbeler,
 * Mechanics of Materials, ch. 10 / Statics, ch. 10: add and subtract simple parts, each moved by
 * the parallel-axis theorem):
 * - rectangle: A = bh, centroidal I = bh³/12 (Gere & Goodno, Mechanics of Materials, App. E,
 *   rectangle);
 * - quarter circle of radius r: A = πr²/4, centroid 4r/(3π) from each straight edge,
 *   I about each straight edge = πr⁴/16, product of inertia about the two straight edges = r⁴/8
 *   (Gere & Goodno, App. E, quarter circle);
 * - spandrel (the area between a quarter circle and its square, i.e. one fillet): square minus
 *   quarter circle, which gives A = (1 − π/4)r² and I about an edge through the corner
 *   = (1 − 5π/16)r⁴ (Gere & Goodno, App. E, quarter-circular spandrel; Roark, Table A.1).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  PROFILE_DEFAULTS,
  PROFILE_FIELDS,
  ProfileError,
  profileToPaths,
  validateProfile,
  type ProfileType,
} from '../src';
import type { IShape, PathShape, ProfileShape } from '../src';
import { type Contour } from '../src/geometry/contour';
import { pathContour } from '../src';
import { regionMoments, type RawMoments } from '../src/moments/kernel';

// ---------------------------------------------------------------------------------------------
// Helpers: path -> contour, moments, closed forms.

/** PathShape to Contour, as the engine builds it. */
const pathToContour = (p: PathShape): Contour => pathContour(p.start, p.segments);

function profileMoments(shape: ProfileShape): RawMoments {
  const { outer, holes } = profileToPaths(shape);
  return regionMoments([outer, ...holes].map(pathToContour));
}

const signedArea = (p: PathShape) => regionMoments([pathToContour(p)]).m00;

interface Centroidal {
  A: number;
  xc: number;
  yc: number;
  Ix: number;
  Iy: number;
  Ixy: number;
}
function centroidal(m: RawMoments): Centroidal {
  const A = m.m00, xc = m.m10 / A, yc = m.m01 / A;
  return { A, xc, yc, Ix: m.m02 - A * yc * yc, Iy: m.m20 - A * xc * xc, Ixy: m.m11 - A * xc * yc };
}

const Z: RawMoments = { m00: 0, m10: 0, m01: 0, m20: 0, m02: 0, m11: 0 };
function sum(...parts: [number, RawMoments][]): RawMoments {
  const out = { ...Z };
  for (const [s, m] of parts) for (const k of Object.keys(out) as (keyof RawMoments)[]) out[k] += s * m[k];
  return out;
}

/** Rectangle [x0, x1] × [y0, y1]: bh³/12 about its centroid plus the parallel-axis terms. */
function rect(x0: number, y0: number, x1: number, y1: number): RawMoments {
  const b = x1 - x0, h = y1 - y0, A = b * h, xc = (x0 + x1) / 2, yc = (y0 + y1) / 2;
  return { m00: A, m10: A * xc, m01: A * yc, m20: (h * b ** 3) / 12 + A * xc * xc, m02: (b * h ** 3) / 12 + A * yc * yc, m11: A * xc * yc };
}

/**
 * Quarter disk of radius r centred at (cx, cy), lying in the quadrant (sx, sy) ∈ {±1}² from its
 * centre. About its straight edges: ∫u = ∫v = r³/3, ∫u² = ∫v² = πr⁴/16, ∫uv = r⁴/8.
 */
function quarterDisk(cx: number, cy: number, r: number, sx: number, sy: number): RawMoments {
  const A = (Math.PI * r * r) / 4, Q = r ** 3 / 3, I = (Math.PI * r ** 4) / 16, P = r ** 4 / 8;
  return {
    m00: A,
    m10: cx * A + sx * Q,
    m01: cy * A + sy * Q,
    m20: cx * cx * A + 2 * cx * sx * Q + I,
    m02: cy * cy * A + 2 * cy * sy * Q + I,
    m11: cx * cy * A + cx * sy * Q + cy * sx * Q + sx * sy * P,
  };
}

/** Spandrel with its sharp corner at (px, py), reaching r into the quadrant (sx, sy). */
function spandrel(px: number, py: number, r: number, sx: number, sy: number): RawMoments {
  const sq = rect(Math.min(px, px + sx * r), Math.min(py, py + sy * r), Math.max(px, px + sx * r), Math.max(py, py + sy * r));
  return sum([1, sq], [-1, quarterDisk(px + sx * r, py + sy * r, r, -sx, -sy)]);
}

/** Rectangle with all four corners rounded by r: rectangle minus four spandrels. */
function roundedRect(x0: number, y0: number, x1: number, y1: number, r: number): RawMoments {
  if (r === 0) return rect(x0, y0, x1, y1);
  return sum(
    [1, rect(x0, y0, x1, y1)],
    [-1, spandrel(x0, y0, r, 1, 1)],
    [-1, spandrel(x1, y0, r, -1, 1)],
    [-1, spandrel(x1, y1, r, -1, -1)],
    [-1, spandrel(x0, y1, r, 1, -1)],
  );
}

/** Largest relative difference over the six raw moments, each measured against its own scale. */
function momentError(got: RawMoments, want: RawMoments): number {
  const s0 = Math.abs(want.m00);
  const s2 = Math.max(Math.abs(want.m20), Math.abs(want.m02));
  const s1 = Math.max(Math.abs(want.m10), Math.abs(want.m01), Math.sqrt(s0 * s2));
  const scale: Record<keyof RawMoments, number> = { m00: s0, m10: s1, m01: s1, m20: s2, m02: s2, m11: s2 };
  let e = 0;
  for (const k of Object.keys(scale) as (keyof RawMoments)[]) e = Math.max(e, Math.abs(got[k] - want[k]) / scale[k]);
  return e;
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// ---------------------------------------------------------------------------------------------

describe('rectangle', () => {
  it('matches bh³/12 about its centroid', () => {
    const c = centroidal(profileMoments({ id: 'r', type: 'rectangle', at: [0, 0], width: 120, height: 30 }));
    // Gere & Goodno, App. E, rectangle: A = bh, Ix = bh³/12, Iy = hb³/12, Ixy = 0 about centroid.
    expect(rel(c.A, 120 * 30)).toBeLessThan(1e-14);
    expect(rel(c.Ix, (120 * 30 ** 3) / 12)).toBeLessThan(1e-12);
    expect(rel(c.Iy, (30 * 120 ** 3) / 12)).toBeLessThan(1e-12);
    expect(Math.abs(c.Ixy)).toBeLessThan(1e-9 * c.Iy);
    // Local origin at the bottom-left corner (types.ts): centroid at (b/2, h/2).
    expect(c.xc).toBeCloseTo(60, 10);
    expect(c.yc).toBeCloseTo(15, 10);
  });

  it('with corner radii matches rectangle minus four spandrels', () => {
    for (const r of [0, 3, 10, 15]) {
      const m = profileMoments({ id: 'r', type: 'rectangle', at: [0, 0], width: 80, height: 30, cornerRadius: r });
      // Composite method (Hibbeler) with the spandrel of Gere & Goodno, App. E.
      expect(momentError(m, roundedRect(0, 0, 80, 30, r))).toBeLessThan(1e-12);
      // Spandrel area (1 − π/4)r² (Gere & Goodno, App. E, quarter-circular spandrel).
      expect(rel(m.m00, 80 * 30 - 4 * (1 - Math.PI / 4) * r * r)).toBeLessThan(1e-13);
    }
  });

  it('a square with radius half its side is a circle of that radius', () => {
    const c = centroidal(profileMoments({ id: 'r', type: 'rectangle', at: [0, 0], width: 40, height: 40, cornerRadius: 20 }));
    // Roark, Table A.1, solid circle: A = πr², I = πr⁴/4.
    expect(rel(c.A, Math.PI * 400)).toBeLessThan(1e-13);
    expect(rel(c.Ix, (Math.PI * 20 ** 4) / 4)).toBeLessThan(1e-12);
    const { outer } = profileToPaths({ id: 'r', type: 'rectangle', at: [0, 0], width: 40, height: 40, cornerRadius: 20 });
    // No zero-length straight pieces between the touching arcs: four quarter arcs only.
    expect(outer.segments.length).toBe(4);
    expect(outer.segments.every((s) => s.via)).toBe(true);
  });
});

/** I-beam composite: two flange rectangles, the web, and four root spandrels. */
function iBeamComposite(d: number, b: number, tf: number, tw: number, r: number): RawMoments {
  const xl = b / 2 - tw / 2, xr = b / 2 + tw / 2;
  const parts: [number, RawMoments][] = [
    [1, rect(0, 0, b, tf)],
    [1, rect(0, d - tf, b, d)],
    [1, rect(xl, tf, xr, d - tf)],
  ];
  if (r > 0)
    parts.push(
      [1, spandrel(xr, tf, r, 1, 1)],
      [1, spandrel(xr, d - tf, r, 1, -1)],
      [1, spandrel(xl, d - tf, r, -1, -1)],
      [1, spandrel(xl, tf, r, -1, 1)],
    );
  return sum(...parts);
}

describe('i-beam', () => {
  const ibeam = (d: number, b: number, tf: number, tw: number, r: number): ProfileShape => ({
    id: 'i',
    type: 'i-beam',
    at: [0, 0],
    depth: d,
    flangeWidth: b,
    flangeThickness: tf,
    webThickness: tw,
    rootRadius: r,
  });

  it('without fillets equals three rectangles', () => {
    const m = profileMoments(ibeam(250, 120, 12, 8, 0));
    // Hibbeler, composite areas: flanges + web, each bh³/12 + A·d².
    expect(momentError(m, iBeamComposite(250, 120, 12, 8, 0))).toBeLessThan(1e-12);
    const c = centroidal(m);
    const Ix = 2 * ((120 * 12 ** 3) / 12 + 120 * 12 * (125 - 6) ** 2) + (8 * 226 ** 3) / 12;
    expect(rel(c.Ix, Ix)).toBeLessThan(1e-12); // same sum written out (Hibbeler composite method)
    // Zero root radius: sharp corners, twelve straight sides, no arcs.
    const { outer } = profileToPaths(ibeam(250, 120, 12, 8, 0));
    expect(outer.segments.length).toBe(12);
    expect(outer.segments.some((s) => s.via)).toBe(false);
  });

  it('each root fillet adds exactly one spandrel r²(1 − π/4)', () => {
    for (const r of [5, 20, 56]) {
      const m0 = profileMoments(ibeam(250, 120, 12, 8, 0));
      const m = profileMoments(ibeam(250, 120, 12, 8, r));
      // Gere & Goodno, App. E, quarter-circular spandrel: A = (1 − π/4)r²; four root fillets.
      expect(rel(m.m00 - m0.m00, 4 * r * r * (1 - Math.PI / 4))).toBeLessThan(1e-11);
      // Full composite (Hibbeler) with spandrels for every moment.
      expect(momentError(m, iBeamComposite(250, 120, 12, 8, r))).toBeLessThan(1e-12);
    }
  });

  it('fillets filling the whole outstand leave no zero-length pieces', () => {
    // r = (b − tw)/2 = 56: the fillet meets the flange tip, so each flange inner face vanishes.
    const { outer } = profileToPaths(ibeam(250, 120, 12, 8, 56));
    for (let k = 0, p = outer.start; k < outer.segments.length; p = outer.segments[k].to, k++) {
      const q = outer.segments[k].to;
      expect(Math.hypot(q[0] - p[0], q[1] - p[1])).toBeGreaterThan(1e-6);
    }
  });

  // EN 10365 dimensions; tabulated properties as printed in European section tables (e.g. the
  // ArcelorMittal sales programme), which include the root fillets. Values from memory, checked
  // against the steelcalculator.app IPE reference page (A 53.8 cm², Iy 8356 cm⁴, iz 3.35 cm).
  // Tolerance 0.1 %: the tables are rounded to four significant figures (at most 0.05 %); the
  // root fillets alone add 3.6 % to the area of an IPE 300, so leaving them out would fail.
  const tables = [
    // name, h, b, tw, tf, r (mm); A (cm²), Iy (cm⁴), Iz (cm⁴)
    ['IPE 300', 300, 150, 7.1, 10.7, 15, 53.81, 8356, 603.8],
    ['IPE 200', 200, 100, 5.6, 8.5, 12, 28.48, 1943, 142.4],
    ['HEB 300', 300, 300, 11, 19, 27, 149.1, 25170, 8563],
    ['HEA 300', 290, 300, 8.5, 14, 27, 112.5, 18260, 6310],
  ] as const;
  for (const [name, h, b, tw, tf, r, A, Iy, Iz] of tables) {
    it(`${name} matches its tabulated A, Iy, Iz within 0.1 % (EN 10365 dimensions, r = ${r} mm)`, () => {
      const c = centroidal(profileMoments(ibeam(h, b, tf, tw, r)));
      // Tabulated Iy is about the strong axis (our horizontal x axis), Iz about the web axis.
      expect(rel(c.A / 1e2, A)).toBeLessThan(1e-3);
      expect(rel(c.Ix / 1e4, Iy)).toBeLessThan(1e-3);
      expect(rel(c.Iy / 1e4, Iz)).toBeLessThan(1e-3);
    });
  }
});

describe('channel, angle, tee (composite with spandrels)', () => {
  it('channel: web on the left, flanges to the right', () => {
    const [d, b, tf, tw, r] = [200, 75, 11.5, 8.5, 12];
    const m = profileMoments({ id: 'c', type: 'channel', at: [0, 0], depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r });
    // Hibbeler composite: two flanges + web, plus two root spandrels (Gere & Goodno, App. E).
    const want = sum(
      [1, rect(0, 0, b, tf)],
      [1, rect(0, d - tf, b, d)],
      [1, rect(0, tf, tw, d - tf)],
      [1, spandrel(tw, tf, r, 1, 1)],
      [1, spandrel(tw, d - tf, r, 1, -1)],
    );
    expect(momentError(m, want)).toBeLessThan(1e-12);
    const c = centroidal(m);
    const A = 2 * b * tf + tw * (d - 2 * tf) + 2 * (1 - Math.PI / 4) * r * r;
    expect(rel(c.A, A)).toBeLessThan(1e-13);
    // Centroid on the symmetry axis y = d/2; x̄ from Σ A·x̄ / Σ A with the spandrel centroid
    // (10 − 3π)r / (3(4 − π)) from its corner (Gere & Goodno, App. E).
    const e = ((10 - 3 * Math.PI) * r) / (3 * (4 - Math.PI));
    const Qy = 2 * b * tf * (b / 2) + tw * (d - 2 * tf) * (tw / 2) + 2 * (1 - Math.PI / 4) * r * r * (tw + e);
    expect(rel(c.xc, Qy / A)).toBeLessThan(1e-12);
    expect(rel(c.yc, d / 2)).toBeLessThan(1e-13);
    expect(Math.abs(c.Ixy)).toBeLessThan(1e-10 * c.Ix);
  });

  it('angle: area, centroid and the sign of the product of inertia', () => {
    const [lv, lh, t, r] = [150, 90, 10, 12];
    const m = profileMoments({ id: 'a', type: 'angle', at: [0, 0], legVertical: lv, legHorizontal: lh, thickness: t, rootRadius: r });
    // Hibbeler composite: the two legs plus one root spandrel (Gere & Goodno, App. E).
    const want = sum([1, rect(0, 0, lh, t)], [1, rect(0, t, t, lv)], [1, spandrel(t, t, r, 1, 1)]);
    expect(momentError(m, want)).toBeLessThan(1e-12);
    const c = centroidal(m);
    const As = (1 - Math.PI / 4) * r * r, e = ((10 - 3 * Math.PI) * r) / (3 * (4 - Math.PI));
    const A = lh * t + t * (lv - t) + As;
    expect(rel(c.A, A)).toBeLessThan(1e-13);
    expect(rel(c.xc, (lh * t * (lh / 2) + t * (lv - t) * (t / 2) + As * (t + e)) / A)).toBeLessThan(1e-12);
    expect(rel(c.yc, (lh * t * (t / 2) + t * (lv - t) * (t + (lv - t) / 2) + As * (t + e)) / A)).toBeLessThan(1e-12);

    // Equal angle, legs along +x and +y from the heel: the product of inertia about the centroid
    // is negative (Gere & Goodno, product of inertia of an angle section; sign convention ∫xy dA).
    const eq = centroidal(profileMoments({ id: 'a', type: 'angle', at: [0, 0], legVertical: 100, legHorizontal: 100, thickness: 10, rootRadius: 12 }));
    expect(eq.Ixy).toBeLessThan(0);
    expect(rel(eq.Ix, eq.Iy)).toBeLessThan(1e-12); // symmetric about the 45° line
    // Legs pointing -x and +y (mirrored): the product changes sign.
    const mir = centroidal(profileMoments({ id: 'a', type: 'angle', at: [0, 0], mirror: true, legVertical: 100, legHorizontal: 100, thickness: 10, rootRadius: 12 }));
    expect(mir.Ixy).toBeGreaterThan(0);
  });

  it('tee: flange on top, stem down', () => {
    const [d, b, tf, ts, r] = [120, 140, 14, 9, 10];
    const m = profileMoments({ id: 't', type: 'tee', at: [0, 0], depth: d, flangeWidth: b, flangeThickness: tf, stemThickness: ts, rootRadius: r });
    const xl = b / 2 - ts / 2, xr = b / 2 + ts / 2;
    // Hibbeler composite: flange + stem + two root spandrels (Gere & Goodno, App. E).
    const want = sum(
      [1, rect(0, d - tf, b, d)],
      [1, rect(xl, 0, xr, d - tf)],
      [1, spandrel(xr, d - tf, r, 1, -1)],
      [1, spandrel(xl, d - tf, r, -1, -1)],
    );
    expect(momentError(m, want)).toBeLessThan(1e-12);
    const c = centroidal(m);
    const As = (1 - Math.PI / 4) * r * r, e = ((10 - 3 * Math.PI) * r) / (3 * (4 - Math.PI));
    const A = b * tf + ts * (d - tf) + 2 * As;
    expect(rel(c.A, A)).toBeLessThan(1e-13);
    expect(rel(c.yc, (b * tf * (d - tf / 2) + ts * (d - tf) * ((d - tf) / 2) + 2 * As * (d - tf - e)) / A)).toBeLessThan(1e-12);
    expect(rel(c.xc, b / 2)).toBeLessThan(1e-13);
  });
});

describe('tubes and bent plate', () => {
  it('round tube: Roark hollow circle to 1e-12', () => {
    const D = 168.3, t = 7.1, d = D - 2 * t;
    const shape: ProfileShape = { id: 'o', type: 'round-tube', at: [0, 0], outerDiameter: D, wall: t };
    const c = centroidal(profileMoments(shape));
    // Roark, Table A.1, hollow circle: A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64.
    expect(rel(c.A, (Math.PI * (D * D - d * d)) / 4)).toBeLessThan(1e-12);
    expect(rel(c.Ix, (Math.PI * (D ** 4 - d ** 4)) / 64)).toBeLessThan(1e-12);
    expect(rel(c.Iy, (Math.PI * (D ** 4 - d ** 4)) / 64)).toBeLessThan(1e-12);
    expect(Math.abs(c.Ixy)).toBeLessThan(1e-12 * c.Ix);
    // Local origin at the centre; a full circle is two half arcs, the hole runs CW.
    const { outer, holes } = profileToPaths(shape);
    expect(outer.segments.length).toBe(2);
    expect(holes.length).toBe(1);
    expect(signedArea(outer)).toBeGreaterThan(0);
    expect(signedArea(holes[0])).toBeLessThan(0);
    expect(Math.abs(c.xc) + Math.abs(c.yc)).toBeLessThan(1e-12 * D);
  });

  it('rect tube with outer radius: outer rounded rectangle minus inner rounded rectangle', () => {
    // Inner radius = max(ro − t, 0) (types.ts); both cases: ro > t and ro < t.
    for (const [w, h, t, ro] of [
      [200, 100, 8, 20],
      [200, 100, 8, 5],
      [150, 150, 10, 0],
      [120, 80, 6, 40],
    ]) {
      const m = profileMoments({ id: 'q', type: 'rect-tube', at: [0, 0], width: w, height: h, wall: t, outerRadius: ro });
      // Composite method (Hibbeler) with spandrels (Gere & Goodno, App. E) at every corner.
      const want = sum([1, roundedRect(0, 0, w, h, ro)], [-1, roundedRect(t, t, w - t, h - t, Math.max(ro - t, 0))]);
      expect(momentError(m, want)).toBeLessThan(1e-12);
    }
  });

  it('bent plate: two rectangles and a quarter annulus', () => {
    for (const [lh, lv, t, ri] of [
      [100, 60, 6, 9],
      [50, 50, 5, 0],
      [15, 40, 5, 10], // horizontal leg exactly the outside radius: no flat part
    ]) {
      const ro = ri + t;
      const m = profileMoments({ id: 'b', type: 'bent-plate', at: [0, 0], legHorizontal: lh, legVertical: lv, thickness: t, insideRadius: ri });
      // Hibbeler composite: flat legs beyond the bend + quarter annulus centred at (ro, ro)
      // (quarter circle of radius ro minus quarter circle ri: Gere & Goodno, App. E).
      const want = sum(
        [1, rect(ro, 0, lh, t)],
        [1, rect(0, ro, t, lv)],
        [1, quarterDisk(ro, ro, ro, -1, -1)],
        [-1, quarterDisk(ro, ro, ri, -1, -1)],
      );
      expect(momentError(m, want)).toBeLessThan(1e-12);
      // Bend area π/4 (ro² − ri²) (Gere & Goodno, App. E, quarter circle, twice).
      expect(rel(m.m00, t * (lh - ro) + t * (lv - ro) + (Math.PI / 4) * (ro * ro - ri * ri))).toBeLessThan(1e-13);
    }
  });
});

describe('placement', () => {
  const base: ProfileShape = { id: 'a', type: 'angle', at: [0, 0], legVertical: 150, legHorizontal: 90, thickness: 10, rootRadius: 12 };
  const c0 = centroidal(profileMoments(base));

  it('rotation by 90° swaps Ix and Iy and flips Ixy', () => {
    const c = centroidal(profileMoments({ ...base, rotation: 90 }));
    // Gere & Goodno, transformation equations for moments of inertia, θ = 90°.
    expect(rel(c.Ix, c0.Iy)).toBeLessThan(1e-12);
    expect(rel(c.Iy, c0.Ix)).toBeLessThan(1e-12);
    expect(rel(c.Ixy, -c0.Ixy)).toBeLessThan(1e-12);
    // The centroid turns with the body: (x, y) -> (−y, x).
    expect(rel(c.xc, -c0.yc)).toBeLessThan(1e-12);
    expect(rel(c.yc, c0.xc)).toBeLessThan(1e-12);
  });

  it('rotation by an arbitrary angle follows the transformation equations', () => {
    const th = 35, q = (2 * th * Math.PI) / 180;
    const c = centroidal(profileMoments({ ...base, rotation: th }));
    // Gere & Goodno, transformation equations (axes turned by −θ relative to the body):
    // Ix' = (Ix+Iy)/2 + (Ix−Iy)/2 cos 2θ + Ixy sin 2θ, Ixy' = −(Ix−Iy)/2 sin 2θ + Ixy cos 2θ.
    const avg = (c0.Ix + c0.Iy) / 2, dif = (c0.Ix - c0.Iy) / 2;
    expect(rel(c.Ix, avg + dif * Math.cos(q) + c0.Ixy * Math.sin(q))).toBeLessThan(1e-10);
    expect(rel(c.Iy, avg - dif * Math.cos(q) - c0.Ixy * Math.sin(q))).toBeLessThan(1e-10);
    expect(rel(c.Ixy, -dif * Math.sin(q) + c0.Ixy * Math.cos(q))).toBeLessThan(1e-10);
  });

  it('mirror flips the sign of Ixy and of the centroid x', () => {
    const c = centroidal(profileMoments({ ...base, mirror: true }));
    // Reflection x -> −x: ∫xy changes sign, ∫x², ∫y² do not (Gere & Goodno, product of inertia, symmetry).
    expect(rel(c.Ixy, -c0.Ixy)).toBeLessThan(1e-12);
    expect(rel(c.Ix, c0.Ix)).toBeLessThan(1e-12);
    expect(rel(c.Iy, c0.Iy)).toBeLessThan(1e-12);
    expect(rel(c.xc, -c0.xc)).toBeLessThan(1e-12);
    expect(rel(c.A, c0.A)).toBeLessThan(1e-13);
  });

  it('translation moves the centroid by `at` and keeps the centroidal moments', () => {
    const c = centroidal(profileMoments({ ...base, at: [1234.5, -678.25] }));
    // Parallel-axis theorem (Gere & Goodno): centroidal moments are unchanged by a translation.
    expect(c.xc - c0.xc).toBeCloseTo(1234.5, 9);
    expect(c.yc - c0.yc).toBeCloseTo(-678.25, 9);
    expect(rel(c.Ix, c0.Ix)).toBeLessThan(1e-9);
    expect(rel(c.Iy, c0.Iy)).toBeLessThan(1e-9);
    expect(rel(c.Ixy, c0.Ixy)).toBeLessThan(1e-9);
  });

  it('mirror, then rotation, then translation, in that order', () => {
    const c = centroidal(profileMoments({ ...base, mirror: true, rotation: 90, at: [10, 20] }));
    // Local centroid (x, y) -> mirror (−x, y) -> rotate 90° (−y, −x) -> move by (10, 20).
    expect(c.xc).toBeCloseTo(-c0.yc + 10, 10);
    expect(c.yc).toBeCloseTo(-c0.xc + 20, 10);
  });

  it('every type, any placement: outer CCW, holes CW, paths closed on their start', () => {
    // Winding convention of src/geometry/contour.ts (CCW outer, CW holes: positive signed area
    // for the outer loop by Green's theorem). Exact identity, no source needed.
    for (const type of Object.keys(PROFILE_DEFAULTS) as ProfileType[]) {
      for (const mirror of [false, true])
        for (const rotation of [0, 90, 180, 270, -45, 33.3]) {
          const shape = { id: 's', type, at: [5, -7], mirror, rotation, ...PROFILE_DEFAULTS[type] } as ProfileShape;
          const { outer, holes } = profileToPaths(shape);
          const expectedHoles = type === 'rect-tube' || type === 'round-tube' ? 1 : 0;
          expect(holes.length).toBe(expectedHoles);
          expect(signedArea(outer)).toBeGreaterThan(0);
          for (const h of holes) expect(signedArea(h)).toBeLessThan(0);
          for (const p of [outer, ...holes]) expect(p.segments[p.segments.length - 1].to).toEqual(p.start);
          // Mirroring and rotating never changes the area.
          const A0 = profileMoments({ ...shape, mirror: false, rotation: 0 } as ProfileShape).m00;
          expect(rel(profileMoments(shape).m00, A0)).toBeLessThan(1e-12);
        }
    }
  });

  it('copies id, op and name; holes get derived ids', () => {
    const { outer, holes } = profileToPaths({ id: 'T1', type: 'rect-tube', at: [0, 0], width: 60, height: 40, wall: 4, outerRadius: 8, op: 'subtract', name: 'Box'});
    expect(outer).toMatchObject({ id: 'T1', type: 'path', op: 'subtract', name: 'Box' });
    expect(holes[0]).toMatchObject({ id: 'T1:hole0', type: 'path', op: 'subtract', name: 'Box' });
    const plain = profileToPaths({ id: 'R', type: 'rectangle', at: [0, 0], width: 1, height: 1 }).outer;
    expect(Object.keys(plain).sort()).toEqual(['id', 'segments', 'start', 'type']);
  });

  it('fillet arcs pass through their exact midpoint', () => {
    const { outer } = profileToPaths({ id: 'r', type: 'rectangle', at: [0, 0], width: 80, height: 30, cornerRadius: 10 });
    // Bottom-right fillet: centre (70, 10), midpoint at 45° below-right: (70 + 10/√2, 10 − 10/√2).
    const arc = outer.segments.find((s) => s.via && s.to[0] === 80)!;
    expect(arc.via![0]).toBeCloseTo(70 + 10 * Math.SQRT1_2, 13);
    expect(arc.via![1]).toBeCloseTo(10 - 10 * Math.SQRT1_2, 13);
    expect(arc.to).toEqual([80, 10]);
  });
});

describe('validateProfile', () => {
  it('accepts every default profile', () => {
    for (const type of Object.keys(PROFILE_DEFAULTS) as ProfileType[])
      expect(validateProfile({ id: 'd', type, at: [0, 0], ...PROFILE_DEFAULTS[type] } as ProfileShape)).toEqual([]);
  });

  it('names the field and says what is wrong', () => {
    const i: IShape = { id: 'i', type: 'i-beam', at: [0, 0], depth: 50, flangeWidth: 40, flangeThickness: 30, webThickness: 5, rootRadius: 0 };
    expect(validateProfile(i)).toEqual([{ path: 'flangeThickness', message: 'flange thickness 30 must be less than half the depth 50' }]);
    expect(validateProfile({ ...i, flangeThickness: 5, webThickness: 45 })).toEqual([{ path: 'webThickness', message: 'web thickness 45 must be less than the flange width 40' }]);
    expect(validateProfile({ ...i, flangeThickness: 10, rootRadius: 18 })).toEqual([
      { path: 'rootRadius', message: 'root radius 18 must be at most the flange outstand (flange width − web thickness)/2 = 17.5' },
      { path: 'rootRadius', message: 'root radius 18 must be at most half the clear web depth (depth − 2 × flange thickness) 30' },
    ]);
    expect(validateProfile({ ...i, flangeThickness: 10, rootRadius: 15 })).toEqual([]); // r = 15 fits both exactly
    expect(validateProfile({ ...i, depth: -1 })).toEqual([{ path: 'depth', message: 'depth -1 must be greater than zero' }]);
    expect(validateProfile({ ...i, rootRadius: -2 })).toEqual([{ path: 'rootRadius', message: 'root radius -2 must be zero or more' }]);
    expect(validateProfile({ ...i, flangeWidth: NaN })).toEqual([{ path: 'flangeWidth', message: 'flange width must be a finite number (got NaN)' }]);
  });

  it('checks every type', () => {
    const paths = (s: unknown) => validateProfile(s as ProfileShape).map((x) => x.path);
    expect(paths({ id: 'r', type: 'rectangle', at: [0, 0], width: 10, height: 4, cornerRadius: 3 })).toEqual(['cornerRadius']);
    expect(paths({ id: 'c', type: 'channel', at: [0, 0], depth: 100, flangeWidth: 50, flangeThickness: 10, webThickness: 6, rootRadius: 45 })).toEqual(['rootRadius', 'rootRadius']);
    expect(paths({ id: 'a', type: 'angle', at: [0, 0], legVertical: 50, legHorizontal: 8, thickness: 8, rootRadius: 0 })).toEqual(['thickness']);
    expect(paths({ id: 't', type: 'tee', at: [0, 0], depth: 10, flangeWidth: 50, flangeThickness: 10, stemThickness: 6, rootRadius: 0 })).toEqual(['flangeThickness']);
    expect(paths({ id: 'q', type: 'rect-tube', at: [0, 0], width: 40, height: 20, wall: 10, outerRadius: 11 })).toEqual(['wall', 'outerRadius']);
    expect(paths({ id: 'o', type: 'round-tube', at: [0, 0], outerDiameter: 20, wall: 10 })).toEqual(['wall']);
    expect(paths({ id: 'b', type: 'bent-plate', at: [0, 0], legHorizontal: 14, legVertical: 40, thickness: 5, insideRadius: 10 })).toEqual(['legHorizontal']);
    expect(paths({ id: 'x', type: 'rectangle', at: [0], width: 1, height: 1, rotation: 'a', mirror: 1 })).toEqual(['at', 'rotation', 'mirror']);
    expect(paths({ id: 'x', type: 'hexagon', at: [0, 0] })).toEqual(['type']);
    // A placement problem does not hide a dimension problem.
    expect(paths({ id: 'a', type: 'angle', at: [0, 0], rotation: NaN, legVertical: 50, legHorizontal: 50, thickness: 8, rootRadius: 43 })).toEqual(['rotation', 'rootRadius', 'rootRadius']);
    expect(paths({ id: 'r', type: 'rectangle', at: [1e11, 0], width: 1, height: 1 })).toEqual(['at']);
    expect(paths({ id: 'r', type: 'rectangle', at: [0, 0], width: 100, height: 1e-5 })).toEqual(['height']);
    expect(paths({ id: 'x', type: 'rectangle', at: [0, 0], width: 1e13, height: 1 })).toEqual(['width']);
  });

  it('profileToPaths refuses an invalid profile with the same messages', () => {
    const bad: ProfileShape = { id: 'o', type: 'round-tube', at: [0, 0], outerDiameter: 20, wall: 10 };
    expect(() => profileToPaths(bad)).toThrow(ProfileError);
    expect(() => profileToPaths(bad)).toThrow('wall thickness 10 must be less than half the outside diameter 20');
  });

  it('fuzzed dimensions: never throws while validating; valid ones give finite, positive areas', () => {
    // Property test (fast-check): any accepted profile yields finite geometry of positive area.
    // Mostly plausible sizes (0.1 mm steps up to 400), some edge values, some arbitrary doubles.
    const num = fc.oneof(
      { arbitrary: fc.integer({ min: -10, max: 4000 }).map((v) => v / 10), weight: 12 },
      { arbitrary: fc.constantFrom(0, 1e-300, 1e-13, 1e13, Infinity, NaN), weight: 1 },
      { arbitrary: fc.double(), weight: 1 },
    );
    const types = Object.keys(PROFILE_FIELDS) as ProfileType[];
    fc.assert(
      fc.property(fc.constantFrom(...types), fc.array(num, { minLength: 5, maxLength: 5 }), fc.double({ min: -720, max: 720 }), fc.boolean(), fc.tuple(fc.double({ min: -1e7, max: 1e7 }), fc.double({ min: -1e7, max: 1e7 })), (type, vals, rotation, mirror, at) => {
        const shape: Record<string, unknown> = { id: 'f', type, at, rotation, mirror };
        PROFILE_FIELDS[type].forEach((f, k) => (shape[f.key] = vals[k]));
        const issues = validateProfile(shape as unknown as ProfileShape);
        if (issues.length > 0) {
          expect(() => profileToPaths(shape as unknown as ProfileShape)).toThrow(ProfileError);
          return;
        }
        const { outer, holes } = profileToPaths(shape as unknown as ProfileShape);
        for (const p of [outer, ...holes])
          for (const s of [p.start, ...p.segments.flatMap((g) => (g.via ? [g.to, g.via] : [g.to]))])
            expect(Number.isFinite(s[0]) && Number.isFinite(s[1])).toBe(true);
        const m = regionMoments([outer, ...holes].map(pathToContour));
        expect(m.m00).toBeGreaterThan(0);
        for (const v of Object.values(m)) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 3000 },
    );
  });
});

describe('generated valid profiles', () => {
  const sp = (r: number) => (1 - Math.PI / 4) * r * r; // spandrel area (Gere & Goodno, App. E)
  /** Dimensions inside every limit, built from fractions; radii may sit exactly on their limit. */
  function build(type: ProfileType, L: number[], f: number[], g: number[]): { shape: ProfileShape; area: number } {
    const [a, b] = L;
    const strict = (x: number) => 1e-3 + x * (1 - 2e-3); // strictly inside (0, 1)
    const base = { id: 'g', at: [0, 0] as [number, number] };
    switch (type) {
      case 'rectangle': {
        const r = g[0] * Math.min(a, b) / 2;
        return { shape: { ...base, type, width: a, height: b, cornerRadius: r }, area: a * b - 4 * sp(r) };
      }
      case 'i-beam':
      case 'channel': {
        const tf = strict(f[0]) * a / 2, tw = strict(f[1]) * b;
        const r = g[0] * Math.min(type === 'i-beam' ? (b - tw) / 2 : b - tw, (a - 2 * tf) / 2);
        const n = type === 'i-beam' ? 4 : 2;
        const shape = { ...base, type, depth: a, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r };
        return { shape, area: 2 * b * tf + tw * (a - 2 * tf) + n * sp(r) };
      }
      case 'angle': {
        const t = strict(f[0]) * Math.min(a, b), r = g[0] * (Math.min(a, b) - t);
        return { shape: { ...base, type, legHorizontal: a, legVertical: b, thickness: t, rootRadius: r }, area: a * t + t * (b - t) + sp(r) };
      }
      case 'tee': {
        const tf = strict(f[0]) * a, ts = strict(f[1]) * b, r = g[0] * Math.min((b - ts) / 2, a - tf);
        return { shape: { ...base, type, depth: a, flangeWidth: b, flangeThickness: tf, stemThickness: ts, rootRadius: r }, area: b * tf + ts * (a - tf) + 2 * sp(r) };
      }
      case 'rect-tube': {
        const m = Math.min(a, b), t = strict(f[0]) * m / 2, ro = g[0] * m / 2, ri = Math.max(ro - t, 0);
        const area = a * b - 4 * sp(ro) - ((a - 2 * t) * (b - 2 * t) - 4 * sp(ri));
        return { shape: { ...base, type, width: a, height: b, wall: t, outerRadius: ro }, area };
      }
      case 'round-tube': {
        const t = strict(f[0]) * a / 2, d = a - 2 * t;
        return { shape: { ...base, type, outerDiameter: a, wall: t }, area: (Math.PI * (a * a - d * d)) / 4 };
      }
      case 'bent-plate': {
        const m = Math.min(a, b), t = strict(f[0]) * m, ri = g[0] * (m - t), ro = ri + t;
        const area = t * (a - ro) + t * (b - ro) + (Math.PI / 4) * (ro * ro - ri * ri);
        return { shape: { ...base, type, legHorizontal: a, legVertical: b, thickness: t, insideRadius: ri }, area };
      }
    }
  }

  it('are all accepted, build without degenerate arcs and have the composite area', () => {
    // Areas: composite method (Hibbeler) with spandrels / quarter circles (Gere & Goodno,
    // App. E) and the hollow circle (Roark, Table A.1), as in the fixed cases above.
    const frac = fc.oneof(fc.constantFrom(0, 1), fc.double({ min: 0, max: 1, noNaN: true }));
    const len = fc.integer({ min: 10, max: 5000 }).map((v) => v / 10);
    fc.assert(
      fc.property(
        fc.constantFrom(...(Object.keys(PROFILE_FIELDS) as ProfileType[])),
        fc.tuple(len, len),
        fc.tuple(frac, frac),
        fc.tuple(frac),
        fc.integer({ min: -720, max: 720 }),
        fc.boolean(),
        fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: -1000, max: 1000 })),
        (type, L, f, g, rotation, mirror, at) => {
          const { shape, area } = build(type, L, f, g);
          const placed = { ...shape, rotation: rotation / 2, mirror, at } as ProfileShape;
          expect(validateProfile(placed)).toEqual([]);
          const { outer, holes } = profileToPaths(placed);
          expect(signedArea(outer)).toBeGreaterThan(0);
          for (const h of holes) expect(signedArea(h)).toBeLessThan(0);
          const A = regionMoments([outer, ...holes].map(pathToContour)).m00;
          expect(Math.abs(A - area)).toBeLessThan(1e-9 * area + 1e-12 * Math.max(...L) ** 2);
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('editor tables', () => {
  it('every profile type has defaults and labelled fields that cover its dimensions', () => {
    // Completeness of the tables against types.ts; common practice, no source.
    for (const type of Object.keys(PROFILE_FIELDS) as ProfileType[]) {
      const keys = PROFILE_FIELDS[type].map((f) => f.key).sort();
      expect(Object.keys(PROFILE_DEFAULTS[type]).sort()).toEqual(keys);
      for (const f of PROFILE_FIELDS[type]) expect(f.label).toMatch(/^[A-Z][a-z ]+$/);
    }
  });
});
