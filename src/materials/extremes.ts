/**
 * The largest tensile and compressive stresses and their places, exactly.
 *
 * Within one material σ = n (a + g·p′) is linear, so over a region bounded by lines and arcs its
 * extremes lie on the boundary: at a vertex, or inside an arc where the arc's radial direction is
 * parallel to the gradient g (there the level line of σ touches the circle). Those are finitely many
 * candidate points, each computed exactly in the arc's chord frame (arcPointAtAngle), so no sampling
 * is involved.
 */
import { arcPointAtAngle, type Contour } from '../geometry/contour';
import { stressValue, type StressField, type StressPart } from './stress';

export interface StressPoint {
  value: number;
  x: number;
  y: number;
  material: string;
}

export interface MaterialExtremes {
  material: string;
  /** Algebraically largest and smallest σ in this material. */
  max: StressPoint;
  min: StressPoint;
}

export interface StressExtremes {
  byMaterial: MaterialExtremes[];
  /** Largest σ > 0 over the section, or null when nothing is in tension. */
  maxTension: StressPoint | null;
  /** Smallest σ < 0 over the section, or null when nothing is in compression. */
  maxCompression: StressPoint | null;
}

/** Visit every candidate point of a contour for the extremes of a linear field with gradient (gx, gy). */
function candidates(c: Contour, gx: number, gy: number, visit: (x: number, y: number) => void): void {
  const n = c.xy.length >> 1;
  const g = Math.hypot(gx, gy);
  for (let i = 0; i < n; i++) {
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
    visit(ax, ay);
    const b = c.bulge ? c.bulge[i] : 0;
    if (b === 0 || !(g > 0)) continue;
    const j = i + 1 === n ? 0 : i + 1;
    const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    const L = Math.hypot(bx - ax, by - ay);
    if (!(L > 0)) continue;
    const phi = 4 * Math.atan(b), alpha = Math.abs(phi) / 2;
    const ex = (bx - ax) / L, ey = (by - ay) / L;
    const sg = phi > 0 ? 1 : -1;
    const ux = sg * ey, uy = -sg * ex;
    // Radial direction at θ is u cosθ + e sinθ; it is ±ĝ at θ = atan2(±ĝ·e, ±ĝ·u).
    for (const s of [1, -1]) {
      const dx = (s * gx) / g, dy = (s * gy) / g;
      const th = Math.atan2(dx * ex + dy * ey, dx * ux + dy * uy);
      if (Math.abs(th) < alpha) {
        const [px, py] = arcPointAtAngle(ax, ay, bx, by, phi, th);
        visit(px, py);
      }
    }
  }
}

function partExtremes(f: StressField, p: StressPart): MaterialExtremes | null {
  let max: StressPoint | null = null, min: StressPoint | null = null;
  for (const c of p.region) {
    candidates(c, f.b, f.c, (x, y) => {
      const value = stressValue(f, p.n, x, y);
      if (!max || value > max.value) max = { value, x, y, material: p.material.id };
      if (!min || value < min.value) min = { value, x, y, material: p.material.id };
    });
  }
  return max && min ? { material: p.material.id, max, min } : null;
}

/** Extremes per material and over the whole section. */
export function stressExtremes(f: StressField): StressExtremes {
  const byMaterial: MaterialExtremes[] = [];
  for (const p of f.parts) {
    const e = partExtremes(f, p);
    if (e) byMaterial.push(e);
  }
  let maxTension: StressPoint | null = null, maxCompression: StressPoint | null = null;
  for (const e of byMaterial) {
    if (e.max.value > 0 && (!maxTension || e.max.value > maxTension.value)) maxTension = e.max;
    if (e.min.value < 0 && (!maxCompression || e.min.value < maxCompression.value)) maxCompression = e.min;
  }
  return { byMaterial, maxTension, maxCompression };
}
