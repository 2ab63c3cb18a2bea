/** Where a new cut line starts: through the centroid, with round-off zero shown as 0. */
import type { SectionProperties } from '../../src';

export function centroidCut(p: SectionProperties, axis: 'x' | 'y'): number {
  const c = axis === 'x' ? p.centroid.x : p.centroid.y;
  const size = Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
  return Math.abs(c) < 1e-12 * size ? 0 : c;
}
