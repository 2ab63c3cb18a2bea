/**
 * Quality mesh refinement: Ruppert's Delaunay refinement, run in rounds over a constrained
 * Delaunay triangulation that is rebuilt each round (cdt.ts).
 *
 * No library in the allowed set refines a triangulation for quality, so the rounds are written
 * here. Each round:
 * 1. triangulate the current points and chords and label the triangles by piece;
 * 2. grade the wanted sizes from the boundary inwards (grading.ts);
 * 3. split every chord that is too long for its size or is encroached (a vertex of a triangle
 *    beside it lies inside its diametral circle); a round that splits chords does nothing else;
 * 4. otherwise take the bad triangles (smallest angle below the bound, or circumradius too large
 *    for the graded size), largest first, and insert their circumcentres. A circumcentre that
 *    would encroach a chord splits that chord instead (Ruppert's rule). Circumcentres whose
 *    cavities (the triangles the new point would replace) overlap wait for the next round, so the
 *    points inserted together behave as if inserted one after the other.
 * The rounds end when nothing is bad. Termination near small input angles is kept by splitting
 * chords at the tip of an acute wedge on concentric shells (pslg.ts), by leaving alone triangles
 * whose short edge joins the two sides of such a wedge, by never refining below `hMin`, and, as a
 * last guard, by a point budget (reported as a warning).
 */
import Flatbush from 'flatbush';
import { buildCdt, type Cdt, type ChordList, type Place } from './cdt';
import type { EdgeShape } from './edge-geometry';
import { gradedSizes } from './grading';
import { INTERIOR, Pslg } from './pslg';

export interface RefineRules {
  /** Smallest angle wanted in every triangle (degrees). */
  minAngleDeg: number;
  /** How fast the element size may grow with distance from a small feature. */
  rate: number;
  hMax: number;
  hMin: number;
  /** Point budget: refinement stops (with a warning) beyond it. */
  maxPoints: number;
}

/** A triangle whose circumradius exceeds this multiple of the graded size is split (≈ 1.2/√3). */
const SIZE_RADIUS = 0.7;
/** A chord longer than this multiple of the graded size at its ends is split. */
const CHORD_SLACK = 1.25;
const MAX_ROUNDS = 400;

/** A straight-sided triangle mesh of the section, with the exact edge behind each boundary chord. */
export interface LinearMesh {
  x: Float64Array;
  y: Float64Array;
  /** Three vertex ids per triangle, counter-clockwise. */
  tri: Uint32Array;
  /** Piece of each triangle. */
  piece: Int32Array;
  chordA: Int32Array;
  chordB: Int32Array;
  chordEdge: Int32Array;
  chordT0: Float64Array;
  chordT1: Float64Array;
  shapes: readonly EdgeShape[];
  warnings: string[];
}

export function* refineMesh(pslg: Pslg, rules: RefineRules, place: Place): Generator<number, LinearMesh> {
  const sin2 = Math.sin((rules.minAngleDeg * Math.PI) / 180) ** 2;
  const edges = pslg.boundary.edges;
  const warnings: string[] = [];
  for (let round = 0; ; round++) {
    const n = pslg.pointCount;
    const coords = interleave(pslg.x.data, pslg.y.data, n);
    const nc = pslg.chordCount;
    const chords: ChordList = {
      a: pslg.ca.view(),
      b: pslg.cb.view(),
      left: Int32Array.from(pslg.cEdge.view(), (k) => edges[k].left),
      right: Int32Array.from(pslg.cEdge.view(), (k) => edges[k].right),
      count: nc,
    };
    const cdt = buildCdt(coords, chords, place);
    const inside = (t: number) => cdt.label[t] >= 0;
    const H = gradedSizes(coords, cdt.tri, inside, pslg.h.view(), rules.hMax, rules.rate);

    const splits = chordsToSplit(pslg, cdt, coords, H, rules.hMin);
    const fresh: number[] = [];
    if (splits.size === 0) insertCircumcentres(pslg, cdt, coords, H, rules, sin2, splits, fresh);
    const budget = n >= rules.maxPoints || round >= MAX_ROUNDS;
    if ((splits.size === 0 && fresh.length === 0) || budget) {
      if (budget) warnings.push(`the mesh stopped at ${n} points before every element reached the quality target; results may be less accurate`);
      return finalMesh(pslg, cdt, coords, warnings);
    }
    const used = new Uint8Array(n);
    for (let t = 0; t < cdt.label.length; t++) if (inside(t)) for (let j = 0; j < 3; j++) used[cdt.tri[3 * t + j]] = 1;
    pslg.removeUnusedInterior(used);
    for (const [chord, t] of splits) pslg.splitChord(chord, t);
    for (let i = 0; i < fresh.length; i += 2) pslg.addPoint(fresh[i], fresh[i + 1], Infinity, INTERIOR);
    yield 1 - 1 / (1 + round / 6);
  }
}

function interleave(x: Float64Array, y: Float64Array, n: number): Float64Array {
  const c = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    c[2 * i] = x[i];
    c[2 * i + 1] = y[i];
  }
  return c;
}

/** Chords that are too long for the graded size or encroached by a triangle vertex beside them. */
function chordsToSplit(pslg: Pslg, cdt: Cdt, coords: Float64Array, H: Float64Array, hMin: number): Map<number, number> {
  const splits = new Map<number, number>();
  const n = coords.length >> 1;
  const byEnds = new Map<number, number>();
  for (let i = 0; i < pslg.chordCount; i++) {
    const a = pslg.ca.data[i], b = pslg.cb.data[i];
    byEnds.set(a < b ? a * n + b : b * n + a, i);
    const len = Math.sqrt(sq2(coords[2 * b] - coords[2 * a], coords[2 * b + 1] - coords[2 * a + 1]));
    if (len > CHORD_SLACK * Math.min(H[a], H[b]) && len > 2 * hMin) splits.set(i, pslg.splitParameter(i, hMin));
  }
  const { tri, chord, label } = cdt;
  for (let t = 0; t < label.length; t++) {
    if (label[t] < 0) continue;
    for (let j = 0; j < 3; j++) {
      const e = 3 * t + j;
      if (!chord[e]) continue;
      const a = tri[e], b = tri[3 * t + ((j + 1) % 3)], c = tri[3 * t + ((j + 2) % 3)];
      const dot = (coords[2 * a] - coords[2 * c]) * (coords[2 * b] - coords[2 * c]) + (coords[2 * a + 1] - coords[2 * c + 1]) * (coords[2 * b + 1] - coords[2 * c + 1]);
      if (dot >= 0) continue;
      const i = byEnds.get(a < b ? a * n + b : b * n + a);
      if (i === undefined || splits.has(i)) continue;
      const len = Math.sqrt(sq2(coords[2 * b] - coords[2 * a], coords[2 * b + 1] - coords[2 * a + 1]));
      if (len > 2 * hMin) splits.set(i, pslg.splitParameter(i, hMin));
    }
  }
  return splits;
}

function insertCircumcentres(
  pslg: Pslg,
  cdt: Cdt,
  coords: Float64Array,
  H: Float64Array,
  rules: RefineRules,
  sin2: number,
  splits: Map<number, number>,
  fresh: number[],
): void {
  const { tri, half, chord, label } = cdt;
  const nt = label.length;
  const ccx = new Float64Array(nt), ccy = new Float64Array(nt), cr2 = new Float64Array(nt);
  const bad: number[] = [];
  for (let t = 0; t < nt; t++) {
    if (label[t] < 0) continue;
    const a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
    const ax = coords[2 * a], ay = coords[2 * a + 1];
    const bx = coords[2 * b] - ax, by = coords[2 * b + 1] - ay;
    const cx = coords[2 * c] - ax, cy = coords[2 * c + 1] - ay;
    const d = 2 * (bx * cy - by * cx);
    const b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
    const ux = (cy * b2 - by * c2) / d, uy = (bx * c2 - cx * b2) / d;
    ccx[t] = ax + ux;
    ccy[t] = ay + uy;
    const R2 = ux * ux + uy * uy;
    cr2[t] = R2;
    if (!(R2 > rules.hMin * rules.hMin)) continue;
    const e2 = (bx - cx) ** 2 + (by - cy) ** 2;
    let short2 = b2, p = a, q = b;
    if (c2 < short2) [short2, p, q] = [c2, a, c];
    if (e2 < short2) [short2, p, q] = [e2, b, c];
    const hT = (H[a] + H[b] + H[c]) / 3;
    const poor = short2 < 4 * R2 * sin2;
    const big = R2 > (SIZE_RADIUS * hT) ** 2;
    if (!poor && !big) continue;
    if (poor && !big && pslg.onAcutePair(p, q)) continue;
    bad.push(t);
  }
  if (bad.length === 0) return;
  bad.sort((s, t) => cr2[t] - cr2[s]);

  // Diametral circles of the chords, to find the chords a new point would encroach.
  const nc = pslg.chordCount;
  const index = new Flatbush(nc);
  for (let i = 0; i < nc; i++) {
    const a = pslg.ca.data[i], b = pslg.cb.data[i];
    const mx = (coords[2 * a] + coords[2 * b]) / 2, my = (coords[2 * a + 1] + coords[2 * b + 1]) / 2;
    const r = Math.sqrt(sq2(coords[2 * b] - coords[2 * a], coords[2 * b + 1] - coords[2 * a + 1])) / 2;
    index.add(mx - r, my - r, mx + r, my + r);
  }
  index.finish();

  const taken = new Uint8Array(nt);
  const seen = new Int32Array(nt).fill(-1);
  const cavity: number[] = [];
  const stack: number[] = [];
  for (const t of bad) {
    const px = ccx[t], py = ccy[t];
    let encroached = false;
    for (const i of index.search(px, py, px, py)) {
      const a = pslg.ca.data[i], b = pslg.cb.data[i];
      const dot = (coords[2 * a] - px) * (coords[2 * b] - px) + (coords[2 * a + 1] - py) * (coords[2 * b + 1] - py);
      if (dot >= 0) continue;
      encroached = true;
      const len = Math.sqrt(sq2(coords[2 * b] - coords[2 * a], coords[2 * b + 1] - coords[2 * a + 1]));
      if (len > 2 * rules.hMin && !splits.has(i)) splits.set(i, pslg.splitParameter(i, rules.hMin));
    }
    if (encroached) continue;
    // The cavity: triangles of this face whose circumcircle holds the new point. The point must
    // lie in one of them; if it does not, it lies beyond a chord the encroachment test did not
    // catch (near a tangency or below hMin) and is left out, or it would fall outside the section
    // and come back every round.
    cavity.length = 0;
    stack.push(t);
    seen[t] = t;
    let clash = false, holds = false;
    while (stack.length) {
      const s = stack.pop()!;
      if (taken[s]) clash = true;
      if (!holds && contains(coords, tri, s, px, py)) holds = true;
      cavity.push(s);
      for (let j = 0; j < 3; j++) {
        const e = 3 * s + j;
        if (chord[e] || half[e] < 0) continue;
        const u = Math.floor(half[e] / 3);
        if (seen[u] === t || label[u] < 0) continue;
        seen[u] = t;
        if ((px - ccx[u]) ** 2 + (py - ccy[u]) ** 2 < cr2[u]) stack.push(u);
      }
    }
    if (clash || !holds) continue;
    for (const s of cavity) taken[s] = 1;
    fresh.push(px, py);
  }
}

/** True when (px, py) lies in triangle t (counter-clockwise), its sides included. */
function contains(coords: Float64Array, tri: Uint32Array, t: number, px: number, py: number): boolean {
  for (let j = 0; j < 3; j++) {
    const a = tri[3 * t + j], b = tri[3 * t + ((j + 1) % 3)];
    const ax = coords[2 * a], ay = coords[2 * a + 1];
    if ((coords[2 * b] - ax) * (py - ay) - (coords[2 * b + 1] - ay) * (px - ax) < 0) return false;
  }
  return true;
}

/** The section's triangles and the points they use, renumbered. */
function finalMesh(pslg: Pslg, cdt: Cdt, coords: Float64Array, warnings: string[]): LinearMesh {
  const n = coords.length >> 1;
  const { tri, label } = cdt;
  const map = new Int32Array(n).fill(-1);
  let nt = 0;
  for (let t = 0; t < label.length; t++) if (label[t] >= 0) nt++;
  const outTri = new Uint32Array(3 * nt);
  const piece = new Int32Array(nt);
  let m = 0, k = 0;
  for (let t = 0; t < label.length; t++) {
    if (label[t] < 0) continue;
    for (let j = 0; j < 3; j++) {
      const v = tri[3 * t + j];
      if (map[v] < 0) map[v] = m++;
      outTri[3 * k + j] = map[v];
    }
    piece[k++] = label[t];
  }
  const x = new Float64Array(m), y = new Float64Array(m);
  for (let v = 0; v < n; v++)
    if (map[v] >= 0) {
      x[map[v]] = coords[2 * v];
      y[map[v]] = coords[2 * v + 1];
    }
  const nc = pslg.chordCount;
  return {
    x,
    y,
    tri: outTri,
    piece,
    chordA: Int32Array.from(pslg.ca.view(), (v) => map[v]),
    chordB: Int32Array.from(pslg.cb.view(), (v) => map[v]),
    chordEdge: pslg.cEdge.view().slice(0, nc),
    chordT0: pslg.ct0.view().slice(0, nc),
    chordT1: pslg.ct1.view().slice(0, nc),
    shapes: pslg.shapes,
    warnings,
  };
}

/** Squared length of (dx, dy) (Math.hypot is slow in hot loops). */
function sq2(dx: number, dy: number): number {
  return dx * dx + dy * dy;
}
