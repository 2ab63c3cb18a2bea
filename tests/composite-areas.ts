/**
 * Hand calculation by the composite-area method, for the example tests: a section is a signed sum
 * of simple parts (rectangles, quarter circles, circles, circular segments), each with its
 * tabulated area, centroid and own second moments, moved to common axes by the parallel-axis
 * theorem and added (Gere & Goodno, Mechanics of Materials, ch. 12, "composite areas", and the
 * table of plane areas in App. E; Hibbeler, Mechanics of Materials, App. A).
 *
 * Each part is kept as its moments about the origin: A, ∫x dA, ∫y dA, ∫x² dA, ∫y² dA, ∫xy dA.
 */

export interface Moments {
  A: number;
  Sx: number; // ∫x dA
  Sy: number; // ∫y dA
  Ixx: number; // ∫x² dA
  Iyy: number; // ∫y² dA
  Ixy: number; // ∫xy dA
}

/** A part from its area, centroid and second moments about its own centroidal axes (parallel axes). */
function part(A: number, cx: number, cy: number, Icx: number, Icy: number, Icxy: number): Moments {
  // ∫x² dA = I about the centroidal y axis + A·cx² (parallel-axis theorem, Gere & Goodno §12.5).
  return { A, Sx: A * cx, Sy: A * cy, Ixx: Icy + A * cx * cx, Iyy: Icx + A * cy * cy, Ixy: Icxy + A * cx * cy };
}

/** Rectangle from (x0, y0), width b, height h: I = b·h³/12 (Gere & Goodno, App. E, case 1). */
export function rect(x0: number, y0: number, b: number, h: number): Moments {
  return part(b * h, x0 + b / 2, y0 + h / 2, (b * h ** 3) / 12, (h * b ** 3) / 12, 0);
}

/** Circle: A = πr², I = πr⁴/4 about a diameter (Gere & Goodno, App. E, case 9). */
export function circle(cx: number, cy: number, r: number): Moments {
  const I = (Math.PI * r ** 4) / 4;
  return part(Math.PI * r * r, cx, cy, I, I, 0);
}

/**
 * Quarter circle of radius r about centre (cx, cy), in the quadrant given by the signs (sx, sy)
 * of its points (±1 each). About its straight edges: Ix = Iy = πr⁴/16, Ixy = r⁴/8 (first
 * quadrant); centroid 4r/(3π) from each edge (Gere & Goodno, App. E, case 10).
 */
export function quarterCircle(cx: number, cy: number, r: number, sx: 1 | -1, sy: 1 | -1): Moments {
  const A = (Math.PI * r * r) / 4;
  const e = (4 * r) / (3 * Math.PI);
  const Iedge = (Math.PI * r ** 4) / 16;
  // Own centroidal values from the edge values by the parallel-axis theorem.
  const Ic = Iedge - A * e * e;
  const Icxy = sx * sy * (r ** 4 / 8 - A * e * e);
  return part(A, cx + sx * e, cy + sy * e, Ic, Ic, Icxy);
}

/**
 * The circular segment of the circle (cx, cy, R) cut off by the line at distance c from the centre,
 * on the side given by the unit normal (nx, ny) along x or y. Half angle α = acos(c/R):
 * A = R²(α − sinα·cosα), centroid 2R·sin³α / (3(α − sinα·cosα)) from the centre; about the centre,
 * along the normal ∫n² dA = (R⁴/4)(α − sinα·cosα + 2sin³α·cosα), across it
 * ∫t² dA = (R⁴/12)(3α − 3sinα·cosα − 2sin³α·cosα) (Roark, Table A.1, circular segment, from memory).
 */
export function circularSegment(cx: number, cy: number, R: number, c: number, normal: 'x+' | 'x-' | 'y+' | 'y-'): Moments {
  const a = Math.acos(c / R);
  const s = Math.sin(a), co = Math.cos(a);
  const A = R * R * (a - s * co);
  const d = (2 * R * s ** 3) / (3 * (a - s * co));
  const Inn = (R ** 4 / 4) * (a - s * co + 2 * s ** 3 * co); // about the centre, along the normal
  const Itt = (R ** 4 / 12) * (3 * a - 3 * s * co - 2 * s ** 3 * co); // about the centre, across
  const sign = normal.endsWith('+') ? 1 : -1;
  const alongX = normal.startsWith('x');
  const ex = alongX ? sign * d : 0, ey = alongX ? 0 : sign * d;
  // Own centroidal values: about the centre minus A·d² along the normal.
  const Icx = alongX ? Itt : Inn - A * d * d; // about the centroidal x axis: ∫(y − ȳ)²
  const Icy = alongX ? Inn - A * d * d : Itt;
  return part(A, cx + ex, cy + ey, Icx, Icy, 0);
}

/** Σ of parts with signs (+1 add, −1 remove). */
export function sum(...terms: [number, Moments][]): Moments {
  const out: Moments = { A: 0, Sx: 0, Sy: 0, Ixx: 0, Iyy: 0, Ixy: 0 };
  for (const [k, m] of terms) for (const key of Object.keys(out) as (keyof Moments)[]) out[key] += k * m[key];
  return out;
}

/** Centroid and centroidal second moments of a composite (Gere & Goodno §12.3, §12.5). */
export function centroidal(m: Moments): { area: number; x: number; y: number; Ix: number; Iy: number; Ixy: number } {
  const x = m.Sx / m.A, y = m.Sy / m.A;
  return { area: m.A, x, y, Ix: m.Iyy - m.A * y * y, Iy: m.Ixx - m.A * x * x, Ixy: m.Ixy - m.A * x * y };
}

/**
 * The spandrel left between a square corner and a fillet of radius r: the r × r square at the
 * corner minus the quarter circle whose centre is r from the corner along both sides. The corner is
 * (x, y); (sx, sy) point from the corner into the spandrel.
 */
export function spandrel(x: number, y: number, r: number, sx: 1 | -1, sy: 1 | -1): Moments {
  const sq = rect(Math.min(x, x + sx * r), Math.min(y, y + sy * r), r, r);
  // The quarter circle's points lie towards the corner from its centre.
  const q = quarterCircle(x + sx * r, y + sy * r, r, (-sx) as 1 | -1, (-sy) as 1 | -1);
  return sum([1, sq], [-1, q]);
}
