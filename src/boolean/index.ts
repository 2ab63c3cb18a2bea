/**
 * Booleans on exact regions bounded by lines and circular arcs.
 *
 * clipper-lib decides which pieces of the boundaries survive; every surviving piece is traced back
 * to its exact source segment, so the output arcs are the source arcs again (same centre and
 * radius) and every vertex sits on an exact source vertex or an exact analytic intersection.
 * See engine.ts for the pipeline.
 */
import { contourBounds, reverseContour, type Contour, type Region } from '../geometry/contour';
import Flatbush from 'flatbush';
import { contourBox } from '../moments/kernel';
import { runBoolean } from './engine';
import { RegionSegments } from './region-winding';

export type BoolOp = 'union' | 'difference' | 'intersection';

/**
 * Boxes of many regions in one flat array, four numbers each in flatbush's order (xmin, ymin,
 * xmax, ymax), with xmin = +∞ for a region that has none. A run of thousands of holes asks for
 * each box several times: flat numbers, not a box object per region and per question, keep the
 * garbage collector's work in proportion to the holes.
 */
class BoxList {
  readonly v: Float64Array;
  constructor(readonly length: number) {
    this.v = new Float64Array(4 * length);
  }
  has(k: number): boolean {
    return this.v[4 * k] <= this.v[4 * k + 2];
  }
  /** True when box k and (x0, y0)–(x1, y1) overlap (touching counts). */
  meets(k: number, x0: number, y0: number, x1: number, y1: number): boolean {
    const v = this.v, o = 4 * k;
    return v[o] <= v[o + 2] && !(x0 > v[o + 2] || x1 < v[o] || y0 > v[o + 3] || y1 < v[o + 1]);
  }
  /** Every box widened by tol on each side, so that touching boxes count as overlapping. */
  widen(tol: number): void {
    const v = this.v;
    for (let k = 0; k < this.length; k++) {
      if (!this.has(k)) continue;
      v[4 * k] -= tol;
      v[4 * k + 1] -= tol;
      v[4 * k + 2] += tol;
      v[4 * k + 3] += tol;
    }
  }
}

/**
 * The exact bounds of region r into boxes (slot k), and whether it is clean. A clean loop's box
 * is its summary's when it has one (contourBox); a loop with unusable numbers is bounded as it is.
 */
function boxOf(r: Region, boxes: BoxList, k: number): boolean {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  let clean = true;
  for (const c of r) {
    const ok = cleanContour(c);
    if (!ok) clean = false;
    if (c.xy.length < 2) continue;
    const s = c.xy.length < 4 || !ok ? contourBounds(c) : contourBox(c);
    if (!s) continue;
    if (s.xmin < xmin) xmin = s.xmin;
    if (s.xmax > xmax) xmax = s.xmax;
    if (s.ymin < ymin) ymin = s.ymin;
    if (s.ymax > ymax) ymax = s.ymax;
  }
  const v = boxes.v;
  v[4 * k] = xmin <= xmax ? xmin : Infinity;
  v[4 * k + 1] = ymin;
  v[4 * k + 2] = xmax;
  v[4 * k + 3] = ymax;
  return clean;
}

/** The box around every box of a list (xmin = +∞ when none has one), in flatbush's order. */
function unionOf(list: BoxList): [number, number, number, number] {
  let xmin = Infinity, ymin = Infinity, xmax = -Infinity, ymax = -Infinity;
  const v = list.v;
  for (let k = 0; k < list.length; k++) {
    if (!list.has(k)) continue;
    xmin = Math.min(xmin, v[4 * k]);
    ymin = Math.min(ymin, v[4 * k + 1]);
    xmax = Math.max(xmax, v[4 * k + 2]);
    ymax = Math.max(ymax, v[4 * k + 3]);
  }
  return xmin <= xmax ? [xmin, ymin, xmax, ymax] : [Infinity, Infinity, -Infinity, -Infinity];
}

/** True when every number is finite and every bulge within [-1, 1] (safe to hand back as is). */
function cleanContour(c: Contour): boolean {
  const xy = c.xy, bulge = c.bulge;
  for (let i = 0; i < xy.length; i++) if (!Number.isFinite(xy[i])) return false;
  if (bulge) for (let i = 0; i < bulge.length; i++) if (!(Math.abs(bulge[i]) <= 1)) return false;
  return true;
}

function isClean(r: Region): boolean {
  for (const c of r) if (!cleanContour(c)) return false;
  return true;
}

/** A region returned unchanged, or rebuilt when it holds unusable numbers. */
function passThrough(r: Region): Region {
  return isClean(r) ? r.slice() : runBoolean([{ contours: r, group: 0 }], 'union').region;
}

/**
 * A test "does the box (x0, y0)–(x1, y1) meet any box of the list but number `skip`": a scan for
 * a few boxes or a few questions, a flatbush index for many of both (a run of thousands of shapes
 * would otherwise compare every pair). A plate with thousands of holes asks once, for its one
 * outline: one scan costs less than sorting the boxes into an index. The index is built once the
 * scans have read 32 boxes per box in the list (a few dozen shapes asking of each other: never).
 */
type BoxTest = (x0: number, y0: number, x1: number, y1: number, skip: number) => boolean;
function boxFinder(boxes: BoxList): BoxTest {
  const n = boxes.length;
  const scan: BoxTest = (x0, y0, x1, y1, skip) => {
    for (let j = 0; j < n; j++) if (j !== skip && boxes.meets(j, x0, y0, x1, y1)) return true;
    return false;
  };
  if (n <= 16) return scan;
  let idx: Flatbush | null = null;
  let read = 0;
  let skipping = -1;
  const keep = (j: number) => j !== skipping && boxes.has(j);
  return (x0, y0, x1, y1, skip) => {
    if (!idx && (read += n) <= 32 * n) return scan(x0, y0, x1, y1, skip);
    if (!idx) {
      idx = new Flatbush(n);
      const v = boxes.v;
      for (let j = 0; j < n; j++) {
        if (boxes.has(j)) idx.add(v[4 * j], v[4 * j + 1], v[4 * j + 2], v[4 * j + 3]);
        else idx.add(0, 0, 0, 0); // an empty region: filtered out by keep
      }
      idx.finish();
    }
    skipping = skip;
    return idx.collides(x0, y0, x1, y1, keep);
  };
}

/** Box k of a list, asked of a box test (false when the region has no box). */
function asks(test: BoxTest, list: BoxList, k: number, skip: number): boolean {
  const v = list.v, o = 4 * k;
  return list.has(k) && test(v[o], v[o + 1], v[o + 2], v[o + 3], skip);
}

/**
 * subject OP (union of clips). Inputs: well-formed regions (signed contours).
 *
 * Work is limited to what can change. For union and difference, a subject loop whose box meets no
 * clip's box is kept as it is: nothing reaches the material or the hole it bounds, so the signed
 * loops still add up to the right winding everywhere. For union, a clip that meets neither the
 * subject's loops nor another clip is added as it is. Only the rest goes through clipper.
 */
export function booleanRegions(subject: Region, clips: Region[], op: BoolOp): Region {
  let cl = clips.filter((c) => c.length > 0);
  // Each clip's bounds and cleanness, found once (a run of thousands of holes asks for each twice).
  let boxes = new BoxList(cl.length);
  const cleanClip = new Uint8Array(cl.length);
  cl.forEach((c, k) => (cleanClip[k] = boxOf(c, boxes, k) ? 1 : 0));
  let clean = cleanClip.every((f) => f === 1);
  // The subject's loops' boxes, each found once, and the subject's box around them.
  const subjBoxes = new BoxList(subject.length);
  let subjClean = true;
  subject.forEach((c, k) => (subjClean = boxOf([c], subjBoxes, k) && subjClean));
  const subjBox = new BoxList(1);
  subjBox.v.set(unionOf(subjBoxes));
  if (op !== 'union') {
    // Clips that cannot touch the subject change nothing.
    const sb = subjBox.v;
    const meets: number[] = [];
    for (let k = 0; k < cl.length; k++) if (subjBox.has(0) && boxes.meets(k, sb[0], sb[1], sb[2], sb[3])) meets.push(k);
    if (meets.length < cl.length) {
      const fewer = new BoxList(meets.length);
      meets.forEach((k, j) => fewer.v.set(boxes.v.subarray(4 * k, 4 * k + 4), 4 * j));
      clean = meets.every((k) => cleanClip[k] === 1);
      cl = meets.map((k) => cl[k]);
      boxes = fewer;
    }
    if (cl.length === 0) return op === 'difference' ? passThrough(subject) : [];
    if (subject.length === 0) return [];
  } else if (cl.length === 0) return passThrough(subject);
  const kept: Contour[] = [];
  let subj: Region = subject;
  if (op !== 'intersection' && subjClean && clean) {
    const [sx0, sy0, sx1, sy1] = subjBox.v, [cx0, cy0, cx1, cy1] = unionOf(boxes);
    const xmin = Math.min(sx0, cx0), ymin = Math.min(sy0, cy0), xmax = Math.max(sx1, cx1), ymax = Math.max(sy1, cy1);
    const tol = xmin <= xmax ? 1e-9 * Math.max(xmax - xmin, ymax - ymin) : 0;
    boxes.widen(tol);
    subjBoxes.widen(tol);
    const clipsNear = boxFinder(boxes), subjNear = boxFinder(subjBoxes);
    const active: Contour[] = [];
    subject.forEach((c, k) => (asks(clipsNear, subjBoxes, k, -1) ? active.push(c) : kept.push(c)));
    // A clip that meets no other clip and no segment of the subject lies inside one face of the
    // subject, where the subject's winding number is the same everywhere: one exact winding
    // number at its first point says whether it is in the material. Union adds it when it is
    // not, difference cuts it out as a hole when it is; either way it never goes to clipper.
    // (A plate with thousands of clear holes is then linear: no carriers, no grid, no trace.)
    let faces: RegionSegments | null = null;
    const busy: Region[] = [];
    const b = boxes.v;
    for (let k = 0; k < cl.length; k++) {
      const c = cl[k];
      if (!boxes.has(k) || asks(clipsNear, boxes, k, k)) {
        busy.push(c);
        continue;
      }
      if (!asks(subjNear, boxes, k, -1)) {
        // Clear of every subject loop's box: outside the subject (a cut there removes nothing).
        if (op === 'union') for (const q of c) kept.push(q);
        continue;
      }
      faces ??= new RegionSegments(subject);
      let first: Contour | null = null;
      for (const q of c) if (q.xy.length >= 2) {
        first = q;
        break;
      }
      if (faces.hasFlatArc || !first || faces.meets(b[4 * k], b[4 * k + 1], b[4 * k + 2], b[4 * k + 3])) {
        busy.push(c);
        continue;
      }
      const inside = faces.windingAt(first.xy[0], first.xy[1]) > 0;
      if (op === 'union' && !inside) for (const q of c) kept.push(q);
      else if (op === 'difference' && inside) for (const q of c) kept.push(reverseContour(q));
      // Otherwise the clip changes nothing: a union inside the material, a cut outside it.
    }
    cl = busy;
    subj = active;
    if (cl.length === 0) return [...kept, ...subj];
    if (subj.length === 0 && op === 'difference') return kept;
  }
  const clipContours: Contour[] = [];
  for (const r of cl) for (const c of r) clipContours.push(c);
  const out = runBoolean([{ contours: subj, group: 0 }, { contours: clipContours, group: 1 }], op).region;
  return kept.length ? [...kept, ...out] : out;
}

/**
 * Resolve one shape's raw outline (may self-intersect or overlap itself) by the even-odd rule into
 * a clean region. selfIntersecting=true when the outline crossed itself (the caller reports a
 * warning). Also normalises orientation (outer CCW, holes CW).
 */
export function resolveOutline(contours: Contour[]): { region: Region; selfIntersecting: boolean } {
  const { region, contact } = runBoolean([{ contours, group: 0 }], 'evenodd');
  return { region, selfIntersecting: contact };
}
