/**
 * A cut with both one-sided widths: at a level where the width jumps (a flange underside, a hole
 * edge) b just above and just below the line, and which one Q/b uses (src/moments/width.ts).
 */
import type { Region } from '../geometry/contour';
import { oneSidedWidths, qbWidth, type QbSide } from '../moments/width';
import { cutSection, type CutResult } from './section';

/** A cut (as `cutSection` gives it) with its one-sided widths and the Q/b it implies. */
export interface SidedCut extends CutResult {
  /** b just above the cut (just right of it for axis 'x'). */
  widthAbove: number;
  /** b just below the cut (just left of it for axis 'x'). */
  widthBelow: number;
  /** True when a straight edge lies on the cut line (the widths may differ). */
  onEdge: boolean;
  /** The width Q/b uses: the smaller non-zero one-sided width. */
  widthForQb: number;
  /** Which side `widthForQb` is taken from. */
  qbSide: QbSide;
  /** Q / widthForQb; NaN where widthForQb is 0. */
  qOverB: number;
}

/**
 * `cutSection` (the part beyond the cut: its area, centroid and Q, unchanged) plus the exact
 * one-sided widths and the Q/b rule. `whole` supplies the section's centroid.
 */
export function cutWithSides(region: Region, axis: 'x' | 'y', at: number, whole: { centroid: { x: number; y: number } }): SidedCut {
  const cut = cutSection(region, axis, at, whole);
  const w = oneSidedWidths(region, axis, at);
  const used = qbWidth(w.above, w.below);
  return {
    ...cut,
    widthAbove: w.above,
    widthBelow: w.below,
    onEdge: w.onEdge,
    widthForQb: used.width,
    qbSide: used.side,
    qOverB: used.width > 0 ? cut.Q / used.width : NaN,
  };
}
