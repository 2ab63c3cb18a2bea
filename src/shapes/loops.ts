/** Small helpers that several kinds need when they build their contours. */
import { contourFrom, reverseContour, type Contour } from '../geometry/contour';
import { contourArea } from '../moments/kernel';

/** A contour from interleaved vertices and bulges, without straight segments of zero length (arcs kept). */
export function dropZeroLengthLines(xy: readonly number[], bulge: readonly number[]): Contour {
  const n = bulge.length;
  const oxy: number[] = [], ob: number[] = [];
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    if (bulge[i] === 0 && xy[2 * i] === xy[2 * j] && xy[2 * i + 1] === xy[2 * j + 1]) continue;
    oxy.push(xy[2 * i], xy[2 * i + 1]);
    ob.push(bulge[i]);
  }
  return contourFrom(oxy, ob);
}

/** The contour with the requested orientation (+1 CCW, −1 CW). */
export function orient(c: Contour, sign: 1 | -1): Contour {
  const a = contourArea(c);
  return Math.sign(a) === sign || a === 0 ? c : reverseContour(c);
}
