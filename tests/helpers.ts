/** Small builders and comparison helpers shared by the engine tests. */
import { expect } from 'vitest';
import { circleContour, contourFrom, polygonContour, pushArc, type Contour, type Region } from '../src/geometry/contour';
import { sectionProperties } from '../src/properties/section';

export const rect = (x: number, y: number, w: number, h: number): Contour =>
  polygonContour([
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ]);

export const circle = (cx: number, cy: number, r: number): Contour => circleContour(cx, cy, r);

/** Sector of half-angle alpha about the +x axis with its apex at (cx, cy). */
export function sector(cx: number, cy: number, r: number, alpha: number): Contour {
  const xy = [cx, cy, cx + r * Math.cos(-alpha), cy + r * Math.sin(-alpha)];
  const bulge = [0];
  pushArc(xy, bulge, xy[2], xy[3], cx + r * Math.cos(alpha), cy + r * Math.sin(alpha), 2 * alpha);
  xy.push(cx + r * Math.cos(alpha), cy + r * Math.sin(alpha));
  bulge.push(0);
  return contourFrom(xy, bulge);
}

/** Circular segment of half-angle alpha about +x, bounded by its chord. */
export function segment(cx: number, cy: number, r: number, alpha: number): Contour {
  const xy = [cx + r * Math.cos(-alpha), cy + r * Math.sin(-alpha)];
  const bulge: number[] = [];
  pushArc(xy, bulge, xy[0], xy[1], cx + r * Math.cos(alpha), cy + r * Math.sin(alpha), 2 * alpha);
  xy.push(cx + r * Math.cos(alpha), cy + r * Math.sin(alpha));
  bulge.push(0);
  return contourFrom(xy, bulge);
}

export const props = (region: Region) => sectionProperties(region);

/** |actual − expected| ≤ tol · max(|expected|, scale). */
export function close(actual: number, expected: number, tol = 1e-12, scale = 0): void {
  const err = Math.abs(actual - expected);
  const bound = tol * Math.max(Math.abs(expected), scale);
  if (!(err <= bound)) {
    expect.fail(`expected ${expected}, got ${actual} (relative error ${err / Math.max(Math.abs(expected), scale, 1e-300)}, allowed ${tol})`);
  }
  if (tol <= 1e-9) worst.value = Math.max(worst.value, err / Math.max(Math.abs(expected), scale, 1e-300));
}

/** Largest relative error seen by `close` at tight tolerances in this test file. */
export const worst = { value: 0 };
