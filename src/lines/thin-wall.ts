/**
 * The thin-wall approximation of a strip next to its exact values.
 *
 * Thin wall: the centreline's line properties times the thickness t (A = L·t, the centroid of the
 * centreline, Ix = t·∫(y − ȳ)² dL, ...). Exact: the area moments of the strip's exact outline
 * (regionMomentsAbout, the area kernel, about the centreline's centroid so that nothing cancels).
 * The difference, in per cent of the exact value, tells how far the thin-wall assumption holds:
 * it grows with t/r at bends and with t/L at corners and ends (for a thin ring of radius R the
 * exact I exceeds π R³ t by the factor 1 + t²/(4R²); Roark, Table A.1, thin-walled circular
 * tube against the hollow circle).
 */
import type { Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import { regionMomentsAbout } from '../moments/kernel';
import { centroidalFromRaw } from '../properties/section';
import { LineError, type LineChain } from './chain';
import { lineProperties, type LineProperties } from './line-properties';

export interface AreaValues {
  area: number;
  centroid: { x: number; y: number };
  Ix: number;
  Iy: number;
  Ixy: number;
}

export interface ThinWallComparison {
  /** Of the exact outline. */
  exact: AreaValues;
  /** Line properties of the centreline times the thickness. */
  thinWall: AreaValues;
  /** The centreline's own line properties (per unit thickness). */
  line: LineProperties;
  /**
   * (thin wall − exact) / |exact| in per cent. Null where the exact value is zero (Ixy of a
   * section symmetric about an axis): then read `difference`.
   */
  percent: { area: number; Ix: number; Iy: number; Ixy: number | null; centroid: number };
  /** thin wall − exact, in the section's units; `centroid` is the distance between the centroids. */
  difference: { area: number; Ix: number; Iy: number; Ixy: number; centroid: number };
}

/**
 * Compare the thin-wall values of a centreline of thickness t with the exact outline (as built by
 * stripOutline). The centroid difference is given in per cent of the outline's larger extent.
 */
export function thinWallComparison(centreline: LineChain, thickness: number, outline: Region): ThinWallComparison {
  if (!(Number.isFinite(thickness) && thickness > 0)) throw new LineError(`thickness: the wall thickness must be a positive number (got ${thickness})`);
  const line = lineProperties([centreline]);
  const t = thickness;
  const thinWall: AreaValues = { area: line.length * t, centroid: { ...line.centroid }, Ix: line.Ix * t, Iy: line.Iy * t, Ixy: line.Ixy * t };
  const gx = line.centroid.x, gy = line.centroid.y;
  const c = centroidalFromRaw(regionMomentsAbout(outline, gx, gy));
  if (!(c.A > 0)) throw new LineError('The strip outline has no area.');
  const exact: AreaValues = { area: c.A, centroid: { x: gx + c.xc, y: gy + c.yc }, Ix: c.Ix, Iy: c.Iy, Ixy: c.Ixy };
  const b = regionBounds(outline);
  const size = b ? Math.max(b.xmax - b.xmin, b.ymax - b.ymin) : 0;
  const shift = Math.hypot(thinWall.centroid.x - exact.centroid.x, thinWall.centroid.y - exact.centroid.y);
  const pc = (thin: number, ex: number) => (100 * (thin - ex)) / Math.abs(ex);
  const ixyZero = Math.abs(c.Ixy) <= 1e-12 * (Math.abs(c.Ix) + Math.abs(c.Iy));
  return {
    exact,
    thinWall,
    line,
    percent: {
      area: pc(thinWall.area, exact.area),
      Ix: pc(thinWall.Ix, exact.Ix),
      Iy: pc(thinWall.Iy, exact.Iy),
      Ixy: ixyZero ? null : pc(thinWall.Ixy, exact.Ixy),
      centroid: size > 0 ? (100 * shift) / size : 0,
    },
    difference: {
      area: thinWall.area - exact.area,
      Ix: thinWall.Ix - exact.Ix,
      Iy: thinWall.Iy - exact.Iy,
      Ixy: thinWall.Ixy - exact.Ixy,
      centroid: shift,
    },
  };
}
