/**
 * Structural cautions for a cutout, from the geometry of the result (and, when given, the
 * baseline and the input shapes):
 *   1. inside corners: sharp re-entrant vertices (warning) and radiused ones with their radius (note);
 *      a sharp corner where two added shapes meet (and no cut) is a joint between parts, not a
 *      cut: one note per pair, saying the parts act as one only through their connection;
 *   2. separate parts: the section falls into pieces that act together only if tied elsewhere;
 *   3. round holes near a free edge or near each other, against a selectable rule set;
 *   4. ligaments: the narrowest material next to each cutout (a note), a warning when it is thin:
 *      narrower than `ligamentRatio` (default 0.5) of the cutout's size, a screening ratio of
 *      Kern's own (no published source).
 * With a baseline, only what the proposal adds is flagged (a new corner, a new split, a hole check
 * that fails anew or worse, a ligament next to a new edge). Without one, the section is checked on
 * its own (the plain mode). Each caution names the shape and the place and carries a marker point.
 */
import { pointAt } from '../boolean/carriers';
import type { Region } from '../geometry/contour';
import { regionBounds } from '../geometry/contour';
import { distanceToBoundary, POINT_TOL, regionBoundary, windingAt, type Boundary, type BoundarySegment } from '../netsection/boundary';
import { DEFAULT_MIN_CORNER_TURN, insideCorners, newCorners, type RadiusedCorner, type SharpCorner } from './corners';
import { holeChecks, type HoleCheck } from './hole-checks';
import { HOLE_RULE_SETS, type HoleRuleSet } from './hole-rules';
import { cutRuns, ligaments, type CutRun, type Ligament } from './ligaments';
import {
  holeEdgeCaution, jointCaution, holeSpacingCaution, ligamentCaution, radiusedCornerCaution, separatePartsCaution, sharpCornerCaution, type Wording,
} from './messages';
import { partGaps, sectionParts, type PartGap, type SectionPart } from './parts';
import { ShapeLocator } from './place';
import type { Caution, CautionInput, CautionOptions, ShapeRef } from './types';

export const DEFAULT_LIGAMENT_RATIO = 0.5;

export interface LigamentFinding extends Ligament {
  /** The cutout's size the width is set against (a round cut's diameter, else its smaller side). */
  size: number;
  thin: boolean;
  shape: ShapeRef | null;
}

/** Everything found, for panels that list more than the cautions (every hole's distances, every ligament). */
export interface CutoutFindings {
  corners: { sharp: SharpCorner[]; radiused: RadiusedCorner[] };
  parts: SectionPart[];
  gaps: PartGap[];
  holes: HoleCheck[];
  ligaments: LigamentFinding[];
  rules: HoleRuleSet;
  cautions: Caution[];
}

/** Middle point of a boundary piece. */
function middle(s: BoundarySegment): [number, number] {
  return pointAt(s.carrier, 0.5);
}

/**
 * A point just outside the material at the middle of a piece: material lies to the left of every
 * piece, and at its middle an arc runs parallel to its chord, so the chord's right normal points out.
 */
function outsideOf(s: BoundarySegment, step: number): [number, number] {
  const c = s.carrier;
  const [mx, my] = middle(s);
  const L = Math.hypot(c.bx - c.ax, c.by - c.ay);
  return [mx + (step * (c.by - c.ay)) / L, my - (step * (c.bx - c.ax)) / L];
}

/**
 * The pieces a cut made: against a baseline, the new pieces with baseline material just outside
 * them (material was taken away there; an added plate's edges are not cuts); else the pieces on a
 * subtracted shape; else the hole loops.
 */
function chooseCutPieces(result: Boundary, base: Boundary | null, input: CautionInput, tol: number): (s: BoundarySegment) => boolean {
  if (base) {
    const step = 1e3 * tol;
    return (s) => distanceToBoundary(base.segments, ...middle(s)) > tol && windingAt(base.segments, ...outsideOf(s, step)) !== 0;
  }
  const cuts = (input.shapes ?? []).filter((s) => s.op === 'subtract').map((s) => regionBoundary(s.region));
  if (cuts.length) return (s) => cuts.some((b) => distanceToBoundary(b.segments, ...middle(s)) <= tol);
  const holes = new Set(result.loops.filter((l) => l.kind === 'hole').map((l) => l.index));
  return (s) => holes.has(s.loop);
}

/** Size of a cut: its shape's smaller side (a circle's diameter), else the run's own. */
function cutSize(run: CutRun, shapeRegion: Region | null): number {
  const boxOf = (xs: number[], ys: number[]) => {
    const w = Math.max(...xs) - Math.min(...xs), h = Math.max(...ys) - Math.min(...ys);
    const small = Math.min(w, h), big = Math.max(w, h);
    return small > 1e-6 * big ? small : big;
  };
  if (shapeRegion) {
    const b = regionBounds(shapeRegion);
    if (b) return boxOf([b.xmin, b.xmax], [b.ymin, b.ymax]);
  }
  const first = run.segments[0].carrier;
  const oneCircle = run.segments.every((s) => s.carrier.kind === 1 && Math.abs(s.carrier.r - first.r) <= 1e-9 * first.r && Math.hypot(s.carrier.cx - first.cx, s.carrier.cy - first.cy) <= 1e-9 * first.r);
  if (oneCircle) return 2 * first.r;
  return boxOf(run.segments.flatMap((s) => [s.carrier.xmin, s.carrier.xmax]), run.segments.flatMap((s) => [s.carrier.ymin, s.carrier.ymax]));
}

/** A hole check that the baseline fails in the same way (same hole, same distance or less) is not new. */
function sameFailure(h: HoleCheck, before: readonly HoleCheck[], tol: number, which: 'edge' | 'spacing'): boolean {
  return before.some((b) => {
    if (Math.hypot(b.centre.x - h.centre.x, b.centre.y - h.centre.y) > tol || Math.abs(b.d0 - h.d0) > tol) return false;
    if (which === 'edge') return !!b.edge && !b.edge.ok && !!h.edge && b.edge.centreDistance <= h.edge.centreDistance + tol;
    return !!b.spacing && !(b.spacing.ok && b.spacing.ok2) && !!h.spacing && b.spacing.centreDistance <= h.spacing.centreDistance + tol;
  });
}

/** Find the features and word the cautions. */
export function analyseCutouts(input: CautionInput, options: CautionOptions = {}): CutoutFindings {
  const rules = HOLE_RULE_SETS[options.rules ?? 'en1993'];
  const unitInMetres = options.unitInMetres ?? 1e-3;
  const ratio = options.ligamentRatio ?? DEFAULT_LIGAMENT_RATIO;
  const minTurn = options.minCornerTurn ?? DEFAULT_MIN_CORNER_TURN;
  const result = regionBoundary(input.result);
  const base = input.baseline ? regionBoundary(input.baseline) : null;
  const extent = Math.max(result.extent, base?.extent ?? 0);
  const tol = POINT_TOL * extent;
  const w: Wording = { units: options.units ?? '', scale: extent };
  const findings: CutoutFindings = { corners: { sharp: [], radiused: [] }, parts: [], gaps: [], holes: [], ligaments: [], rules, cautions: [] };
  if (result.segments.length === 0) return findings;
  const locator = input.shapes?.length ? new ShapeLocator(input.shapes, tol) : null;
  const shapeAt = (x: number, y: number, inGap = false) => (locator ? locator.at(x, y, inGap) : null);
  const cautions = findings.cautions;

  // 1. Inside corners.
  const corners = insideCorners(result, minTurn);
  findings.corners = corners;
  const flagged = base ? newCorners(corners, insideCorners(base, minTurn), tol) : corners;
  // A corner where two added shapes meet is a joint, noted once per pair; the rest are cuts.
  const joints = new Set<string>();
  for (const c of flagged.sharp) {
    const pair = locator?.joint(c.x, c.y);
    if (!pair) {
      cautions.push(sharpCornerCaution(c, shapeAt(c.x, c.y), w));
      continue;
    }
    const key = [pair[0].id, pair[1].id].sort().join('\u0000');
    if (!joints.has(key)) cautions.push(jointCaution(c, pair[0], pair[1], w));
    joints.add(key);
  }
  for (const c of flagged.radiused) cautions.push(radiusedCornerCaution(c, shapeAt(c.x, c.y), w));

  // 2. Separate parts.
  findings.parts = sectionParts(result);
  findings.gaps = partGaps(result, findings.parts);
  const baseParts = base ? sectionParts(base).length : null;
  if (findings.parts.length > 1 && (baseParts === null || findings.parts.length > baseParts)) {
    for (const g of findings.gaps) cautions.push(separatePartsCaution(findings.parts, g, shapeAt(g.at.x, g.at.y, true), w, baseParts));
  }

  // 3. Round holes: edge distance and spacing.
  findings.holes = holeChecks(result, rules, unitInMetres);
  const before = base ? holeChecks(base, rules, unitInMetres) : [];
  for (const h of findings.holes) {
    const shape = shapeAt(h.centre.x + h.d0 / 2, h.centre.y);
    const e = sameFailure(h, before, tol, 'edge') ? null : holeEdgeCaution(h, rules, shape, w);
    const s = sameFailure(h, before, tol, 'spacing') ? null : holeSpacingCaution(h, rules, shape, w);
    if (e) cautions.push(e);
    if (s) cautions.push(s);
  }

  // 4. Ligaments next to each cut.
  const runs = cutRuns(result, chooseCutPieces(result, base, input, tol));
  for (const l of ligaments(result, runs)) {
    const [mx, my] = middle(l.run.segments[Math.floor(l.run.segments.length / 2)]);
    const shape = shapeAt(mx, my);
    const shapeRegion = shape && input.shapes ? input.shapes.find((s) => s.id === shape.id && s.op === 'subtract')?.region ?? null : null;
    const size = cutSize(l.run, shapeRegion);
    const thin = l.width < ratio * size;
    findings.ligaments.push({ ...l, size, thin, shape });
    cautions.push(ligamentCaution(l, size, ratio, thin, shape, w));
  }
  return findings;
}

/** The cautions only. */
export function sectionCautions(input: CautionInput, options: CautionOptions = {}): Caution[] {
  return analyseCutouts(input, options).cautions;
}
