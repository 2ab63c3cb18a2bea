/**
 * Data for drawing the stress over the section (a colour map), cheap enough for every frame.
 *
 * Within one material σ is linear, so the exact colour map of a material is a linear gradient fill
 * of its region: `stressGradients` gives, per material, two points along the stress gradient and the
 * stresses there (canvas and SVG linear gradients take exactly this). That costs nothing per pixel
 * and stays exact at any zoom.
 *
 * `sampleStressGrid` gives σ at the centres of a regular grid over the section (NaN outside), for
 * consumers that want samples (a raster, a probe, a test). Each row is located with the exact
 * crossings of the boundary (locate.ts), so a grid of nx × ny costs O(ny · segments + nx · ny).
 */
import { regionsBounds } from '../geometry/bounds';
import type { XY } from './mixed';
import type { StressExtremes } from './extremes';
import { rowCrossings } from './locate';
import { stressValue, type StressField } from './stress';

export interface StressGradient {
  material: string;
  /** σ is `low` along the line through `from` perpendicular to from→to, and `high` through `to`. */
  from: XY;
  to: XY;
  low: number;
  high: number;
  /** True when σ is the same everywhere in this material (from = to; fill with one colour). */
  uniform: boolean;
}

/**
 * One linear gradient per material, spanning that material's smallest and largest stress. Pass the
 * extremes of the same field (stressExtremes).
 */
export function stressGradients(f: StressField, ext: StressExtremes): StressGradient[] {
  const g = Math.hypot(f.b, f.c);
  return ext.byMaterial.map((e) => {
    const part = f.parts.find((p) => p.material.id === e.material)!;
    if (!(g > 0)) return { material: e.material, from: { ...f.origin }, to: { ...f.origin }, low: e.min.value, high: e.max.value, uniform: true };
    // Along origin + s ĝ, σ/n = a + |g| s; place the ends where σ takes the material's extremes.
    const at = (value: number): XY => {
      const s = (value / part.n - f.a) / g;
      return { x: f.origin.x + (s * f.b) / g, y: f.origin.y + (s * f.c) / g };
    };
    const uniform = e.max.value === e.min.value;
    return { material: e.material, from: at(e.min.value), to: at(e.max.value), low: e.min.value, high: e.max.value, uniform };
  });
}

export interface StressGrid {
  nx: number;
  ny: number;
  /** Centre of cell (i, j) is (x0 + i·dx, y0 + j·dy). */
  x0: number;
  y0: number;
  dx: number;
  dy: number;
  /** σ at cell (i, j) at index j·nx + i; NaN outside the section. */
  values: Float64Array;
  /** Index into field.parts of the material at each cell; −1 outside. */
  part: Int32Array;
}

/** σ at the centres of an nx × ny grid over the section's bounds. */
export function sampleStressGrid(f: StressField, nx = 64, ny = 64): StressGrid {
  const cols = Math.max(1, Math.min(4096, Math.floor(nx))), rows = Math.max(1, Math.min(4096, Math.floor(ny)));
  const box = regionsBounds(f.parts.map((p) => p.region));
  const values = new Float64Array(cols * rows).fill(NaN);
  const part = new Int32Array(cols * rows).fill(-1);
  if (!box) return { nx: cols, ny: rows, x0: 0, y0: 0, dx: 0, dy: 0, values, part };
  const { xmin, xmax, ymin, ymax } = box;
  const dx = (xmax - xmin) / cols, dy = (ymax - ymin) / rows;
  const x0 = xmin + dx / 2, y0 = ymin + dy / 2;
  for (let j = 0; j < rows; j++) {
    const y = y0 + j * dy;
    f.parts.forEach((p, k) => {
      const xs = rowCrossings(p.region, y);
      for (let m = 0; m + 1 < xs.length; m += 2) {
        // Cells whose centres lie in [xs[m], xs[m+1]).
        const i0 = Math.max(0, Math.ceil((xs[m] - x0) / (dx || 1)));
        const i1 = Math.min(cols - 1, Math.ceil((xs[m + 1] - x0) / (dx || 1)) - 1);
        for (let i = i0; i <= i1; i++) {
          values[j * cols + i] = stressValue(f, p.n, x0 + i * dx, y);
          part[j * cols + i] = k;
        }
      }
    });
  }
  return { nx: cols, ny: rows, x0, y0, dx, dy, values, part };
}
