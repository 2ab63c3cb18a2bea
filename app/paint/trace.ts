/**
 * Region outlines as canvas paths. Arcs become short chords here, for drawing only (the tolerance
 * is a fraction of a pixel), and the polylines are cached by region identity and tolerance so a
 * repaint that did not change a region costs nothing.
 */
import { chainPolyline, contourPolyline, type LineChain, type Region } from '../../src';
import { screenX, screenY, type ViewTransform } from '../view';

type Poly = Float64Array;

const polyCache = new WeakMap<Region, { tol: number; polys: Poly[] }>();

/** Polylines (world coordinates) of a region's contours, cached by region identity and tolerance. */
export function regionPolylines(region: Region, tol: number): Poly[] {
  const hit = polyCache.get(region);
  if (hit && hit.tol <= tol * 1.5 && hit.tol >= tol / 3) return hit.polys;
  const polys = region.map((c) => Float64Array.from(contourPolyline(c, tol)));
  polyCache.set(region, { tol, polys });
  return polys;
}

const chainCache = new WeakMap<LineChain, { tol: number; poly: Poly }>();

/** Points along an open or closed line chain (world coordinates), cached like regionPolylines. */
export function chainPoints(chain: LineChain, tol: number): Poly {
  const hit = chainCache.get(chain);
  if (hit && hit.tol <= tol * 1.5 && hit.tol >= tol / 3) return hit.poly;
  const poly = Float64Array.from(chainPolyline(chain, tol));
  chainCache.set(chain, { tol, poly });
  return poly;
}

/** Add line chains to the current path, in screen coordinates (open chains stay open). */
export function traceChains(ctx: CanvasRenderingContext2D, chains: readonly LineChain[], v: ViewTransform): void {
  for (const c of chains) {
    const p = chainPoints(c, 0.35 / v.scale);
    const n = p.length >> 1;
    if (n < 2) continue;
    const x0 = screenX(v, p[0]), y0 = screenY(v, p[1]);
    ctx.moveTo(x0, y0);
    for (let i = 1; i < n; i++) ctx.lineTo(screenX(v, p[2 * i]), screenY(v, p[2 * i + 1]));
    if (c.closed) ctx.lineTo(x0, y0); // not closePath: see traceRegion
  }
}

const pathCache = new WeakMap<Region, { scale: number; ox: number; oy: number; path: Path2D }>();

/**
 * The region's outline as a Path2D in screen coordinates, kept for the region and view: a layer
 * that fills the region and strokes it again after painting the shapes traces it once per frame.
 */
export function regionPath(region: Region, v: ViewTransform): Path2D {
  const hit = pathCache.get(region);
  if (hit && hit.scale === v.scale && hit.ox === v.ox && hit.oy === v.oy) return hit.path;
  const path = new Path2D();
  traceRegion(path, region, v);
  pathCache.set(region, { scale: v.scale, ox: v.ox, oy: v.oy, path });
  return path;
}

/** Add the region's contours to the current path (or to a Path2D), in screen coordinates. */
export function traceRegion(ctx: CanvasRenderingContext2D | Path2D, region: Region, v: ViewTransform): void {
  const polys = regionPolylines(region, 0.35 / v.scale);
  for (const p of polys) {
    const n = p.length >> 1;
    if (n < 2) continue;
    const x0 = screenX(v, p[0]), y0 = screenY(v, p[1]);
    ctx.moveTo(x0, y0);
    for (let i = 1; i < n; i++) ctx.lineTo(screenX(v, p[2 * i]), screenY(v, p[2 * i + 1]));
    // Back to the start by a line, not closePath: in Chromium each closePath costs time in
    // proportion to the whole path so far, and a plate of 4000 holes spent 10 s of a 20-move drag
    // in it (CDP profile). A fill closes every sub-path anyway.
    ctx.lineTo(x0, y0);
  }
}
