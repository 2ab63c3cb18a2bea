/**
 * The boolean pipeline. Clipper decides topology only; exact geometry gives the numbers.
 *
 *   1. Carriers: every source segment becomes an exact line or arc (arcs over 180 degrees are split).
 *   2. Arrangement: exact intersections, touches and overlaps between carriers are computed once and
 *      shared as nodes, so both operands pass through the same exact point.
 *   3. Chording: each carrier is cut at its nodes; arc pieces become short chords, inside or
 *      outside their circle as whatever comes near demands (arrangement.ts, nearPair); all
 *      points are scaled to integers around the inputs' centre and tagged (Z) with their vertex
 *      record.
 *   4. Clipper runs; new crossings get Z through ZFillFunction (side table of crossing edges).
 *   5. Tracing: each output edge is traced to its carrier; runs on one carrier become one exact
 *      segment; run ends are placed on exact nodes or exact carrier intersections.
 *
 * Loops that touch no other loop skip steps 3 to 5: exact winding numbers settle them
 * (isolated.ts). Only clusters of loops that meet go through the grid.
 */
import ClipperLib from 'clipper-lib';
import type { IntPoint } from 'clipper-lib';
import { lengthOf, type Contour, type Region } from '../geometry/contour';
import { buildArrangement, buildCarriers } from './arrangement';
import { CarrierStore } from './carriers';
import { buildPaths, resetPaths } from './chords';
import { INT_RANGE, REL_EPS, type Ctx, type Mode, type SourceGroup } from './context';
import { digonLoops, findDigons } from './digons';
import { coarseGrid, refineGrid } from './grid';
import { partitionLoops, settleFreeLoops } from './isolated';
import { tracePath } from './trace';

export type { Mode, SourceGroup } from './context';

ClipperLib.use_xyz = true;

/** Run the pipeline on source groups (group 0 = subject, group 1 = clips). */
export function runBoolean(groups: readonly SourceGroup[], mode: Mode): { region: Region; contact: boolean } {
  // Extent: vertex bounds widened by each arc's bulge height (a cheap upper bound of the exact
  // bounds; only the integer scale depends on it).
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  let vertices = 0;
  for (const g of groups) {
    for (const c of g.contours) {
      const xy = c.xy, n = xy.length >> 1;
      vertices += n;
      for (let i = 0; i < n; i++) {
        const x = xy[2 * i], y = xy[2 * i + 1];
        if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
        let h = 0;
        const b = c.bulge ? c.bulge[i] : 0;
        if (b !== 0 && Number.isFinite(b)) {
          const j = i + 1 === n ? 0 : i + 1;
          const L = lengthOf(xy[2 * j] - x, xy[2 * j + 1] - y);
          // Height of the arc above its chord, or its whole diameter for a sweep over 180 deg.
          h = Math.abs(b) <= 1 ? (Math.abs(b) * L) / 2 : (L / 2) * (Math.abs(b) + 1 / Math.abs(b));
          if (!Number.isFinite(h)) h = 0;
        }
        if (x - h < xmin) xmin = x - h;
        if (x + h > xmax) xmax = x + h;
        if (y - h < ymin) ymin = y - h;
        if (y + h > ymax) ymax = y + h;
      }
    }
  }
  const ext = Math.max(xmax - xmin, ymax - ymin) / 2;
  if (!(ext > 0) || !Number.isFinite(ext)) return { region: [], contact: false };
  const scale = INT_RANGE / ext;
  const ctx: Ctx = {
    mode, ext, eps: REL_EPS * ext, unit: 1 / scale, ox: (xmin + xmax) / 2, oy: (ymin + ymax) / 2, scale,
    carriers: [], store: new CarrierStore(vertices + 16), loops: [], loopOf: [], touched: [], index: null, maxTol: -1, crowded: new Uint8Array(0), nx: [], ny: [], ncar: [], parent: [], splits: [], near: [], chordSag: [], contact: false, nearGap: Infinity, loopLo: [], loopHi: [], trustLoops: mode !== 'evenodd',
    rx: [], ry: [], rX: [], rY: [], rExact: [], rCar: [], rAll: [], rAlt: [], chordPieces: [], digons: [], digonsOf: new Map(), zf: [],
  };
  buildCarriers(ctx, groups);
  buildArrangement(ctx);
  const { clipped, free, box } = partitionLoops(ctx);
  const region: Contour[] = [];
  if (clipped.length) {
    coarseGrid(ctx);
    refineGrid(ctx, ctx.nearGap);
    let paths = buildPaths(ctx, clipped);
    if (refineGrid(ctx, paths.closest)) {
      resetPaths(ctx);
      paths = buildPaths(ctx, clipped);
    }
    const { subj, clip } = paths;
    findDigons(ctx);
    ClipperLib.use_xyz = true; // module-wide flag: set again in case another user turned it off
    const cpr = new ClipperLib.Clipper();
    cpr.ZFillFunction = (b1, t1, b2, t2, pt) => {
      ctx.zf.push(b1.Z ?? 0, t1.Z ?? 0, b2.Z ?? 0, t2.Z ?? 0);
      pt.Z = -(ctx.zf.length / 4);
    };
    const PT = ClipperLib.PolyType, PF = ClipperLib.PolyFillType, CT = ClipperLib.ClipType;
    if (subj.length) cpr.AddPaths(subj, PT.ptSubject, true);
    if (clip.length) cpr.AddPaths(clip, PT.ptClip, true);
    const sol: IntPoint[][] = [];
    const ct = mode === 'union' || mode === 'evenodd' ? CT.ctUnion : mode === 'difference' ? CT.ctDifference : CT.ctIntersection;
    const fill = mode === 'evenodd' ? PF.pftEvenOdd : PF.pftNonZero;
    cpr.Execute(ct, sol, fill, fill);
    for (const p of sol) {
      const c = tracePath(ctx, p);
      if (c) region.push(c);
    }
    for (const c of digonLoops(ctx)) region.push(c);
  }
  for (const c of settleFreeLoops(ctx, free, box)) region.push(c);
  return { region, contact: ctx.contact };
}
