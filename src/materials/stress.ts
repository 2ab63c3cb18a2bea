/**
 * Normal stress under an axial force and two bending moments: the general (unsymmetric) bending
 * formula on the transformed section, and the neutral axis.
 *
 * With x′ = x − x̄, y′ = y − ȳ about the transformed centroid, A, Ix, Iy, Ixy of the transformed
 * section, D = Ix·Iy − Ixy² and n = E / E_ref of the material at the point:
 *
 *   σ = n [ N/A + (Mx·Iy + My·Ixy)/D · y′ − (My·Ix + Mx·Ixy)/D · x′ ]
 *
 * This is the plane-strain-distribution solution of N = ∫σ dA, Mx = ∫y′σ dA, My = −∫x′σ dA
 * (Gere & Goodno, Sec. 6.5, bending of unsymmetric beams; Hibbeler, Mechanics of Materials,
 * Sec. 6.5, unsymmetric bending; with Ixy = 0 it is σ = N/A + Mx y′/Ix − My x′/Iy). The
 * moments are vectors by the right-hand rule with z towards the viewer, which is what keeps the
 * formula the same in any orientation of the section (tested by rotating section and moment).
 *
 * σ / n is one linear function over the whole section, so the neutral axis (σ = 0) is one straight
 * line through every material. Under pure bending it passes through the transformed centroid.
 */
import type { Region } from '../geometry/contour';
import { boundaryDistance, regionContainsPoint } from './locate';
import type { Material } from './material';
import type { MixedSection, XY } from './mixed';
import { momentFactor, stressFactor, type LoadUnits } from './units';

export interface Loads {
  /** Axial force, tension positive. */
  N?: number;
  /** Moment about the transformed centroidal x axis (vector along +x by the right-hand rule). */
  Mx?: number;
  /** Moment about the transformed centroidal y axis (vector along +y by the right-hand rule). */
  My?: number;
  /** Shear force for the cut (see shear.ts). */
  V?: number;
}

/** The sign convention, in one wording for the panel, the CLI and the report. */
export const SIGN_CONVENTION =
  'Tension is positive. N > 0 pulls. Mx and My act about the centroidal axes of the (transformed) section and are vectors by the right-hand rule with z towards the viewer: Mx > 0 stretches the fibres above the centroid (y > ȳ), My > 0 stretches the fibres left of the centroid (x < x̄). ' +
  'σ = n·[N/A + (Mx·Iy + My·Ixy)/(Ix·Iy − Ixy²)·(y − ȳ) − (My·Ix + Mx·Ixy)/(Ix·Iy − Ixy²)·(x − x̄)], with A, x̄, ȳ, Ix, Iy, Ixy of the transformed section and n = E/E_ref of the material at the point.';

export interface StressPart {
  material: Material;
  n: number;
  region: Region;
}

export interface StressField {
  /** The load case as given (in its own units). */
  loads: { N: number; Mx: number; My: number };
  /** The load case in force and force × document length (after unit conversion). */
  N: number;
  Mx: number;
  My: number;
  /** Transformed centroid: the origin of x′, y′. */
  origin: XY;
  /** σ = n (a + b x′ + c y′), in the stress unit (or force / length² without units). */
  a: number;
  b: number;
  c: number;
  parts: StressPart[];
  /** Largest extent of the section, for tolerances. */
  extent: number;
  units: LoadUnits | null;
}

/**
 * The stress field of a load case. Without `units` the loads are taken in force and force ×
 * document length and stresses come out in force / length²; with them, the moments are converted
 * from force × momentLength and stresses are given in the stress unit.
 */
export function stressField(section: MixedSection, loads: Loads, units?: LoadUnits): StressField {
  const num = (v: number | undefined, name: string) => {
    const x = v ?? 0;
    if (!Number.isFinite(x)) throw new Error(`the load ${name} must be a finite number, got ${String(v)}`);
    return x;
  };
  const mk = units ? momentFactor(units) : 1;
  const sk = units ? stressFactor(units) : 1;
  const N = num(loads.N, 'N'), Mx = num(loads.Mx, 'Mx') * mk, My = num(loads.My, 'My') * mk;
  const t = section.transformed;
  const D = t.Ix * t.Iy - t.Ixy * t.Ixy;
  if (!(D > 0)) throw new Error('the section has no bending stiffness about some axis (Ix·Iy − Ixy² ≤ 0): it is a line, not an area');
  const b = section.bounds;
  return {
    loads: { N, Mx: num(loads.Mx, 'Mx'), My: num(loads.My, 'My') },
    N,
    Mx,
    My,
    origin: { ...t.centroid },
    a: (sk * N) / t.area,
    b: (-sk * (My * t.Ix + Mx * t.Ixy)) / D,
    c: (sk * (Mx * t.Iy + My * t.Ixy)) / D,
    parts: section.parts.map((p) => ({ material: p.material, n: p.n, region: p.region })),
    extent: Math.max(b.xmax - b.xmin, b.ymax - b.ymin),
    units: units ?? null,
  };
}

/** σ at (x, y) for a material of modular ratio n (no test whether the point is on the section). */
export function stressValue(f: StressField, n: number, x: number, y: number): number {
  return n * (f.a + f.b * (x - f.origin.x) + f.c * (y - f.origin.y));
}

export interface PointStress {
  x: number;
  y: number;
  /** True when the point lies on the section (inside or on its boundary). */
  inside: boolean;
  /** One entry per material at the point: none outside, two on an interface between materials. */
  stresses: { material: string; value: number }[];
}

/** Relative distance within which a point counts as on a boundary. */
const ON_EDGE = 1e-9;

/** The stress at a point, in every material that holds it (edges and corners included). */
export function stressAt(f: StressField, x: number, y: number): PointStress {
  if (!Number.isFinite(x) || !Number.isFinite(y)) throw new Error(`the point (${x}, ${y}) is not a pair of finite numbers`);
  const tol = ON_EDGE * Math.max(f.extent, Math.abs(x), Math.abs(y));
  const stresses: { material: string; value: number }[] = [];
  for (const p of f.parts) {
    if (regionContainsPoint(p.region, x, y) || boundaryDistance(p.region, x, y) <= tol) stresses.push({ material: p.material.id, value: stressValue(f, p.n, x, y) });
  }
  return { x, y, inside: stresses.length > 0, stresses };
}

export interface NeutralAxis {
  /** The point of the axis nearest the transformed centroid. */
  point: XY;
  /** Unit vector along the axis; the tension side lies to its left. */
  direction: XY;
}

/** The line σ = 0, or null when there is no bending (the stress is the same everywhere). */
export function neutralAxis(f: StressField): NeutralAxis | null {
  const g2 = f.b * f.b + f.c * f.c;
  if (!(g2 > 0)) return null;
  const g = Math.sqrt(g2);
  // Beyond about 1e15 section sizes away the axis is at infinity in double precision.
  if (Math.abs(f.a) / g > 1e15 * Math.max(f.extent, 1e-300)) return null;
  const k = -f.a / g2;
  return { point: { x: f.origin.x + k * f.b, y: f.origin.y + k * f.c }, direction: { x: f.c / g, y: -f.b / g } };
}
