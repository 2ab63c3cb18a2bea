/**
 * The integer grid clipper works on. By default it spans INT_RANGE units over the extent, which
 * keeps clipper-lib on its fast 53-bit path. When two distinct exact nodes of the loops that go
 * through clipper lie closer than a few grid units (a sliver between two near edges, the lens of
 * circles that overlap by 1e-9 of their radius), the grid is refined until they are NODE_UNITS
 * apart, up to FINE_RANGE units over the extent. clipper-lib then switches to its full-range
 * arithmetic by itself; it is slower, so only such inputs pay for it. Nodes closer than the
 * exact tolerance (eps) were merged by the arrangement and never ask for a finer grid.
 */
import { hyp } from './carriers';
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
  for (const l of loops) {
    for (const id of ctx.loops[l].ids) {
      const splits = ctx.splits[id];
      const k0 = splits ? splits.length : 0;
      for (let k = -1; k < k0; k++) {
        const r = find(ctx, k < 0 ? ctx.carriers[id].n0 : (splits as number[])[k]);
        if (mark[r]) continue;
        mark[r] = 1;
        roots.push(r);
      }
    }
  }
  const m = roots.length;
  let size = 1;
  while (size < 2 * m) size <<= 1;
  const mask = size - 1;
  const ci = new Int32Array(size), cj = new Int32Array(size), head = new Int32Array(size).fill(-1), count = new Int32Array(size);
  const next = new Int32Array(m).fill(-1);
  const nx = ctx.nx, ny = ctx.ny, ox = ctx.ox, oy = ctx.oy;
  let best = limit;
  for (let k = 0; k < m; k++) {
    const r = roots[k];
    const x = nx[r], y = ny[r];
    const i = Math.floor((x - ox) / limit), j = Math.floor((y - oy) / limit);
    let home = -1;
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const a = i + di, b = j + dj;
        // Open addressing: probe from the cell's hash to its slot or the first empty one.
        let h = (Math.imul(a, 0x27d4eb2d) ^ Math.imul(b, 0x165667b1)) & mask;
        while (head[h] >= 0 && !(ci[h] === a && cj[h] === b)) h = (h + 1) & mask;
        if (di === 0 && dj === 0) home = h;
        for (let o = head[h]; o >= 0; o = next[o]) {
          const q = roots[o];
          const d = hyp(nx[q] - x, ny[q] - y);
          if (d > 0 && d < best) best = d;
        }
      }
    }
    if (head[home] < 0) {
      ci[home] = i;
      cj[home] = j;
    } else if (count[home] >= CROWD) continue;
    next[k] = head[home];
    head[home] = k;
    count[home]++;
  }
  return best;
}
