/**
 * Separate parts of a section: each outer loop (CCW) bounds one piece of material, with the holes
 * that lie inside it and outside any smaller piece. A section of two or more pieces acts as one
 * only if the pieces are tied together elsewhere along the member, so the caution names where
 * the pieces come closest (the narrowest gap, exactly, between their outlines): that is where a
 * cut went through. With three or more pieces, the gaps reported are the shortest links that
 * join them all (a minimum spanning tree over the pieces' nearest approaches).
 */
import type { Boundary, BoundaryLoop } from '../netsection/boundary';
import { windingAt } from '../netsection/boundary';
import { boxGap, closestPair, type PointPair } from './closest';

export interface SectionPart {
  /** Contour index of the outer loop. */
  loop: number;
  /** Net area: the outer loop less its holes. */
  area: number;
  holes: number[];
}

export interface PartGap {
  a: number;
  b: number;
  pair: PointPair;
  /** Middle of the narrowest gap, for the marker. */
  at: { x: number; y: number };
}

/** The pieces of material, largest first. */
export function sectionParts(boundary: Boundary): SectionPart[] {
  const outers = boundary.loops.filter((l) => l.kind === 'outer');
  const parts: SectionPart[] = outers.map((l) => ({ loop: l.index, area: l.signedArea, holes: [] }));
  for (const h of boundary.loops) {
    if (h.kind !== 'hole') continue;
    const c = h.segments[0].carrier;
    // The smallest outer loop that contains the hole's first vertex owns it.
    let owner = -1;
    outers.forEach((o, k) => {
      if (windingAt(o.segments, c.ax, c.ay) === 0 && !onLoop(o, c.ax, c.ay, boundary.tol)) return;
      if (owner < 0 || o.signedArea < outers[owner].signedArea) owner = k;
    });
    if (owner >= 0) {
      parts[owner].holes.push(h.index);
      parts[owner].area += h.signedArea;
    }
  }
  return parts.sort((p, q) => q.area - p.area);
}

function onLoop(l: BoundaryLoop, x: number, y: number, tol: number): boolean {
  return l.segments.some((s) => Math.hypot(s.carrier.ax - x, s.carrier.ay - y) <= tol);
}

/** Narrowest gap between the outlines of two parts. */
function gapBetween(a: BoundaryLoop, b: BoundaryLoop, tol: number): PointPair {
  let best: PointPair | null = null;
  for (const s of a.segments) {
    for (const t of b.segments) {
      if (best && boxGap(s.carrier, t.carrier) >= best.d) continue;
      const p = closestPair(s.carrier, t.carrier, tol);
      if (!best || p.d < best.d) best = p;
    }
  }
  return best as PointPair;
}

/** The gaps that join all parts with the shortest links (none for a single part). */
export function partGaps(boundary: Boundary, parts: readonly SectionPart[]): PartGap[] {
  if (parts.length < 2) return [];
  const loopOf = (p: SectionPart) => boundary.loops.find((l) => l.index === p.loop) as BoundaryLoop;
  const pairs: { a: number; b: number; pair: PointPair }[] = [];
  for (let i = 0; i < parts.length; i++) {
    for (let j = i + 1; j < parts.length; j++) pairs.push({ a: i, b: j, pair: gapBetween(loopOf(parts[i]), loopOf(parts[j]), boundary.tol) });
  }
  pairs.sort((p, q) => p.pair.d - q.pair.d);
  // Kruskal: keep a link when it joins two groups not yet joined.
  const group = parts.map((_, k) => k);
  const find = (k: number): number => (group[k] === k ? k : (group[k] = find(group[k])));
  const out: PartGap[] = [];
  for (const p of pairs) {
    const ga = find(p.a), gb = find(p.b);
    if (ga === gb) continue;
    group[ga] = gb;
    out.push({ ...p, at: { x: (p.pair.px + p.pair.qx) / 2, y: (p.pair.py + p.pair.qy) / 2 } });
  }
  return out;
}
