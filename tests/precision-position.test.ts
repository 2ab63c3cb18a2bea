/**
 * Exactness at any position: closed forms for a rectangle, a circle, a tube and a right triangle,
 * placed 1e3, 1e6 and 1e9 units from the origin and rotated, at 1e-9 relative. Centroidal
 * moments, the cut values (b, Q) and the plastic moduli.
 *
 * The rotations are exact: quarter turns and the Pythagorean rotation cos θ = 3/5, sin θ = 4/5,
 * with integer dimensions, so every vertex stays an exact double even at 1e9 and the check
 * measures the engine, not the rounding of the input. A general angle (30°) is checked where the
 * input itself still holds the part to better than 1e-11 (up to 1e6 for a 10-unit part).
 *
 * Sources:
 * - Gere & Goodno, Mechanics of Materials (8th ed.), Appendix E "Properties of plane areas":
 *   rectangle (case 1), right triangle (case 6), circle (case 9); Roark's Formulas for Stress
 *   and Strain (Young & Budynas, 7th ed.), Table A.1: solid and hollow circle.
 * - Rotated axes: Gere & Goodno, Sec. 12.8 "Rotation of axes" (transformation equations for
 *   moments and products of inertia; section number from memory).
 * - Cut values: Gere & Goodno, Sec. 5.8-5.9 (shear formula τ = VQ/(Ib); rectangular beam
 *   Q = (b/2)(h²/4 − y1²); circular beam, Q of a circular segment = (2/3)(r² − y1²)^(3/2);
 *   section numbers from memory). The triangle's Q is the composite-area first moment of the
 *   triangle above the cut (Hibbeler, Statics, centroid of a triangle at h/3).
 * - Plastic moduli: Gere & Goodno, Sec. 6.10 "Plastic moments" (section number from memory):
 *   Z = A(c1 + c2)/2; rectangle Z = bh²/4; solid circle Z = 4r³/3 (= d³/6); hollow circle
 *   Z = 4(r2³ − r1³)/3. The right triangle's Z = (bh²/3)(1 − 1/√2) follows from Z = A(c1 + c2)/2
 *   with the equal-area axis at h/√2 below the apex (derived here, no table value).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { contourFrom, type Contour, type Region } from '../src/geometry/contour';
import { cutSection, sectionProperties } from '../src/properties/section';
import { close, worst } from './helpers';

const TOL = 1e-9;

/** A world coordinate within 1e-9 of a 10-unit part, or within two units in its last place. */
function nearCoordinate(got: number, want: number): void {
  const ulp = Math.abs(want) * Number.EPSILON;
  expect(Math.abs(got - want), `coordinate ${got}, expected ${want}`).toBeLessThanOrEqual(Math.max(TOL * 10, 2 * ulp));
}
const OFFSETS = [0, 1e3, 1e6, 1e9];

/** An exact rotation: (c, s) with c² + s² = 1 in exact arithmetic for the coordinates used. */
interface Turn {
  name: string;
  c: number;
  s: number;
  /** Largest offset at which this rotation keeps a 10-unit part to 1e-11 in its coordinates. */
  maxOffset: number;
}
const TURNS: Turn[] = [
  { name: '0°', c: 1, s: 0, maxOffset: Infinity },
  { name: '90°', c: 0, s: 1, maxOffset: Infinity },
  { name: '180°', c: -1, s: 0, maxOffset: Infinity },
  { name: 'atan(4/3)', c: 3 / 5, s: 4 / 5, maxOffset: Infinity },
  { name: '30°', c: Math.sqrt(3) / 2, s: 0.5, maxOffset: 1e6 },
];

/** Rotate about the origin by the turn, then translate by (ox, oy). */
function place(xy: number[], bulge: number[] | null, t: Turn, ox: number, oy: number): Contour {
  const out: number[] = [];
  for (let i = 0; i < xy.length; i += 2) {
    const x = xy[i], y = xy[i + 1];
    // Quarter turns and the 3-4-5 turn give exact results on the integer coordinates used here.
    const rx = t.c === 0 ? -t.s * y : t.s === 0 ? t.c * x : (t.c * x - t.s * y);
    const ry = t.c === 0 ? t.s * x : t.s === 0 ? t.c * y : (t.s * x + t.c * y);
    out.push(rx + ox, ry + oy);
  }
  return contourFrom(out, bulge);
}

/** Centroidal moments of a shape rotated by θ, from those of the unrotated shape (Gere & Goodno, rotation of axes). */
function rotated(Ix: number, Iy: number, Ixy: number, c: number, s: number) {
  return {
    Ix: Ix * c * c + Iy * s * s + 2 * Ixy * s * c,
    Iy: Iy * c * c + Ix * s * s - 2 * Ixy * s * c,
    Ixy: (Iy - Ix) * s * c + Ixy * (c * c - s * s),
  };
}

interface Case {
  name: string;
  region: (t: Turn, ox: number, oy: number) => Region;
  A: number;
  /** Centroid of the unrotated shape (before translation). */
  gx: number;
  gy: number;
  Ix: number;
  Iy: number;
  Ixy: number;
  /** Closed-form b and Q for a horizontal cut at y1 above the centroid (shape turned by 0°). */
  cut?: (y1: number) => { b: number; Q: number; };
  cutAt?: number[];
  /** Plastic moduli about the horizontal and vertical equal-area axes (shape turned by 0°). */
  Zx?: number;
  Zy?: number;
  /** The shape is the same after any turn (circle, tube): cuts and Z apply to every turn. */
  isotropic?: boolean;
}

// Rectangle b × h with a corner at the origin (b = 10, h = 20: multiples of 5 for the 3-4-5 turn).
const B = 10, H = 20;
const RECT: Case = {
  name: 'rectangle 10 × 20',
  region: (t, ox, oy) => [place([0, 0, B, 0, B, H, 0, H], null, t, ox, oy)],
  A: B * H, gx: B / 2, gy: H / 2,
  Ix: (B * H ** 3) / 12, Iy: (H * B ** 3) / 12, Ixy: 0, // Gere & Goodno, App. E, case 1
  cut: (y1) => ({ b: B, Q: (B / 2) * (H * H / 4 - y1 * y1) }), // rectangular beam
  cutAt: [0, 2.5, -7.25, 9.5],
  Zx: (B * H * H) / 4, Zy: (H * B * B) / 4, // Gere & Goodno, plastic moments, rectangle
};

// Circle r = 5 whose start vertex sits at angle θ (so the 3-4-5 turn keeps it exact).
const R5 = 5;
const circleXY = (r: number) => [r, 0, -r, 0];
const CIRCLE: Case = {
  name: 'circle r = 5',
  region: (t, ox, oy) => [place(circleXY(R5), [1, 1], t, ox, oy)],
  A: Math.PI * R5 * R5, gx: 0, gy: 0,
  Ix: (Math.PI * R5 ** 4) / 4, Iy: (Math.PI * R5 ** 4) / 4, Ixy: 0, // Roark, Table A.1, solid circle
  cut: (y1) => ({ b: 2 * Math.sqrt(R5 * R5 - y1 * y1), Q: (2 / 3) * (R5 * R5 - y1 * y1) ** 1.5 }),
  cutAt: [0, 1.5, -3.25, 4.75],
  Zx: (4 * R5 ** 3) / 3, Zy: (4 * R5 ** 3) / 3, // Gere & Goodno, plastic moments, solid circle
  isotropic: true,
};

// Tube R = 10, r = 5.
const R10 = 10;
const TUBE: Case = {
  name: 'tube 10 / 5',
  region: (t, ox, oy) => [place(circleXY(R10), [1, 1], t, ox, oy), place(circleXY(R5), [-1, -1], t, ox, oy)],
  A: Math.PI * (R10 ** 2 - R5 ** 2), gx: 0, gy: 0,
  Ix: (Math.PI * (R10 ** 4 - R5 ** 4)) / 4, Iy: (Math.PI * (R10 ** 4 - R5 ** 4)) / 4, Ixy: 0, // Roark, Table A.1, hollow circle
  cut: (y1) => {
    const o = R10 * R10 - y1 * y1, i = Math.max(0, R5 * R5 - y1 * y1);
    return { b: 2 * (Math.sqrt(o) - Math.sqrt(i)), Q: (2 / 3) * (o ** 1.5 - i ** 1.5) };
  },
  cutAt: [0, 2.5, -4.75, 7.5],
  Zx: (4 * (R10 ** 3 - R5 ** 3)) / 3, Zy: (4 * (R10 ** 3 - R5 ** 3)) / 3, // Gere & Goodno, hollow circle
  isotropic: true,
};

// Right triangle, legs 15 along x and 10 along y, right angle at the origin.
const TB = 15, TH = 10;
const TRI: Case = {
  name: 'right triangle 15 × 10',
  region: (t, ox, oy) => [place([0, 0, TB, 0, 0, TH], null, t, ox, oy)],
  A: (TB * TH) / 2, gx: TB / 3, gy: TH / 3,
  // Gere & Goodno, App. E, case 6: Ix = bh³/36, Iy = hb³/36, Ixy = −b²h²/72.
  Ix: (TB * TH ** 3) / 36, Iy: (TH * TB ** 3) / 36, Ixy: -(TB * TB * TH * TH) / 72,
  cut: (y1) => {
    // The part above y = ȳ + y1 is a triangle of base w and height h − y; its centroid is a third up.
    const y = TH / 3 + y1, w = TB * (1 - y / TH), A = (w * (TH - y)) / 2;
    return { b: w, Q: A * (y + (TH - y) / 3 - TH / 3) };
  },
  cutAt: [0, 1.25, -2.5, 5.5],
  Zx: ((TB * TH * TH) / 3) * (1 - Math.SQRT1_2), Zy: ((TH * TB * TB) / 3) * (1 - Math.SQRT1_2),
};

const CASES = [RECT, CIRCLE, TUBE, TRI];

describe('closed forms at any position and turn', () => {
  for (const k of CASES) {
    for (const t of TURNS) {
      for (const off of OFFSETS) {
        if (off > t.maxOffset) continue;
        // Offsets in x and y of different sizes, so x and y errors cannot hide behind each other.
        const ox = off, oy = -0.5 * off;
        it(`${k.name}, turned ${t.name}, at (${ox}, ${oy})`, () => {
          const region = k.region(t, ox, oy);
          const p = sectionProperties(region);
          const want = rotated(k.Ix, k.Iy, k.Ixy, t.c, t.s);
          const J = k.Ix + k.Iy;
          close(p.area, k.A, TOL);
          // The centroid is a world coordinate: 1e-9 of the part's size, or its last two digits
          // (a double near 1e9 holds 1.2e-7), whichever is larger.
          nearCoordinate(p.centroid.x, ox + (t.c * k.gx - t.s * k.gy));
          nearCoordinate(p.centroid.y, oy + (t.s * k.gx + t.c * k.gy));
          close(p.Ix, want.Ix, TOL);
          close(p.Iy, want.Iy, TOL);
          close(p.Ixy, want.Ixy, TOL, J);
          close(p.J0, J, TOL);
        });
      }
    }
  }
});

describe('cut values (b, Q) at any position', () => {
  for (const k of CASES) {
    const turns = k.isotropic ? TURNS.filter((t) => t.maxOffset === Infinity) : [TURNS[0]];
    for (const t of turns) {
      for (const off of OFFSETS) {
        const ox = off, oy = off;
        it(`${k.name}, turned ${t.name}, at ${off}`, () => {
          const region = k.region(t, ox, oy);
          const p = sectionProperties(region);
          const scaleQ = k.cut!(0).Q;
          for (const y1 of k.cutAt!) {
            // Horizontal cut y = ȳ + y1: exact double at every offset used (dyadic y1, integer ȳ
            // or a third of an integer that the closed form uses the same way).
            const at = oy + k.gy + y1;
            const want = k.cut!(at - oy - k.gy);
            const c = cutSection(region, 'y', at, p);
            close(c.width, want.b, TOL, 10);
            close(c.Q, want.Q, TOL, scaleQ);
          }
        });
      }
    }
  }
  it('vertical cuts of the rectangle at 1e9 (b = h, Q = (h/2)(b²/4 − x1²))', () => {
    const ox = 1e9, oy = -2e9;
    const region = RECT.region(TURNS[0], ox, oy);
    const p = sectionProperties(region);
    for (const x1 of [0, 1.25, -3.5]) {
      const c = cutSection(region, 'x', ox + B / 2 + x1, p);
      close(c.width, H, TOL); // Gere & Goodno, rectangular beam (turned)
      close(c.Q, (H / 2) * (B * B / 4 - x1 * x1), TOL, (H / 2) * (B * B / 4));
    }
  });
});

describe('plastic moduli at any position', () => {
  for (const k of CASES) {
    const turns = k.isotropic ? TURNS.filter((t) => t.maxOffset === Infinity) : TURNS.filter((t) => t.s === 0 || t.c === 0);
    for (const t of turns) {
      for (const off of OFFSETS) {
        it(`${k.name}, turned ${t.name}, at ${off}`, () => {
          const p = sectionProperties(k.region(t, off, 3 * off));
          // A quarter turn swaps the two axes.
          const swap = !k.isotropic && t.c === 0;
          close(p.Zx, swap ? k.Zy! : k.Zx!, TOL);
          close(p.Zy, swap ? k.Zx! : k.Zy!, TOL);
        });
      }
    }
  }
});

afterAll(() => {
  console.log(`precision-position: largest relative error ${worst.value.toExponential(2)}`);
});
