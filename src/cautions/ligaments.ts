/**
 * Remaining ligaments: the narrowest width of material next to a cutout, exactly.
 *
 * A cutout is a run of consecutive boundary pieces that a cut made (chosen by the caller: new
 * edges against the baseline, edges of subtracted shapes, or hole loops). Its ligament is the
 * shortest straight segment from one of its pieces to any other piece of the boundary that runs
 * wholly through material: it crosses no boundary and its middle is inside. Pieces that share a
 * vertex with the starting piece are left out (at a corner the "width" would be zero).
 *
 * Candidates are the closed-form critical pairs of closest.ts, taken in order of distance, with
 * pairs of pieces skipped when their boxes are already farther apart than the best width found.
 */
import type { Carrier } from '../boolean/carriers';
import { distanceToBoundary, windingAt, type Boundary, type BoundarySegment } from '../netsection/boundary';
import { lineBreakpoints } from '../netsection/line-crossings';
import { boxGap, closestCandidates, type PointPair } from './closest';

export interface CutRun {
  loop: number;
  segments: BoundarySegment[];
}

export interface Ligament {
  width: number;
  from: { x: number; y: number };
  to: { x: number; y: number };
  /** Middle of the ligament, for the marker. */
  at: { x: number; y: number };
  run: CutRun;
}

/** True when two pieces of one loop share a vertex (consecutive, or the same piece). */
function adjacent(a: BoundarySegment, b: BoundarySegment, loopLength: Map<number, number>): boolean {
  if (a.loop !== b.loop) return false;
  if (a.carrier === b.carrier) return true;
  const n = loopLength.get(a.loop) ?? 0;
  const d = Math.abs(a.index - b.index);
  return d === 1 || d === n - 1;
}

/** True when the open segment p→q runs wholly through material. */
function throughMaterial(boundary: Boundary, p: PointPair): boolean {
  const { tol } = boundary;
  if (!(p.d > 10 * tol)) return false;
  const mx = (p.px + p.qx) / 2, my = (p.py + p.qy) / 2;
  if (distanceToBoundary(boundary.segments, mx, my) <= tol || windingAt(boundary.segments, mx, my) === 0) return false;
  const breaks = lineBreakpoints(boundary.segments, p.px, p.py, p.qx, p.qy, tol);
  return breaks.every((b) => b.t * p.d <= 10 * tol || (1 - b.t) * p.d <= 10 * tol);
}

/**
 * The narrowest width of material from any piece of `from` to any other piece of the boundary,
 * or null when no straight path through material exists.
 */
export function narrowestWidth(boundary: Boundary, from: readonly BoundarySegment[]): PointPair | null {
  const loopLength = new Map(boundary.loops.map((l) => [l.index, contourSegmentCount(l.segments)]));
  const pairs: { s: Carrier; t: Carrier; gap: number }[] = [];
  for (const s of from) {
    for (const t of boundary.segments) {
      if (adjacent(s, t, loopLength)) continue;
      pairs.push({ s: s.carrier, t: t.carrier, gap: boxGap(s.carrier, t.carrier) });
    }
  }
  pairs.sort((a, b) => a.gap - b.gap);
  let best: PointPair | null = null;
  for (const pr of pairs) {
    if (best && pr.gap >= best.d) break;
    const cands = closestCandidates(pr.s, pr.t, boundary.tol).sort((a, b) => a.d - b.d);
    for (const c of cands) {
      if (best && c.d >= best.d) break;
      if (throughMaterial(boundary, c)) {
        best = c;
        break;
      }
    }
  }
  return best;
}

/**
 * Number of segments in the loop's original contour (the index wraps there). Zero-length
 * segments were dropped from `segments`, so the largest index + 1 is used.
 */
function contourSegmentCount(segs: readonly BoundarySegment[]): number {
  let n = 0;
  for (const s of segs) n = Math.max(n, s.index + 1);
  return n;
}

/** Group the chosen pieces into runs of consecutive pieces of one loop. */
export function cutRuns(boundary: Boundary, chosen: (s: BoundarySegment) => boolean): CutRun[] {
  const runs: CutRun[] = [];
  for (const loop of boundary.loops) {
    const segs = loop.segments;
    const n = segs.length;
    const flags = segs.map(chosen);
    if (!flags.some(Boolean)) continue;
    if (flags.every(Boolean)) {
      runs.push({ loop: loop.index, segments: [...segs] });
      continue;
    }
    // Start right after an unchosen piece, so no run is cut in two by the loop's seam.
    const start = flags.findIndex((f, k) => !f && flags[(k + 1) % n]) + 1;
    let cur: BoundarySegment[] = [];
    for (let m = 0; m < n; m++) {
      const k = (start + m) % n;
      if (flags[k]) cur.push(segs[k]);
      else if (cur.length) {
        runs.push({ loop: loop.index, segments: cur });
        cur = [];
      }
    }
    if (cur.length) runs.push({ loop: loop.index, segments: cur });
  }
  return runs;
}

/** The ligament next to each cut run. */
export function ligaments(boundary: Boundary, runs: readonly CutRun[]): Ligament[] {
  const out: Ligament[] = [];
  for (const run of runs) {
    const p = narrowestWidth(boundary, run.segments);
    if (!p) continue;
    out.push({ width: p.d, from: { x: p.px, y: p.py }, to: { x: p.qx, y: p.qy }, at: { x: (p.px + p.qx) / 2, y: (p.py + p.qy) / 2 }, run });
  }
  return out;
}
