/**
 * Booleans on exact regions bounded by lines and circular arcs.
 *
 * clipper-lib decides which pieces of the boundaries survive; every surviving piece is traced back
 * to its exact source segment, so the output arcs are the source arcs again (same centre and
 * radius) and every vertex sits on an exact source vertex or an exact analytic intersection.
 * See engine.ts for the pipeline.
 */
import { contourBounds, reverseContour, type Bounds, type Contour, type Region } from '../geometry/contour';
import { unionBounds } from '../geometry/bounds';
import Flatbush from 'flatbush';
import { contourBox } from '../moments/kernel';
import { runBoolean } from './engine';
import { RegionSegments } from './region-winding';

export type BoolOp = 'union' | 'difference' | 'intersection';

/** A region's exact bounds (from its contours' boxes, kept by identity across calls) and whether it is clean. */
interface RegionInfo {
  box: Bounds | null;
  clean: boolean;
}

/**
 * Bounds and cleanness of a region in one pass over its contours. A clean loop's box is the
 * one kept by identity (contourBox); a loop with unusable numbers is bounded as it is.
 */
function regionInfo(r: Region): RegionInfo {
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
  return { box: xmin <= xmax ? { xmin, xmax, ymin, ymax } : null, clean };
}

function boxesOverlap(ba: Bounds | null, bb: Bounds | null): boolean {
  if (!ba || !bb) return false;
  return !(bb.xmin > ba.xmax || bb.xmax < ba.xmin || bb.ymin > ba.ymax || bb.ymax < ba.ymin);
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

/** Bounds widened by a tolerance, so that touching boxes count as overlapping. */
function widened(b: Bounds | null, tol: number): Bounds | null {
  return b && { xmin: b.xmin - tol, xmax: b.xmax + tol, ymin: b.ymin - tol, ymax: b.ymax + tol };
}
function boxesMeet(a: Bounds | null, b: Bounds | null): boolean {
  return !!a && !!b && !(b.xmin > a.xmax || b.xmax < a.xmin || b.ymin > a.ymax || b.ymax < a.ymin);
}

/**
 * A test "does box b meet any of these boxes but number `skip`": a scan for a few boxes or a few
 * questions, a flatbush index for many of both (a run of thousands of shapes would otherwise
 * compare every pair). A plate with thousands of holes asks once, for its one outline: one scan
 * costs less than sorting the boxes into an index.
 */
function boxFinder(boxes: (Bounds | null)[]): (b: Bounds | null, skip: number) => boolean {
  const scan = (b: Bounds | null, skip: number) => boxes.some((o, j) => j !== skip && boxesMeet(o, b));
  if (boxes.length <= 16) return scan;
  let idx: Flatbush | null = null; // built on the ninth question
  let asked = 0;
  return (b, skip) => {
    if (!b) return false;
    if (!idx && ++asked <= 8) return scan(b, skip);
    if (!idx) {
      idx = new Flatbush(boxes.length);
      for (const o of boxes) {
        if (o) idx.add(o.xmin, o.ymin, o.xmax, o.ymax);
        else idx.add(0, 0, 0, 0); // an empty region: filtered out below
      }
      idx.finish();
    }
    return idx.collides(b.xmin, b.ymin, b.xmax, b.ymax, (j) => j !== skip && boxes[j] !== null);
  };
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
  let info = cl.map(regionInfo);
  const subjInfo = regionInfo(subject);
  if (op !== 'union') {
    // Clips that cannot touch the subject change nothing.
    const sb = subjInfo.box;
    const meets = info.map((f) => boxesOverlap(sb, f.box));
    cl = cl.filter((_, k) => meets[k]);
    info = info.filter((_, k) => meets[k]);
    if (cl.length === 0) return op === 'difference' ? passThrough(subject) : [];
    if (subject.length === 0) return [];
  } else if (cl.length === 0) return passThrough(subject);
  const kept: Contour[] = [];
  let subj: Region = subject;
  if (op !== 'intersection' && subjInfo.clean && info.every((f) => f.clean)) {
    let all = subjInfo.box;
    for (const f of info) all = unionBounds(all, f.box);
    const tol = all ? 1e-9 * Math.max(all.xmax - all.xmin, all.ymax - all.ymin) : 0;
    const clipBoxes = info.map((f) => widened(f.box, tol));
    const subjBoxes = subject.map((c) => widened(regionInfo([c]).box, tol));
    const clipsNear = boxFinder(clipBoxes), subjNear = boxFinder(subjBoxes);
    const active: Contour[] = [];
    subject.forEach((c, k) => (clipsNear(subjBoxes[k], -1) ? active.push(c) : kept.push(c)));
    // A clip that meets no other clip and no segment of the subject lies inside one face of the
    // subject, where the subject's winding number is the same everywhere: one exact winding
    // number at its first point says whether it is in the material. Union adds it when it is
    // not, difference cuts it out as a hole when it is; either way it never goes to clipper.
    // (A plate with thousands of clear holes is then linear: no carriers, no grid, no trace.)
    let faces: RegionSegments | null = null;
    const busy: Region[] = [];
    cl.forEach((c, k) => {
      const b = clipBoxes[k];
      if (!b || clipsNear(b, k)) return void busy.push(c);
      if (!subjNear(b, -1)) {
        // Clear of every subject loop's box: outside the subject (a cut there removes nothing).
        if (op === 'union') kept.push(...c);
        return;
      }
      faces ??= new RegionSegments(subject);
      const first = c.find((q) => q.xy.length >= 2);
      if (faces.hasFlatArc || !first || faces.meets(b.xmin, b.ymin, b.xmax, b.ymax)) return void busy.push(c);
      const inside = faces.windingAt(first.xy[0], first.xy[1]) > 0;
      if (op === 'union' && !inside) kept.push(...c);
      else if (op === 'difference' && inside) for (const q of c) kept.push(reverseContour(q));
      // Otherwise the clip changes nothing: a union inside the material, a cut outside it.
    });
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
