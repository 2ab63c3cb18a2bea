/**
 * Net section along a straight line P→Q drawn across a section: the gross length inside the
 * material (from the first entry to the last exit), the net length (material only), and each gap
 * between: a hole (a loop fully inside the material, with its diameter when it is circular), a
 * notch (the line leaves and re-enters the same outline) or a gap between separate parts.
 *
 * Every length comes from exact intersections of the line with the boundary's lines and arcs
 * (see line-crossings.ts), so a line through a row of round holes loses exactly their chords.
 * This is the net width that tension checks use; the design code's staggered-hole rules and
 * effective net area factors still apply, which the result says in `caution`.
 */
import type { Region } from '../geometry/contour';
import { distanceToBoundary, loopByIndex, POINT_TOL, regionBoundary, windingAt, type Boundary } from './boundary';
import { classifyPieces, lineBreakpoints, type Breakpoint, type Piece } from './line-crossings';

export type GapKind = 'hole' | 'notch' | 'between-parts';

export interface NetGap {
  /** Distances along the line from P. */
  from: number;
  to: number;
  length: number;
  kind: GapKind;
  start: { x: number; y: number };
  end: { x: number; y: number };
  /** Diameter and centre when the gap crosses a circular hole; null otherwise. */
  diameter: number | null;
  centre: { x: number; y: number } | null;
}

export interface NetSection {
  from: { x: number; y: number };
  to: { x: number; y: number };
  /** Length of P→Q. */
  lineLength: number;
  /** From the first entry into the material to the last exit (0 when the line misses). */
  grossLength: number;
  /** The length inside the material. */
  netLength: number;
  /** First entry and last exit, or null when the line misses the material. */
  entry: { x: number; y: number } | null;
  exit: { x: number; y: number } | null;
  /** Material stretches along the line, as distances from P. */
  material: { from: number; to: number; length: number }[];
  gaps: NetGap[];
  /** Plain remarks about this line (starts inside the material, runs along an edge, misses). */
  notes: string[];
  purpose: string;
  caution: string;
}

export class NetSectionError extends Error {}

export const NET_SECTION_PURPOSE =
  'Net width along the drawn line: the length of material the line crosses, with holes and gaps taken out. Tension checks use it (net area = net width × thickness).';

export const NET_SECTION_CAUTION =
  "A geometric net width only. The design code's rules for staggered holes, hole allowances and effective net area factors (shear lag) still apply, and the check belongs to a qualified engineer.";

const GAP_LABEL: Record<GapKind, string> = { hole: 'hole', notch: 'notch or opening in the outline', 'between-parts': 'gap between separate parts' };

/** What kind of gap lies between breakpoints a and b (the exit from and the re-entry into material). */
function gapKind(boundary: Boundary, a: Breakpoint, b: Breakpoint): { kind: GapKind; hole: number | null } {
  const loops = [...a.loops, ...b.loops];
  const hole = loops.find((k) => loopByIndex(boundary, k)?.kind === 'hole');
  if (hole !== undefined) return { kind: 'hole', hole };
  const shared = a.loops.some((k) => b.loops.includes(k));
  return { kind: shared ? 'notch' : 'between-parts', hole: null };
}

function breakAt(breaks: readonly Breakpoint[], t: number): Breakpoint | undefined {
  let best: Breakpoint | undefined, bd = Infinity;
  for (const b of breaks) {
    const d = Math.abs(b.t - t);
    if (d < bd) {
      bd = d;
      best = b;
    }
  }
  return best;
}

function checkPoint(p: { x: number; y: number }, name: string): void {
  if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) throw new NetSectionError(`the line's ${name} point must have finite coordinates, got (${p.x}, ${p.y})`);
}

/** Net section of `region` along the straight line from `from` to `to`. */
export function netSection(region: Region, from: { x: number; y: number }, to: { x: number; y: number }): NetSection {
  checkPoint(from, 'start');
  checkPoint(to, 'end');
  const boundary = regionBoundary(region);
  const L = Math.hypot(to.x - from.x, to.y - from.y);
  // Points closer than 1e-9 of the section's size are one point; a line far longer than the
  // section widens that only as far as its own round-off needs.
  const tol = POINT_TOL * Math.max(boundary.extent, 1e-6 * L);
  if (!(L > tol)) throw new NetSectionError('the line has no length: its start and end points coincide');
  const result: NetSection = {
    from: { ...from }, to: { ...to }, lineLength: L, grossLength: 0, netLength: 0, entry: null, exit: null,
    material: [], gaps: [], notes: [], purpose: NET_SECTION_PURPOSE, caution: NET_SECTION_CAUTION,
  };
  if (boundary.segments.length === 0) {
    result.notes.push('The section is empty: the line crosses no material.');
    return result;
  }
  const breaks = lineBreakpoints(boundary.segments, from.x, from.y, to.x, to.y, tol);
  const pieces: Piece[] = classifyPieces(boundary.segments, breaks, from.x, from.y, to.x, to.y, tol, boundary.extent);
  const inside = pieces.filter((p) => p.inside);
  if (inside.length === 0) {
    result.notes.push('The line does not cross the material.');
    return result;
  }
  const at = (t: number) => ({ x: from.x + t * (to.x - from.x), y: from.y + t * (to.y - from.y) });
  const first = inside[0], last = inside[inside.length - 1];
  result.entry = at(first.t0);
  result.exit = at(last.t1);
  result.grossLength = (last.t1 - first.t0) * L;
  for (const p of inside) {
    const len = (p.t1 - p.t0) * L;
    result.material.push({ from: p.t0 * L, to: p.t1 * L, length: len });
    result.netLength += len;
  }
  for (const p of pieces) {
    if (p.inside || p.t0 < first.t0 || p.t1 > last.t1) continue;
    const a = breakAt(breaks, p.t0), b = breakAt(breaks, p.t1);
    const { kind, hole } = a && b ? gapKind(boundary, a, b) : { kind: 'notch' as GapKind, hole: null };
    const circle = hole !== null ? loopByIndex(boundary, hole)?.circle ?? null : null;
    result.gaps.push({
      from: p.t0 * L, to: p.t1 * L, length: (p.t1 - p.t0) * L, kind, start: at(p.t0), end: at(p.t1),
      diameter: circle ? 2 * circle.r : null, centre: circle ? { x: circle.cx, y: circle.cy } : null,
    });
  }
  const strictlyInside = (p: { x: number; y: number }) =>
    windingAt(boundary.segments, p.x, p.y) !== 0 && distanceToBoundary(boundary.segments, p.x, p.y) > tol;
  if (strictlyInside(from)) result.notes.push('The line starts inside the material: the gross length is measured from its start point, not from an edge.');
  if (strictlyInside(to)) result.notes.push('The line ends inside the material: the gross length is measured to its end point, not to an edge.');
  if (pieces.some((p) => p.onEdge && p.inside)) result.notes.push('Part of the line runs along an edge of the section; that stretch counts as material.');
  return result;
}

/** One line of text for a gap, for lists: "hole Ø22 from 29 to 51 (22)". */
export function describeGap(g: NetGap, fmt: (v: number) => string = String): string {
  const what = g.kind === 'hole' && g.diameter !== null ? `hole Ø${fmt(g.diameter)}` : GAP_LABEL[g.kind];
  return `${what} from ${fmt(g.from)} to ${fmt(g.to)} (${fmt(g.length)})`;
}
