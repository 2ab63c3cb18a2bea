/**
 * Drawing scales for the printed figure: the standard series of ISO 5455 (Technical drawings —
 * Scales): enlargements 50:1, 20:1, 10:1, 5:1, 2:1; full size 1:1; reductions 1:2, 1:5, 1:10,
 * 1:20, 1:50, 1:100, 1:200, 1:500, 1:1000, and on by factors of 10.
 */
export interface DrawingScale {
  /** Paper length over real length: 0.5 for 1:2, 2 for 2:1. */
  ratio: number;
  /** As printed: '1:2', '2:1', '1:1'. */
  label: string;
}

function series(): DrawingScale[] {
  const out: DrawingScale[] = [];
  for (const n of [50, 20, 10, 5, 2]) out.push({ ratio: n, label: `${n}:1` });
  out.push({ ratio: 1, label: '1:1' });
  for (let decade = 1; decade <= 1e6; decade *= 10) {
    for (const m of [2, 5, 10]) out.push({ ratio: 1 / (m * decade), label: `1:${m * decade}` });
  }
  return out;
}

export const STANDARD_SCALES: readonly DrawingScale[] = series();

/**
 * The largest standard scale at which a real size (mm) fits the paper box (mm).
 * Falls back to the smallest scale of the series for an enormous section.
 */
export function chooseScale(realWidthMm: number, realHeightMm: number, boxWidthMm: number, boxHeightMm: number): DrawingScale {
  for (const s of STANDARD_SCALES) {
    if (realWidthMm * s.ratio <= boxWidthMm && realHeightMm * s.ratio <= boxHeightMm) return s;
  }
  return STANDARD_SCALES[STANDARD_SCALES.length - 1];
}
