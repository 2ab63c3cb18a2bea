/**
 * The integer grid clipper works on. By default it spans INT_RANGE units over the extent, which
 * keeps clipper-lib on its fast 53-bit path. When two distinct exact nodes of the loops that go
 * through clipper lie closer than a few grid units (a sliver between two near edges, the lens of
 * circles that overlap by 1e-9 of their radius), the grid is refined until they are NODE_UNITS
 * apart, up to FINE_RANGE units over the extent. clipper-lib then switches to its full-range
 * arithmetic by itself; it is slower, so only such inputs pay for it. Nodes closer than the
 * exact tolerance (eps) were merged by the arrangement and never ask for a finer grid.
 */
import { find, INT_RANGE, type Ctx } from './context';

/** Distinct nodes closer than this many grid units refine the grid. */
const NODE_UNITS = 8;
/** Finest grid: integer coordinates up to this size keep clipper's double arithmetic exact to well under a unit. */
const FINE_RANGE = 1e12;

/** Cells per row in the bucket key (the extent spans INT_RANGE / NODE_UNITS cells at most). */
const CELL_KEY = 1e8;

/** Sets ctx.scale and ctx.unit for the loops that go through clipper. */
export function chooseGrid(ctx: Ctx, loops: readonly number[]): void {
  const coarse = INT_RANGE / ctx.ext;
  const want = NODE_UNITS / coarse; // node distance below which the coarse grid is too coarse
  const d = closestNodes(ctx, loops, want);
  let scale = coarse;
  if (d < want) scale = Math.min(FINE_RANGE / ctx.ext, Math.max(coarse, NODE_UNITS / Math.max(d, ctx.eps)));
  ctx.scale = scale;
  ctx.unit = 1 / scale;
}

/**
 * The smallest distance between two distinct nodes (roots) of the given loops, if below `limit`
 * (else `limit`): nodes are bucketed in cells of size `limit`, and only neighbouring cells are
 * compared, so the work is linear in the node count for any input.
 */
function closestNodes(ctx: Ctx, loops: readonly number[], limit: number): number {
  const seen = new Set<number>();
  const cells = new Map<number, number[]>();
  let best = limit;
  const visit = (nd: number) => {
    const r = find(ctx, nd);
    if (seen.has(r)) return;
    seen.add(r);
    const x = ctx.nx[r], y = ctx.ny[r];
    const i = Math.floor((x - ctx.ox) / limit), j = Math.floor((y - ctx.oy) / limit);
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const list = cells.get((i + di) * CELL_KEY + (j + dj));
        if (!list) continue;
        for (const o of list) {
          const dd = Math.hypot(ctx.nx[o] - x, ctx.ny[o] - y);
          if (dd > 0 && dd < best) best = dd;
        }
      }
    }
    const key = i * CELL_KEY + j;
    const list = cells.get(key);
    if (list) {
      // A crowded cell is below the grid wherever its nodes sit: comparing more adds nothing.
      if (list.length < 16) list.push(r);
    } else cells.set(key, [r]);
  };
  for (const l of loops) {
    for (const id of ctx.loops[l].ids) {
      const c = ctx.carriers[id];
      visit(c.n0);
      for (const s of ctx.splits[id] ?? []) visit(s);
    }
  }
  return best;
}
