/**
 * Naming the place of a caution: which input shape made the feature at a point, and the point
 * and lengths written the way every message writes them (the one number formatter).
 *
 * A feature at a point is attributed to the shape whose own boundary passes through the point
 * (a cut first, since cutouts are what the checker asks about), else to the cut that contains the
 * point, else to the shape whose boundary passes nearest. A gap (a split) asks the cut first.
 */
import { formatNumber } from '../properties/catalog';
import { distanceToBoundary, regionBoundary, windingAt, type Boundary } from '../netsection/boundary';
import type { InputShape, ShapeRef } from './types';

export class ShapeLocator {
  private readonly boundaries: Boundary[];

  constructor(private readonly shapes: readonly InputShape[], private readonly tol: number) {
    this.boundaries = shapes.map((s) => regionBoundary(s.region));
  }

  /**
   * The shape that made the feature at (x, y), or null when no shapes were given. For a gap
   * (`inGap`: a point in empty space, such as the middle of a split) the cut that contains the
   * point is asked first.
   */
  at(x: number, y: number, inGap = false): ShapeRef | null {
    if (this.shapes.length === 0) return null;
    const dist = this.boundaries.map((b) => distanceToBoundary(b.segments, x, y));
    const order = this.shapes.map((_, k) => k).sort((i, j) => rank(this.shapes[i]) - rank(this.shapes[j]) || dist[i] - dist[j]);
    const inCut = order.find((k) => this.shapes[k].op === 'subtract' && (windingAt(this.boundaries[k].segments, x, y) !== 0 || dist[k] <= this.tol));
    const onBoundary = order.find((k) => dist[k] <= this.tol);
    if (inGap && inCut !== undefined) return ref(this.shapes[inCut]);
    if (onBoundary !== undefined) return ref(this.shapes[onBoundary]);
    if (inCut !== undefined) return ref(this.shapes[inCut]);
    let best = 0;
    dist.forEach((d, k) => {
      if (d < dist[best]) best = k;
    });
    return ref(this.shapes[best]);
  }

  /**
   * The two added shapes that meet at (x, y) when the point is a joint between parts rather than
   * a cut: on the boundaries of two or more added shapes and on no cut's boundary. Null otherwise
   * (and when no shapes were given).
   */
  joint(x: number, y: number): [ShapeRef, ShapeRef] | null {
    const on = this.shapes.map((s, k) => ({ s, d: distanceToBoundary(this.boundaries[k].segments, x, y) })).filter((e) => e.d <= this.tol);
    if (on.some((e) => e.s.op !== 'add')) return null;
    const added = on.filter((e) => e.s.op === 'add');
    return added.length >= 2 ? [ref(added[0].s), ref(added[1].s)] : null;
  }
}

function rank(s: InputShape): number {
  return s.op === 'subtract' ? 0 : s.op === 'intersect' ? 1 : 2;
}

function ref(s: InputShape): ShapeRef {
  return s.name !== undefined ? { id: s.id, name: s.name } : { id: s.id };
}

/** "“Cope 60 × 40” (cope)" or "shape cope". */
export function shapeText(s: ShapeRef | null): string {
  if (!s) return '';
  return s.name ? `“${s.name}” (${s.id})` : `shape ${s.id}`;
}

/** A length with its unit, to the shared significant figures. */
export function lengthText(v: number, units = ''): string {
  return units ? `${formatNumber(v)} ${units}` : formatNumber(v);
}

/** A point "(x, y)"; coordinates within `tol` of zero print as 0. */
export function pointText(x: number, y: number, scale = 0): string {
  return `(${formatNumber(x, 6, scale)}, ${formatNumber(y, 6, scale)})`;
}
