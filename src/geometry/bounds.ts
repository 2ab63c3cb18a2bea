/** Bounding boxes: the union of two (either may be missing), and of a list of regions. */
import { regionBounds, type Bounds, type Region } from './contour';

export function unionBounds(a: Bounds | null, b: Bounds | null): Bounds | null {
  if (!a) return b;
  if (!b) return a;
  return { xmin: Math.min(a.xmin, b.xmin), xmax: Math.max(a.xmax, b.xmax), ymin: Math.min(a.ymin, b.ymin), ymax: Math.max(a.ymax, b.ymax) };
}

/** Exact bounds of several regions together, or null when they are all empty. */
export function regionsBounds(regions: Iterable<Region>): Bounds | null {
  let out: Bounds | null = null;
  for (const r of regions) out = unionBounds(out, regionBounds(r));
  return out;
}
