/**
 * A cut's values as the panel and the canvas show them: the engine's cut with both one-sided
 * widths (cutWithSides), through the one formatter with the section's size, so that a Q that is
 * zero up to round-off reads 0 (never 5.8 × 10⁻¹¹), and, where the width jumps at the cut (a
 * flange underside, a hole edge), both widths with the side Q/b uses, worded as the report words it.
 */
import { cutWithSides, formatQuantity, GEOMETRY_SIGFIGS, sectionSize, type Region, type SectionProperties, type SidedCut } from '../../src';

export interface CutReadout {
  cut: SidedCut;
  /** True when the width jumps at the cut: b above and b below differ. */
  jump: boolean;
  /** 'above'/'below' for a horizontal cut, 'right of'/'left of' for a vertical one; `side`: the sides alone ('right', 'left'). */
  words: { plus: string; minus: string; beyond: string; side: { plus: string; minus: string } };
  /** The side Q/b takes its width from, in words ('below'), or '' when both sides agree. */
  qbSide: string;
  text: { at: string; widthAbove: string; widthBelow: string; widthForQb: string; Q: string; area: string; qOverB: string };
}

/** The readout of the cut at `at` (null when the engine cannot cut there). */
export function cutReadout(region: Region, props: SectionProperties, axis: 'x' | 'y', at: number): CutReadout | null {
  let cut: SidedCut;
  try {
    cut = cutWithSides(region, axis, at, props);
  } catch {
    return null;
  }
  const size = sectionSize(props.bounds);
  const q = (v: number, power: number) => formatQuantity(v, power, size);
  const words =
    axis === 'y'
      ? { plus: 'above', minus: 'below', beyond: 'above', side: { plus: 'above', minus: 'below' } }
      : { plus: 'right of', minus: 'left of', beyond: 'right of', side: { plus: 'right', minus: 'left' } };
  const jump = cut.onEdge && cut.widthAbove !== cut.widthBelow;
  return {
    cut,
    jump,
    words,
    qbSide: jump ? (cut.qbSide === 'above' ? words.plus : words.minus) : '',
    text: {
      at: formatQuantity(at, 1, size, GEOMETRY_SIGFIGS),
      widthAbove: q(cut.widthAbove, 1),
      widthBelow: q(cut.widthBelow, 1),
      widthForQb: q(cut.widthForQb, 1),
      Q: q(cut.Q, 3),
      area: q(cut.area, 2),
      qOverB: Number.isFinite(cut.qOverB) ? q(cut.qOverB, 2) : '—',
    },
  };
}
