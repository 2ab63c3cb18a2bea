/**
 * The integer grid clipper works on. By default it spans INT_RANGE units over the extent, which
 * keeps clipper-lib on its fast 53-bit path. When two distinct exact nodes of the loops that go
 * through clipper lie closer than a few grid units (a sliver between two near edges, the lens of
 * circles that overlap by 1e-9 of their radius), the grid is refined until they are NODE_UNITS
 * apart, up to FINE_RANGE units over the extent. clipper-lib then switches to its full-range
 * arithmetic by itself; it is slower, so only such inputs pay for it. Nodes closer than the
 * exact tolerance (eps) were merged by the arrangement and never ask for a finer grid. The
 * close pairs are found while the chord paths group their records (chords.ts), in the same pass;
 * a refinement builds the paths again, which only such inputs pay for.
 */
import { INT_RANGE, type Ctx } from './context';

/** Distinct nodes closer than this many grid units refine the grid. */
export const NODE_UNITS = 8;
/** Finest grid: integer coordinates up to this size keep clipper's double arithmetic exact to well under a unit. */
const FINE_RANGE = 1e12;

/** Sets the default grid: INT_RANGE units over the extent. */
export function coarseGrid(ctx: Ctx): void {
  ctx.scale = INT_RANGE / ctx.ext;
  ctx.unit = 1 / ctx.scale;
}

/**
 * A finer grid when two distinct exact nodes lie `closest` apart, closer than NODE_UNITS units
 * (chords.ts finds them while grouping its records): true when the grid changed, so the paths
 * must be built again.
 */
export function refineGrid(ctx: Ctx, closest: number): boolean {
  if (!(closest < NODE_UNITS * ctx.unit)) return false;
  const scale = Math.min(FINE_RANGE / ctx.ext, NODE_UNITS / Math.max(closest, ctx.eps));
  if (!(scale > ctx.scale * 1.5)) return false;
  ctx.scale = scale;
  ctx.unit = 1 / scale;
  return true;
}
