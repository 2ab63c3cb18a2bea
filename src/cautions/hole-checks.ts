/**
 * Edge distance and spacing of every circular hole, measured exactly and set against a rule set
 * (hole-rules.ts). For each round hole (a loop that is one full circle, material outside it):
 *   - the free edge nearest its centre: every boundary piece that is not another round hole (the
 *     outline, a cope, a rectangular opening), distance from the centre to the exact line or arc;
 *   - the next round hole: the nearest other hole centre.
 * Both are given as the rules measure them (from the centre) and as clear distances (material
 * left between hole and edge, or between the two holes). Geometry checks only.
 */
import type { Boundary, BoundaryLoop } from '../netsection/boundary';
import { nearestOnCarrier } from './closest';
import type { HoleRuleSet, RuleValue } from './hole-rules';

export interface HoleEdgeCheck {
  /** From the hole centre to the nearest free edge (as the rules measure it). */
  centreDistance: number;
  /** Material between the hole and that edge. */
  clearDistance: number;
  /** The nearest point of the edge. */
  nearest: { x: number; y: number };
  required: RuleValue;
  ok: boolean;
}

export interface HoleSpacingCheck {
  other: { x: number; y: number; d0: number; loop: number };
  centreDistance: number;
  clearDistance: number;
  /** Checked against the larger of the two holes. */
  required: RuleValue;
  ok: boolean;
  /** The rules' other spacing (EN p2 across the load; AISC's preferred 3 d) and whether it is met. */
  other2: RuleValue | null;
  ok2: boolean;
}

export interface HoleCheck {
  loop: number;
  centre: { x: number; y: number };
  d0: number;
  edge: HoleEdgeCheck | null;
  spacing: HoleSpacingCheck | null;
}

/** Round holes of a section. */
export function roundHoles(boundary: Boundary): BoundaryLoop[] {
  return boundary.loops.filter((l) => l.kind === 'hole' && l.circle !== null);
}

/** Exact distance from a point to the nearest piece of the given loops, with that point. */
function nearestEdge(loops: readonly BoundaryLoop[], x: number, y: number): { d: number; x: number; y: number } | null {
  let best: { d: number; x: number; y: number } | null = null;
  for (const l of loops) {
    for (const s of l.segments) {
      const [qx, qy] = nearestOnCarrier(s.carrier, x, y);
      const d = Math.hypot(qx - x, qy - y);
      if (!best || d < best.d) best = { d, x: qx, y: qy };
    }
  }
  return best;
}

/** Edge distance and spacing of each round hole, against `rules`. */
export function holeChecks(boundary: Boundary, rules: HoleRuleSet, unitInMetres: number): HoleCheck[] {
  const holes = roundHoles(boundary);
  const edges = boundary.loops.filter((l) => !(l.kind === 'hole' && l.circle !== null));
  const slack = boundary.tol;
  return holes.map((h) => {
    const c = h.circle!;
    const d0 = 2 * c.r;
    const near = nearestEdge(edges, c.cx, c.cy);
    let edge: HoleEdgeCheck | null = null;
    if (near) {
      const required = rules.minEdge(d0, unitInMetres);
      // At the minimum exactly counts as meeting it.
      edge = { centreDistance: near.d, clearDistance: near.d - c.r, nearest: { x: near.x, y: near.y }, required, ok: near.d >= required.value - slack };
    }
    let spacing: HoleSpacingCheck | null = null;
    for (const o of holes) {
      if (o === h) continue;
      const oc = o.circle!;
      const p = Math.hypot(oc.cx - c.cx, oc.cy - c.cy);
      if (spacing && p >= spacing.centreDistance) continue;
      const dBig = Math.max(d0, 2 * oc.r);
      const required = rules.minSpacing(dBig, unitInMetres);
      const other2 = rules.otherSpacing(dBig, unitInMetres);
      spacing = {
        other: { x: oc.cx, y: oc.cy, d0: 2 * oc.r, loop: o.index }, centreDistance: p, clearDistance: p - c.r - oc.r,
        required, ok: p >= required.value - slack, other2, ok2: other2 ? p >= other2.value - slack : true,
      };
    }
    return { loop: h.index, centre: { x: c.cx, y: c.cy }, d0, edge, spacing };
  });
}
