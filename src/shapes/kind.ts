/**
 * The one interface every shape kind implements on the engine side. A kind module holds its
 * record type, its defaults, its validation (with paths), its exact outline (lines and arcs),
 * how its stored points follow a move, a rotation, a mirror or a change of units, and its label.
 * The registry (`registry.ts`) lists the kinds; validation, units, labels, evaluation and the
 * report all go through it, so adding a kind means adding one module here.
 */
import type { Contour } from '../geometry/contour';
import type { LineChain } from '../lines/chain';
import type { PointMap, ShapeBase } from './base';
import type { Issue } from './check';
import type { Corner } from './corners';
import type { KindSchedule, ScheduleFormat } from './schedule';

export interface ShapeKind<S extends ShapeBase & { type: string }> {
  readonly type: S['type'];
  /** Plain name of the kind, shared by the editor, the report and the CLI. */
  readonly label: string;
  /**
   * Check the kind's own fields of a record whose `type` is this kind (id, name and op are checked
   * by the document). Push every problem with its path below `path` (e.g. `shapes[3]`).
   */
  validate(s: Record<string, unknown>, path: string, out: Issue[]): void;
  /** Raw exact contours: outer loops CCW, holes CW. A polygon or path may still cross itself. None for a line element. */
  contours(s: S): Contour[];
  /**
   * Only for line elements (weld lines, centrelines), which enclose no area and never take part
   * in the booleans: their exact chains of lines and arcs, and the line group they belong to.
   */
  line?: { chains(s: S): LineChain[]; group(s: S): string };
  /** True when the outline may cross itself and must be resolved (even-odd) before use. */
  readonly mayCrossItself: boolean;
  /** The record with every stored point mapped by an isometry (lengths unchanged). */
  mapPoints(s: S, f: PointMap): S;
  /** Extra changes after a rotation by `deg` degrees CCW (a profile keeps its angle). */
  rotated?(s: S, deg: number): S;
  /** Extra changes after a reflection (a profile flips `mirror`; a polygon reverses its points). */
  mirrored?(s: S, axis: 'vertical' | 'horizontal'): S;
  /** The same shape with every length (points, radii, dimensions) multiplied by k (a unit change). */
  scaled(s: S, k: number): S;
  /**
   * Kinds whose corners can be rounded: the corners, and the shape with corner `index` replaced
   * by the exact tangent arc of `radius` (possibly of another kind: a polygon becomes a path), or
   * the reason it cannot be done. Id, name, operation and material are kept.
   */
  corners?: { list(s: S): Corner[]; round(s: S, index: number, radius: number): (ShapeBase & { type: string }) | string };
  /** Everything needed to rebuild the shape by hand (the report's schedule), as data. */
  schedule(s: S, f: ScheduleFormat): KindSchedule;
}

/** Normalise degrees to (−180, 180], with tiny round-off shown as 0. */
export function normaliseDeg(d: number): number {
  let r = d % 360;
  if (r > 180) r -= 360;
  if (r <= -180) r += 360;
  return Math.abs(r) < 1e-12 ? 0 : r;
}

/** A point scaled about the origin. */
export const scalePoint = (k: number): PointMap => (p) => [p[0] * k, p[1] * k];
