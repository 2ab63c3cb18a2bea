/**
 * Constrained Delaunay triangulation of the mesher's points and boundary chords, with every
 * triangle labelled by the piece it lies in (or −1 outside the section).
 *
 * delaunator triangulates the points and @kninnug/constrainautor then forces every boundary chord
 * into the triangulation. Labelling needs no point-in-polygon test: each chord knows the piece on
 * its left and on its right, so the triangle on that side is a seed, and a flood fill across the
 * edges that are not chords labels the rest of the face. A fill that reaches a second piece, or
 * leaks through the convex hull, means overlapping pieces or a loop that runs the wrong way, and
 * is reported with its place.
 *
 * Four frame points far outside the section are added to the points, so that no point of the
 * section lies on the convex hull: points in a row along a straight outer edge would otherwise be
 * hull points, where delaunator's and constrainautor's treatment of near-collinear hull points can
 * fail. The frame's triangles lie outside every piece and are never labelled.
 *
 * delaunator's triangles run clockwise in a y-up frame, so the triangle of the half-edge p→q lies
 * on the right of p→q; the output triangles are reordered to run counter-clockwise.
 */
import Constrainautor from '@kninnug/constrainautor';
import Delaunator from 'delaunator';
import { placeText, TorsionError } from './errors';

export interface Cdt {
  /** Triangle vertex ids, three per triangle, counter-clockwise. */
  tri: Uint32Array;
  /** Twin half-edge of each half-edge (−1 on the hull), in the same numbering as `tri`. */
  half: Int32Array;
  /** 1 where the half-edge is a boundary chord. */
  chord: Uint8Array;
  /** Piece of each triangle, −1 outside. */
  label: Int32Array;
}

export interface ChordList {
  a: Int32Array;
  b: Int32Array;
  left: Int32Array;
  right: Int32Array;
  count: number;
}

/** World position of a local point, for messages. */
export type Place = (x: number, y: number) => string;

export function localPlace(ox: number, oy: number): Place {
  return (x, y) => placeText(x + ox, y + oy);
}

/** Number of frame points appended after the section's points (ids n … n + 3). */
const FRAME_POINTS = 4;

export function buildCdt(points: Float64Array, chords: ChordList, place: Place): Cdt {
  const coords = withFrame(points);
  const del = new Delaunator(coords);
  const con = new Constrainautor(del);
  const lost = con.untriangulatedPoints();
  if (lost.length) {
    const p = lost[0];
    throw new TorsionError(`two boundary points are too close to tell apart near ${place(coords[2 * p], coords[2 * p + 1])}`);
  }
  for (let i = 0; i < chords.count; i++) {
    try {
      con.constrainOne(chords.a[i], chords.b[i]);
    } catch {
      const a = chords.a[i], b = chords.b[i];
      throw new TorsionError(
        `boundary edges cross or touch near ${place((coords[2 * a] + coords[2 * b]) / 2, (coords[2 * a + 1] + coords[2 * b + 1]) / 2)}; the outline must not cross itself or another piece`,
      );
    }
  }
  // Reorder each triangle (p, q, r) to (p, r, q): counter-clockwise in y-up. Half-edge k of the
  // old triangle (from vertex k to vertex k+1) becomes the reversed edge of the new one.
  const nt = del.triangles.length / 3;
  const tri = new Uint32Array(3 * nt);
  const half = new Int32Array(3 * nt);
  const chord = new Uint8Array(3 * nt);
  // New half-edge j of triangle t runs from tri[3t + j] to tri[3t + (j+1)%3]. With new order
  // (p, r, q): j=0: p→r = old edge 2 reversed; j=1: r→q = old edge 1 reversed; j=2: q→p = old edge 0 reversed.
  const OLD_OF_NEW = [2, 1, 0];
  const NEW_OF_OLD = [2, 1, 0];
  for (let t = 0; t < nt; t++) {
    tri[3 * t] = del.triangles[3 * t];
    tri[3 * t + 1] = del.triangles[3 * t + 2];
    tri[3 * t + 2] = del.triangles[3 * t + 1];
    for (let j = 0; j < 3; j++) {
      const old = 3 * t + OLD_OF_NEW[j];
      const tw = del.halfedges[old];
      half[3 * t + j] = tw < 0 ? -1 : 3 * Math.floor(tw / 3) + NEW_OF_OLD[tw % 3];
      chord[3 * t + j] = con.isConstrained(old) ? 1 : 0;
    }
  }
  const label = labelFaces(coords, tri, half, chord, chords, place);
  return { tri, half, chord, label };
}

/** Half-edge p→q in the counter-clockwise numbering (its triangle lies left of p→q), or −1. */
function halfEdgeFrom(tri: Uint32Array, half: Int32Array, start: Int32Array, p: number, q: number): number {
  const first = start[p];
  if (first < 0) return -1;
  // Walk the half-edges leaving p: from p→x in triangle t, the previous edge of t ends at p;
  // its twin leaves p in the next triangle around.
  let e = first;
  for (let guard = 0; guard < 1 << 20; guard++) {
    if (tri[next(e)] === q) return e;
    const prev = e % 3 === 0 ? e + 2 : e - 1;
    const tw = half[prev];
    if (tw < 0) break;
    e = tw;
    if (e === first) return -1;
  }
  // Hit the hull going one way: walk the other way from the start.
  e = first;
  for (let guard = 0; guard < 1 << 20; guard++) {
    const tw = half[e];
    if (tw < 0) return -1;
    e = next(tw);
    if (e === first) return -1;
    if (tri[next(e)] === q) return e;
  }
  return -1;
}

function next(e: number): number {
  return e % 3 === 2 ? e - 2 : e + 1;
}

function labelFaces(coords: Float64Array, tri: Uint32Array, half: Int32Array, chord: Uint8Array, chords: ChordList, place: Place): Int32Array {
  const nt = tri.length / 3;
  const n = coords.length >> 1;
  const start = new Int32Array(n).fill(-1);
  for (let e = 0; e < tri.length; e++) if (start[tri[e]] < 0) start[tri[e]] = e;
  const label = new Int32Array(nt).fill(-1);
  const stack: number[] = [];
  const centre = (t: number) => {
    let x = 0, y = 0;
    for (let j = 0; j < 3; j++) {
      x += coords[2 * tri[3 * t + j]] / 3;
      y += coords[2 * tri[3 * t + j] + 1] / 3;
    }
    return place(x, y);
  };
  const fill = (seed: number, piece: number) => {
    if (label[seed] === piece) return;
    if (label[seed] !== -1) throw new TorsionError(overlapMessage(label[seed], piece, centre(seed)));
    label[seed] = piece;
    stack.push(seed);
    while (stack.length) {
      const t = stack.pop()!;
      for (let j = 0; j < 3; j++) {
        const e = 3 * t + j;
        if (chord[e]) continue;
        const tw = half[e];
        if (tw < 0)
          throw new TorsionError(
            `piece ${piece} is not closed or a loop runs the wrong way near ${centre(t)} (outer loops must run counter-clockwise and holes clockwise)`,
          );
        const u = Math.floor(tw / 3);
        if (label[u] === piece) continue;
        if (label[u] !== -1) throw new TorsionError(overlapMessage(label[u], piece, centre(u)));
        label[u] = piece;
        stack.push(u);
      }
    }
  };
  for (let i = 0; i < chords.count; i++) {
    const a = chords.a[i], b = chords.b[i];
    for (const [p, q, piece] of [
      [a, b, chords.left[i]],
      [b, a, chords.right[i]],
    ]) {
      if (piece < 0) continue;
      const e = halfEdgeFrom(tri, half, start, p, q);
      if (e < 0)
        throw new TorsionError(
          `piece ${piece} lies outside its own boundary near ${place((coords[2 * a] + coords[2 * b]) / 2, (coords[2 * a + 1] + coords[2 * b + 1]) / 2)}: a loop runs the wrong way (outer loops counter-clockwise, holes clockwise)`,
        );
      fill(Math.floor(e / 3), piece);
    }
  }
  return label;
}

/** The points followed by the corners of a square three times the size of their bounding box. */
function withFrame(points: Float64Array): Float64Array {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (let i = 0; i < points.length; i += 2) {
    xmin = Math.min(xmin, points[i]);
    xmax = Math.max(xmax, points[i]);
    ymin = Math.min(ymin, points[i + 1]);
    ymax = Math.max(ymax, points[i + 1]);
  }
  const cx = (xmin + xmax) / 2, cy = (ymin + ymax) / 2;
  const r = 1.5 * Math.max(xmax - xmin, ymax - ymin, 1e-300);
  const out = new Float64Array(points.length + 2 * FRAME_POINTS);
  out.set(points);
  out.set([cx - r, cy - r, cx + r, cy - r, cx + r, cy + r, cx - r, cy + r], points.length);
  return out;
}

function overlapMessage(p: number, q: number, where: string): string {
  return p === q
    ? `loops of piece ${p} overlap near ${where}`
    : `pieces ${p} and ${q} overlap near ${where}; pieces must not overlap`;
}
