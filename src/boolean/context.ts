/**
 * Shared state of one boolean call: tolerances, carriers, exact nodes (with union-find for
 * coincident points), per-carrier split points and the vertex records behind clipper's Z tags.
 */
import type Flatbush from 'flatbush';
import type { Carrier, CarrierStore } from './carriers';
import type { Contour } from '../geometry/contour';

export type Mode = 'union' | 'difference' | 'intersection' | 'evenodd';

/** Largest integer coordinate used (clipper JS leaves its fast path above 47453132). */
export const INT_RANGE = 4e7;
/** Largest angle (radians) spanned by one chord: sagitta <= (1 - cos(0.1)) r ~ 5e-3 r. */
export const MAX_STEP = 0.2;
export const SAG_MAX = 1 - Math.cos(MAX_STEP / 2);
/**
 * Largest angle spanned by one chord of an arc whose box meets no carrier but its own loop
 * neighbours (a fillet inside a profile): nothing can come between such an arc and its chords,
 * so coarse chords decide the same topology, and the arc is restored exactly on output.
 */
export const FREE_STEP = Math.PI / 4;
/** Smallest relative sagitta used when refining near-tangent arcs (caps the chord count). */
export const SAG_FLOOR = 1e-6;
/** Arcs with a radius above this multiple of the extent are traced as their chords. */
export const FLAT_RADIUS = 1e5;
/** Exact-geometry tolerance relative to the extent: points closer than this are one point. */
export const REL_EPS = 1e-10;

/**
 * Two carrier pieces joining the same two nodes with one chord each: clipper sees one edge
 * where the exact geometry has a thin two-sided loop (a lens, a flat arc on its own chord).
 */
export interface Digon {
  /** The carriers and the nodes they join. */
  c1: number;
  c2: number;
  n1: number;
  n2: number;
  /** The carrier that bounds the result when exactly one of them does, else −1. */
  pick: number;
  /** The digon's inside belongs to the result. */
  inside: boolean;
}

export interface SourceGroup {
  contours: readonly Contour[];
  group: number;
}

export interface Ctx {
  mode: Mode;
  ext: number;
  eps: number;
  unit: number;
  ox: number;
  oy: number;
  scale: number;
  carriers: Carrier[];
  /** The carriers' numbers (carriers.ts). */
  store: CarrierStore;
  /** Per contour: the carrier ids in order. */
  loops: { group: number; ids: number[] }[];
  /** Per carrier: its loop (index into loops). */
  loopOf: number[];
  /** Per loop: 1 when it meets another loop or itself anywhere but at its own vertices. */
  touched: number[];
  /** The carriers' spatial index (spatial.ts), built on first use. */
  index: Flatbush | null;
  /** Largest carrier tolerance of the trace (trace.ts), −1 until computed. */
  maxTol: number;
  /** Per carrier: first and last carrier id of its loop (ids of one loop are consecutive). */
  loopLo: number[];
  loopHi: number[];
  /** Inputs are well-formed loops: neighbours on a loop meet only at their shared vertex. */
  trustLoops: boolean;
  nx: number[];
  ny: number[];
  /**
   * Per node: the carriers through it. A source vertex's entry (node k starts carrier k and ends
   * the one before it on its loop) is null until first asked for through nodeCarriers: a plate
   * with thousands of holes would otherwise build one small array per vertex that is never read.
   */
  ncar: (number[] | null)[];
  parent: number[];
  splits: (number[] | null)[];
  /** Per carrier: 1 when its box meets a carrier other than its loop neighbours (arrangement.ts). */
  crowded: Uint8Array;
  /**
   * Per arc carrier: the sides its chords must keep to near what comes close to it
   * (arrangement.ts, NEAR_SIZE numbers per demand), which chords.ts applies piece by piece;
   * null when there are none.
   */
  near: (number[] | null)[];
  /** Per carrier: largest distance between its chords and the exact arc (set when chording). */
  chordSag: number[];
  contact: boolean;
  /** Smallest gap between a vertex and a carrier, or two curves, that do not touch (arrangement.ts, nearPair). */
  nearGap: number;
  // Vertex records (one per clipper input point); Z = index + 1.
  rx: number[];
  ry: number[];
  rX: number[];
  rY: number[];
  rExact: boolean[];
  /** Per record: the carriers through its own exact point. */
  rCar: number[][];
  /**
   * Per record: the carriers of every record at its integer point (clipper keeps one tag where
   * points of several loops round together; the edges there may belong to any of them).
   */
  rAll: number[][];
  /** Per record: every record at its integer point, when there are several (else null). */
  rAlt: (number[] | null)[];
  /** Carrier pieces drawn as one single chord: triples (carrier, from node, to node). */
  chordPieces: number[];
  /** Sub-grid two-sided loops (digons.ts) found among those pieces. */
  digons: Digon[];
  digonsOf: Map<number, Digon[]>;
  // ZFill records: four vertex Zs per crossing.
  zf: number[];
}

export function find(ctx: Ctx, n: number): number {
  const p = ctx.parent;
  while (p[n] !== n) {
    p[n] = p[p[n]];
    n = p[n];
  }
  return n;
}

export function union(ctx: Ctx, a: number, b: number): void {
  a = find(ctx, a);
  b = find(ctx, b);
  if (a === b) return;
  if (a < b) ctx.parent[b] = a;
  else ctx.parent[a] = b;
}

/** The carriers through node n (the list itself: callers may add to it). */
export function nodeCarriers(ctx: Ctx, n: number): number[] {
  const have = ctx.ncar[n];
  if (have) return have;
  const made = [n === ctx.loopLo[n] ? ctx.loopHi[n] : n - 1, n];
  ctx.ncar[n] = made;
  return made;
}

/**
 * A new exact node at (x, y), with the carriers through it known so far; null only for source
 * vertex k of a loop when it is also node k (see ncar).
 */
export function newNode(ctx: Ctx, x: number, y: number, carriers: number[] | null = []): number {
  const id = ctx.nx.length;
  ctx.nx.push(x);
  ctx.ny.push(y);
  ctx.ncar.push(carriers);
  ctx.parent.push(id);
  return id;
}
