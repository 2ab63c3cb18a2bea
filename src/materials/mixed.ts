/**
 * Properties of a section made of several materials, from one exact region per material.
 *
 * - Per material: area, centroid, mass per length, n = E / E_ref.
 * - Area centroid (geometry only) and centre of gravity (density-weighted): two different points
 *   as soon as the densities differ.
 * - Transformed section (Gere & Goodno, composite beams, transformed-section method): every part
 *   counts n times, so A_t = Σ n_i A_i, x̄_t = Σ n_i ∫x dA / A_t, and the second moments about the
 *   transformed centroid are Σ n_i (I_i + A_i d_i²) by the parallel-axis theorem, summed per part
 *   about each part's own centroid to keep the digits. Principal values and angle follow from them
 *   as for one material (θ from +x to the I1 axis, CCW, degrees, in (−90°, 90°]).
 * - Share of the bending stiffness: n_i (I_i + A_i d_i²) / I_t about each transformed axis; the
 *   shares add up to 1.
 * - Elastic moduli to the extreme fibres of each material: under a moment M about the transformed
 *   centroidal x axis alone, the stress at material i's fibre a distance c from that axis is
 *   σ = n_i M c / I_t (Gere & Goodno, composite beams), so the modulus of that fibre is
 *   S = I_t / (n_i c) and |σ| = |M| / S there. c is measured to the material's highest fibre for
 *   `Sx_top` (c = ymax_i − ȳ_t), to its lowest for `Sx_bottom` (c = ȳ_t − ymin_i), and likewise to
 *   its rightmost and leftmost fibres for `Sy_right` and `Sy_left`. A material with no fibre on
 *   that side of the axis (c ≤ 0) gets null. Like the single-material moduli these use Ix (Iy) alone;
 *   with Ixy ≠ 0 the stress functions (stress.ts) give the true stresses.
 *
 * With one material that is the reference, every number equals sectionProperties' exactly (the
 * same moments, the same arithmetic with n = 1).
 */
import type { Units } from '../units';
import type { Bounds, Region } from '../geometry/contour';
import { centralMoments, regionBox, regionMoments, type CentralMoments, type RawMoments } from '../moments/kernel';
import { principal, SectionError } from '../properties/section';
import { assertMaterial, MaterialError, type Material } from './material';
import { massPerLength } from './units';

export interface MaterialPart {
  material: Material;
  region: Region;
}

export interface XY {
  x: number;
  y: number;
}

export interface PartResult {
  material: Material;
  region: Region;
  /** Modular ratio E / E_ref. */
  n: number;
  area: number;
  centroid: XY;
  /** kg/m. */
  massPerLength: number;
  bounds: Bounds;
  /** Raw moments of the part about the document origin. */
  moments: RawMoments;
  /** Second moments of the part about its own centroid (unweighted). */
  own: { Ix: number; Iy: number; Ixy: number };
  /** n (I + A d²) / I_t about the transformed centroidal x and y axes. */
  stiffnessShare: { x: number; y: number };
  /** Signed distances from the transformed centroidal axes to the part's extreme fibres. */
  fibres: { top: number; bottom: number; left: number; right: number };
  /** I_t / (n c) to each extreme fibre; null where the material has no fibre on that side. */
  moduli: { Sx_top: number | null; Sx_bottom: number | null; Sy_left: number | null; Sy_right: number | null };
}

export interface TransformedSection {
  /** The reference material's id and modulus (n = 1). */
  reference: string;
  E: number;
  area: number;
  centroid: XY;
  Ix: number;
  Iy: number;
  Ixy: number;
  I1: number;
  I2: number;
  /** Degrees, from +x to the I1 axis, CCW, in (−90°, 90°]. */
  theta: number;
}

export interface MixedSection {
  units: Units;
  parts: PartResult[];
  /** Geometric area and centroid (every material counts once). */
  area: number;
  centroid: XY;
  /** Centre of gravity (density-weighted centroid); null when every density is 0. */
  cg: XY | null;
  /** kg/m. */
  massPerLength: number;
  transformed: TransformedSection;
  bounds: Bounds;
}

/** Relative tolerance under which a part counts as having no area (as in sectionProperties). */
const EMPTY_TOL = 1e-14;

function unionBounds(bs: Bounds[]): Bounds {
  return {
    xmin: Math.min(...bs.map((b) => b.xmin)),
    xmax: Math.max(...bs.map((b) => b.xmax)),
    ymin: Math.min(...bs.map((b) => b.ymin)),
    ymax: Math.max(...bs.map((b) => b.ymax)),
  };
}

/**
 * Results for the parts (one region per material; the regions must not overlap, as the composer
 * guarantees) relative to the reference material. `units` is the document's length unit, used only
 * for the mass per length.
 */
export function mixedSection(parts: readonly MaterialPart[], reference: Material, units: Units): MixedSection {
  assertMaterial(reference, `reference material "${reference?.id}"`);
  const live: { part: MaterialPart; m: RawMoments; bounds: Bounds; cm: CentralMoments; c: { A: number; xc: number; yc: number; Ix: number; Iy: number; Ixy: number } }[] = [];
  for (const part of parts) {
    assertMaterial(part.material);
    const bounds = regionBox(part.region);
    if (!bounds) continue;
    // Each part's centroidal moments with no cancelling transfer (the same path as
    // sectionProperties, so one material gives exactly the geometric numbers).
    const cm = centralMoments(part.region);
    const extent = Math.max(bounds.xmax - bounds.xmin, bounds.ymax - bounds.ymin);
    if (!(cm.A > EMPTY_TOL * extent * extent)) {
      if (cm.A < -EMPTY_TOL * extent * extent) throw new SectionError(`The region of material "${part.material.id}" has negative area: its outer boundaries must run counter-clockwise.`);
      continue;
    }
    const c = { A: cm.A, xc: cm.refX + cm.dx, yc: cm.refY + cm.dy, Ix: cm.Ix, Iy: cm.Iy, Ixy: cm.Ixy };
    live.push({ part, m: regionMoments(part.region), bounds, cm, c });
  }
  if (live.length === 0) throw new SectionError('The section is empty: it has no area.');
  const Eref = reference.E;
  const ns = live.map(({ part }) => part.material.E / Eref);

  // Centroids as offsets from the first part's centroid, so parts far from the origin keep their
  // digits and one part is its own centroid exactly. Geometric area and centroid; centre of
  // gravity (density-weighted); mass per length; transformed area and centroid (n-weighted).
  const rx = live[0].c.xc, ry = live[0].c.yc;
  let A = 0, Sx = 0, Sy = 0, W = 0, Wx = 0, Wy = 0, mass = 0, At = 0, Stx = 0, Sty = 0;
  live.forEach(({ part, c }, k) => {
    const rho = part.material.density, n = ns[k];
    const ex = c.xc - rx, ey = c.yc - ry;
    A += c.A;
    Sx += c.A * ex;
    Sy += c.A * ey;
    W += rho * c.A;
    Wx += rho * c.A * ex;
    Wy += rho * c.A * ey;
    mass += massPerLength(c.A, rho, units);
    At += n * c.A;
    Stx += n * c.A * ex;
    Sty += n * c.A * ey;
  });
  if (!(At > 0) || !Number.isFinite(At)) throw new SectionError('The transformed section has no area: check the moduli of elasticity.');
  const dxt = Stx / At, dyt = Sty / At;
  const xt = rx + dxt, yt = ry + dyt;

  // Second moments about the transformed centroid, part by part (parallel-axis theorem).
  const perPart = live.map(({ part, m, bounds, c }, k) => {
    const dx = c.xc - rx - dxt, dy = c.yc - ry - dyt, n = ns[k];
    return {
      part,
      m,
      bounds,
      n,
      c,
      Ix: n * (c.Ix + c.A * dy * dy),
      Iy: n * (c.Iy + c.A * dx * dx),
      Ixy: n * (c.Ixy + c.A * dx * dy),
    };
  });
  let Ix = perPart[0].Ix, Iy = perPart[0].Iy, Ixy = perPart[0].Ixy;
  for (let k = 1; k < perPart.length; k++) {
    Ix += perPart[k].Ix;
    Iy += perPart[k].Iy;
    Ixy += perPart[k].Ixy;
  }
  const pr = principal(Ix, Iy, Ixy);

  const modulus = (I: number, n: number, c: number) => (c > 0 ? I / (n * c) : null);
  // Fibre distances through the first part's reference point and the centroid's offset from it,
  // as sectionProperties takes them: the digits survive far from the origin, and one material
  // gives its numbers exactly.
  const { refX, refY, dx: ox, dy: oy } = live[0].cm;
  const partResults: PartResult[] = perPart.map((p) => {
    const top = p.bounds.ymax - refY - (oy + dyt), bottom = oy + dyt - (p.bounds.ymin - refY);
    const right = p.bounds.xmax - refX - (ox + dxt), left = ox + dxt - (p.bounds.xmin - refX);
    return {
      material: p.part.material,
      region: p.part.region,
      n: p.n,
      area: p.c.A,
      centroid: { x: p.c.xc, y: p.c.yc },
      massPerLength: massPerLength(p.c.A, p.part.material.density, units),
      bounds: p.bounds,
      moments: p.m,
      own: { Ix: p.c.Ix, Iy: p.c.Iy, Ixy: p.c.Ixy },
      stiffnessShare: { x: p.Ix / Ix, y: p.Iy / Iy },
      fibres: { top, bottom, left, right },
      moduli: { Sx_top: modulus(Ix, p.n, top), Sx_bottom: modulus(Ix, p.n, bottom), Sy_left: modulus(Iy, p.n, left), Sy_right: modulus(Iy, p.n, right) },
    };
  });

  const out: MixedSection = {
    units,
    parts: partResults,
    area: A,
    centroid: { x: rx + Sx / A, y: ry + Sy / A },
    cg: W > 0 ? { x: rx + Wx / W, y: ry + Wy / W } : null,
    massPerLength: mass,
    transformed: { reference: reference.id, E: Eref, area: At, centroid: { x: xt, y: yt }, Ix, Iy, Ixy, I1: pr.I1, I2: pr.I2, theta: (pr.theta * 180) / Math.PI },
    bounds: unionBounds(live.map((l) => l.bounds)),
  };
  const t = out.transformed;
  if (![t.area, t.centroid.x, t.centroid.y, t.Ix, t.Iy, t.Ixy, t.I1, t.I2, out.massPerLength].every(Number.isFinite)) {
    throw new SectionError('The transformed section could not be computed: a modulus, density or coordinate is too large or too small.');
  }
  return out;
}

/** The parts with material records looked up by id (composer output → mixedSection input). */
export function partsFromRegions(regions: readonly { material: string; region: Region }[], materials: readonly Material[]): MaterialPart[] {
  return regions.map((r) => {
    const material = materials.find((m) => m.id === r.material);
    if (!material) throw new MaterialError(`unknown material "${r.material}"; known materials: ${materials.map((m) => `"${m.id}"`).join(', ') || 'none'}`);
    return { material, region: r.region };
  });
}
