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

/** Nodes kept per cell for comparison. */
const CROWD = 16;

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
 * (else `limit`). Nodes are hashed into cells of size `limit` (open addressing on typed arrays,
 * chains through `next`) and each is compared with the nodes of its 3 × 3 cells, so the work is
 * linear in the node count. A cell holding many nodes is below the grid wherever they sit: past
 * CROWD of them, further ones are not compared.
 */
function closestNodes(ctx: Ctx, loops: readonly number[], limit: number): number {
  const nn = ctx.nx.length;
  const mark = new Uint8Array(nn);
  const roots: number[] = [];
  const take = (nd: number) => {
    const r = find(ctx, nd);
    if (!mark[r]) {
      mark[r] = 1;
      roots.push(r);
    }
  };
  for (const l of loops) {
    for (const id of ctx.loops[l].ids) {
      take(ctx.carriers[id].n0);
      for (const s of ctx.splits[id] ?? []) take(s);
    }
  }
  const m = roots.length;
  let size = 1;
  while (size < 2 * m) size <<= 1;
  const ci = new Int32Array(size), cj = new Int32Array(size), head = new Int32Array(size).fill(-1), count = new Int32Array(size);
  const next = new Int32Array(m).fill(-1);
  const slot = (i: number, j: number, insert: boolean): number => {
    let h = (Math.imul(i, 0x27d4eb2d) ^ Math.imul(j, 0x165667b1)) & (size - 1);
    for (;;) {
      if (head[h] < 0) return insert ? h : -1;
      if (ci[h] === i && cj[h] === j) return h;
      h = (h + 1) & (size - 1);
    }
  };
  let best = limit;
  for (let k = 0; k < m; k++) {
    const r = roots[k];
    const x = ctx.nx[r], y = ctx.ny[r];
    const i = Math.floor((x - ctx.ox) / limit), j = Math.floor((y - ctx.oy) / limit);
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const h = slot(i + di, j + dj, false);
        if (h < 0) continue;
        for (let o = head[h]; o >= 0; o = next[o]) {
          const q = roots[o];
          const d = Math.hypot(ctx.nx[q] - x, ctx.ny[q] - y);
          if (d > 0 && d < best) best = d;
        }
      }
    }
    const h = slot(i, j, true);
    if (head[h] < 0) {
      ci[h] = i;
      cj[h] = j;
    } else if (count[h] >= CROWD) continue;
    next[k] = head[h];
    head[h] = k;
    count[h]++;
  }
  return best;
}
