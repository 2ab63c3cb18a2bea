/**
 * A thin wall drawn by its centreline ("strip"): the exact outline of a wall of thickness t about
 * a centreline of lines and arcs.
 *
 * 1. Faces: each centreline piece gives two faces at ±t/2: a parallel line, or the concentric arc
 *    of radius r ∓ t/2 with the same sweep. Their ends are the piece's ends moved along its normal
 *    there, so no arc centre is formed.
 * 2. Joints: where two pieces meet at an angle, the faces on the inside of the turn are cut where
 *    they cross (facesMeet in src/geometry/offset-faces.ts: line–line, line–arc and arc–arc, exactly). On the
 *    outside, 'mitre' extends both faces along their own line or circle until they meet; 'round'
 *    joins them with an arc of radius t/2 about the joint. Tangent joints need nothing.
 * 3. Outline: an open centreline gives one loop, CCW: the right faces forward, a square end, the
 *    left faces backward, a square start. A closed centreline (its end on its start) gives two
 *    loops, the outer CCW and the inner CW, e.g. a tube; a full ring is two semicircular arcs.
 * 4. Checks, each naming the segment: zero-length pieces, arcs whose radius is not above t/2 (the
 *    inner face would vanish), a centreline that turns straight back, faces trimmed away at short
 *    segments, and any other crossing or touching of the outline (strip-overlap.ts).
 *
 * Everything is computed relative to the centreline's first vertex. The result is a Region of
 * lines and arcs (arcs over 180° split), ready for regionMoments and sectionProperties.
 */
import { pushArc, reverseContour, type Contour, type Region } from '../geometry/contour';
import { regionMomentsAbout } from '../moments/kernel';
import { chainSegment, LineError, segmentCount, type LineChain } from './chain';
import { alongFace, facesMeet, type JointSide } from '../geometry/offset-faces';
import { findContact, type OutlinePiece } from './strip-overlap';

export type StripCorners = 'mitre' | 'round';

/** Turns smaller than this (radians) are tangent joints. */
const SMOOTH = 1e-10;

interface Piece {
  a: JointSide; // the centreline at the piece's start
  b: JointSide; // the centreline at the piece's end
  ax: number;
  ay: number;
  bx: number;
  by: number;
  sweep: number;
  length: number;
}

interface Face {
  sx: number;
  sy: number;
  ex: number;
  ey: number;
  sweep: number;
  /** Length of the face after its ends are cut or extended. */
  length: number;
}

/** The exact outline of a wall of the given thickness about the centreline. Throws LineError. */
export function stripOutline(centreline: LineChain, thickness: number, corners: StripCorners): Region {
  const t = thickness;
  if (!(Number.isFinite(t) && t > 0)) throw new LineError(`thickness: the wall thickness must be a positive number (got ${t})`);
  if (corners !== 'mitre' && corners !== 'round') throw new LineError(`corners: must be 'mitre' or 'round' (got ${String(corners)})`);
  const m = segmentCount(centreline);
  if (m === 0) throw new LineError('segments: the centreline needs at least one segment');
  const ox = centreline.xy[0], oy = centreline.xy[1];
  const pieces: Piece[] = [];
  let extent = t;
  for (let i = 0; i < m; i++) {
    const p = centrelinePiece(centreline, i, ox, oy, t);
    pieces.push(p);
    extent = Math.max(extent, Math.abs(p.ax), Math.abs(p.ay), Math.abs(p.bx), Math.abs(p.by));
  }
  const tol = 1e-9 * extent;
  const last = pieces[m - 1];
  const closed = centreline.closed || (m > 1 && Math.hypot(last.bx, last.by) <= 1e-12 * extent);
  const half = t / 2;
  const left = pieces.map((p) => face(p, half));
  const right = pieces.map((p) => face(p, -half));
  // Round corners, per joint, on the outside: keyed by the index of the piece after the joint.
  const roundLeft = new Map<number, Face>(), roundRight = new Map<number, Face>();
  const joints = closed ? m : m - 1;
  for (let i = 0; i < joints; i++) {
    const j = (i + 1) % m;
    joinFaces(pieces[i], pieces[j], i, j, [left[i], left[j]], [right[i], right[j]], half, corners, roundLeft, roundRight, tol);
  }
  [left, right].forEach((faces, side) =>
    faces.forEach((f, i) => {
      if (!(f.length > tol)) {
        throw new LineError(
          `segments[${i}]: too short for a wall ${fmt(t)} thick with these corners: its ${side === 0 ? 'left' : 'right'} face is cut away at the joints`,
          { segment: i },
        );
      }
    }),
  );
  const loops = closed ? closedLoops(left, right, roundLeft, roundRight) : [openLoop(left, right, roundLeft, roundRight)];
  const contact = findContact(loops, tol);
  if (contact) {
    // Name the later segment first: that is where the centreline comes back.
    const [q, p] = contact[1].segment >= contact[0].segment ? [contact[1], contact[0]] : contact;
    throw new LineError(
      `segments[${q.segment}] and segments[${p.segment}]: the wall overlaps itself there (${describe(q)} meets ${describe(p)}); the centreline doubles back or comes closer to itself than the thickness ${fmt(t)}`,
      { segment: q.segment, other: p.segment },
    );
  }
  const region = loops.map((loop) => toContour(loop, ox, oy));
  // An open outline is built CCW; make sure (a centreline that turns a lot could fool the order).
  if (!closed && regionMomentsAbout(region, ox, oy).m00 < 0) return region.map(reverseContour);
  return region;
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(6)));
}

function describe(p: OutlinePiece): string {
  if (p.kind === 'end') return 'an end of the wall';
  if (p.kind === 'corner') return `the round corner before segments[${p.segment}]`;
  return `a face of segments[${p.segment}]`;
}

/** Piece i in the local frame, with its tangents, normals and curvature; refuses bad pieces. */
function centrelinePiece(chain: LineChain, i: number, ox: number, oy: number, t: number): Piece {
  const s = chainSegment(chain, i);
  const ax = s.ax - ox, ay = s.ay - oy, bx = s.bx - ox, by = s.by - oy;
  if (![ax, ay, bx, by, s.sweep].every(Number.isFinite)) throw new LineError(`segments[${i}]: the points must be finite numbers`, { segment: i });
  const c = Math.hypot(bx - ax, by - ay);
  if (!(c > 0)) throw new LineError(`segments[${i}]: zero length (it ends where it starts)`, { segment: i });
  const ex = (bx - ax) / c, ey = (by - ay) / c;
  // A sweep below 1e-14 bends the piece by less than the round-off of its end points (sagitta
  // c·sweep/8): it is a line. This also keeps subnormal curvatures out of the joint solver.
  const phi = Math.abs(s.sweep) < 1e-14 ? 0 : s.sweep;
  const k = (2 * Math.sin(phi / 2)) / c;
  if (phi !== 0 && !(Math.abs(k) * (t / 2) < 1)) {
    throw new LineError(
      `segments[${i}]: the arc's radius (${fmt(1 / Math.abs(k))}) must exceed half the wall thickness (${fmt(t / 2)}), or its inner face vanishes`,
      { segment: i },
    );
  }
  // The tangent turns by phi/2 either side of the chord.
  const side = (rot: number): JointSide => {
    const cs = Math.cos(rot), sn = Math.sin(rot);
    const tx = cs * ex - sn * ey, ty = sn * ex + cs * ey;
    return { tx, ty, nx: -ty, ny: tx, k };
  };
  const length = phi === 0 ? c : (c * Math.abs(phi / 2)) / Math.abs(Math.sin(phi / 2));
  return { a: side(-phi / 2), b: side(phi / 2), ax, ay, bx, by, sweep: phi, length };
}

/** The face at signed offset d (left positive), before any joint is made. */
function face(p: Piece, d: number): Face {
  return {
    sx: p.ax + d * p.a.nx,
    sy: p.ay + d * p.a.ny,
    ex: p.bx + d * p.b.nx,
    ey: p.by + d * p.b.ny,
    sweep: p.sweep,
    length: p.length * (1 - p.a.k * d),
  };
}

/** Makes the joint between pieces i and j (j follows i) on both sides. */
function joinFaces(
  pi: Piece,
  pj: Piece,
  i: number,
  j: number,
  leftPair: [Face, Face],
  rightPair: [Face, Face],
  half: number,
  corners: StripCorners,
  roundLeft: Map<number, Face>,
  roundRight: Map<number, Face>,
  tol: number,
): void {
  const t1 = pi.b, t2 = pj.a;
  const turn = Math.atan2(t1.tx * t2.ty - t1.ty * t2.tx, t1.tx * t2.tx + t1.ty * t2.ty);
  const vx = pi.bx, vy = pi.by;
  const where = { segment: j, other: i };
  if (Math.abs(turn) <= SMOOTH) {
    // Tangent: the faces already meet (to round-off); join them at their common point.
    for (const [f, g] of [leftPair, rightPair]) {
      const x = (f.ex + g.sx) / 2, y = (f.ey + g.sy) / 2;
      f.ex = g.sx = x;
      f.ey = g.sy = y;
    }
    return;
  }
  if (Math.PI - Math.abs(turn) <= 1e-9) {
    throw new LineError(`segments[${j}]: the centreline turns straight back on segments[${i}]; a wall cannot double back on itself`, where);
  }
  const insideLeft = turn > 0;
  const [inner, outer] = insideLeft ? [leftPair, rightPair] : [rightPair, leftPair];
  const dIn = insideLeft ? half : -half;
  // Inside: cut both faces where they cross.
  const w = facesMeet(t1, t2, dIn);
  const e1 = w && alongFace(t1, dIn, w[0], w[1]);
  const s2 = w && alongFace(t2, dIn, w[0], w[1]);
  if (!w || !e1 || !s2 || e1.ds > tol || s2.ds < -tol) {
    // Nearly straight back: the inner faces meet far away or not at all.
    if (Math.PI - Math.abs(turn) < 0.01) {
      throw new LineError(`segments[${j}]: the centreline turns almost straight back on segments[${i}]; the wall would overlap itself`, where);
    }
    throw new LineError(`segments[${i}] and segments[${j}]: the inner faces do not meet at this joint; the wall is too thick for the curves there`, where);
  }
  moveEnd(inner[0], vx + w[0], vy + w[1], e1);
  moveStart(inner[1], vx + w[0], vy + w[1], s2);
  const dOut = -dIn;
  if (corners === 'round') {
    const [f, g] = outer;
    const c: Face = { sx: f.ex, sy: f.ey, ex: g.sx, ey: g.sy, sweep: turn, length: half * Math.abs(turn) };
    (insideLeft ? roundRight : roundLeft).set(j, c);
    return;
  }
  // Mitre: extend both outer faces along their own line or circle until they meet.
  const m = facesMeet(t1, t2, dOut);
  const e1o = m && alongFace(t1, dOut, m[0], m[1]);
  const s2o = m && alongFace(t2, dOut, m[0], m[1]);
  if (!m || !e1o || !s2o || e1o.ds < -tol || s2o.ds > tol) {
    throw new LineError(`segments[${i}] and segments[${j}]: a mitred corner is not defined here (the outer faces do not meet); use round corners`, where);
  }
  moveEnd(outer[0], vx + m[0], vy + m[1], e1o);
  moveStart(outer[1], vx + m[0], vy + m[1], s2o);
}

function moveEnd(f: Face, x: number, y: number, along: { ds: number; dphi: number }): void {
  f.ex = x;
  f.ey = y;
  f.sweep += along.dphi;
  f.length += along.ds;
}

function moveStart(f: Face, x: number, y: number, along: { ds: number; dphi: number }): void {
  f.sx = x;
  f.sy = y;
  f.sweep -= along.dphi;
  f.length -= along.ds;
}

function piece(f: Face, kind: OutlinePiece['kind'], segment: number): OutlinePiece {
  return { sx: f.sx, sy: f.sy, ex: f.ex, ey: f.ey, sweep: f.sweep, kind, segment };
}

function reversed(p: OutlinePiece): OutlinePiece {
  return { ...p, sx: p.ex, sy: p.ey, ex: p.sx, ey: p.sy, sweep: -p.sweep };
}

/** Right faces forward, square end, left faces backward, square start (CCW). */
function openLoop(left: Face[], right: Face[], roundLeft: Map<number, Face>, roundRight: Map<number, Face>): OutlinePiece[] {
  const m = left.length;
  const loop: OutlinePiece[] = [];
  for (let i = 0; i < m; i++) {
    const c = roundRight.get(i);
    if (c) loop.push(piece(c, 'corner', i));
    loop.push(piece(right[i], 'face', i));
  }
  loop.push({ sx: right[m - 1].ex, sy: right[m - 1].ey, ex: left[m - 1].ex, ey: left[m - 1].ey, sweep: 0, kind: 'end', segment: m - 1 });
  for (let i = m - 1; i >= 0; i--) {
    loop.push(reversed(piece(left[i], 'face', i)));
    const c = roundLeft.get(i);
    if (c) loop.push(reversed(piece(c, 'corner', i)));
  }
  loop.push({ sx: left[0].sx, sy: left[0].sy, ex: right[0].sx, ey: right[0].sy, sweep: 0, kind: 'end', segment: 0 });
  return loop;
}

/**
 * The right faces forward and the left faces backward. For a CCW centreline the right faces are
 * the outside (CCW) and the reversed left faces the hole (CW); for a CW centreline the roles swap
 * and the orientations still come out outer CCW, inner CW.
 */
function closedLoops(left: Face[], right: Face[], roundLeft: Map<number, Face>, roundRight: Map<number, Face>): OutlinePiece[][] {
  const m = left.length;
  const r: OutlinePiece[] = [], l: OutlinePiece[] = [];
  for (let i = 0; i < m; i++) {
    const cr = roundRight.get(i), cl = roundLeft.get(i);
    if (cr) r.push(piece(cr, 'corner', i));
    r.push(piece(right[i], 'face', i));
    if (cl) l.push(piece(cl, 'corner', i));
    l.push(piece(left[i], 'face', i));
  }
  return [r, l.reverse().map(reversed)];
}

/** The loop as a contour in document coordinates (arcs over 180° split). */
function toContour(loop: readonly OutlinePiece[], ox: number, oy: number): Contour {
  const xy: number[] = [];
  const bulge: number[] = [];
  for (const p of loop) {
    const sx = p.sx + ox, sy = p.sy + oy;
    xy.push(sx, sy);
    if (p.sweep === 0) bulge.push(0);
    else pushArc(xy, bulge, sx, sy, p.ex + ox, p.ey + oy, p.sweep);
  }
  return { xy: Float64Array.from(xy), bulge: bulge.some((b) => b !== 0) ? Float64Array.from(bulge) : null };
}
