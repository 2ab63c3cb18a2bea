/**
 * Outlines from geometry: a region's contours as path shapes (arcs kept as {to, via} with via the
 * arc's midpoint), for "merge into one outline" and "convert to outline".
 */
import { arcFromChord, profileToPaths, type Contour, type PathSegment, type PathShape, type Point, type ProfileShape, type Region, type SectionDocument, type Shape } from '../../src';
import { newShapeId } from './ids';

/** The point where a contour's arc segment i is at half its sweep. */
function arcMidpoint(c: Contour, i: number): Point {
  const n = c.xy.length >> 1;
  const j = (i + 1) % n;
  const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
  const phi = 4 * Math.atan(c.bulge![i]);
  const { cx, cy, r } = arcFromChord(ax, ay, c.xy[2 * j], c.xy[2 * j + 1], phi);
  const t = Math.atan2(ay - cy, ax - cx) + phi / 2;
  return [cx + r * Math.cos(t), cy + r * Math.sin(t)];
}

/** Signed area of a contour's straight-chord polygon plus its arc segments (sign tells outer/hole). */
export function contourSignedArea(c: Contour): number {
  const n = c.xy.length >> 1;
  let a = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const x0 = c.xy[2 * i], y0 = c.xy[2 * i + 1], x1 = c.xy[2 * j], y1 = c.xy[2 * j + 1];
    a += (x0 * y1 - x1 * y0) / 2;
    const b = c.bulge ? c.bulge[i] : 0;
    if (b !== 0) {
      const phi = 4 * Math.atan(b);
      const L = Math.hypot(x1 - x0, y1 - y0);
      const r = L / (2 * Math.sin(Math.abs(phi) / 2));
      a += (Math.sign(phi) * r * r * (Math.abs(phi) - Math.sin(Math.abs(phi)))) / 2;
    }
  }
  return a;
}

/** One closed path from a contour: lines as {to}, arcs as {to, via} with via the arc midpoint. */
export function contourToPath(c: Contour, id: string, op: Shape['op']): PathShape {
  const n = c.xy.length >> 1;
  const pt = (k: number): Point => [c.xy[2 * (k % n)], c.xy[2 * (k % n) + 1]];
  const segments: PathSegment[] = [];
  for (let i = 0; i < n; i++) {
    const to = pt(i + 1);
    if (c.bulge && c.bulge[i] !== 0) segments.push({ to, via: arcMidpoint(c, i) });
    else segments.push({ to });
  }
  return { id, type: 'path', op, start: pt(0), segments };
}

/**
 * Paths for a boolean result: every outer loop (CCW) an `add` path, every hole (CW) a `subtract`
 * path after all the outer loops, so the holes cut what the loops add.
 */
export function regionToPaths(region: Region, doc: SectionDocument): PathShape[] {
  const taken = new Set<string>();
  const nextId = () => {
    const id = newShapeId(doc, taken);
    taken.add(id);
    return id;
  };
  const outers: PathShape[] = [], holes: PathShape[] = [];
  for (const c of region) {
    if ((c.xy.length >> 1) < 2) continue;
    if (contourSignedArea(c) >= 0) outers.push(contourToPath(c, nextId(), 'add'));
    else holes.push(contourToPath(c, nextId(), 'subtract'));
  }
  return [...outers, ...holes];
}

/**
 * A profile as plain path shapes (outer loop with the profile's op; holes subtracted after it).
 * Returns an error text when that would not mean the same section.
 */
export function profileToOutline(s: ProfileShape, doc: SectionDocument): { ok: true; shapes: Shape[] } | { ok: false; message: string } {
  const { outer, holes } = profileToPaths(s);
  const op = s.op ?? 'add';
  if (holes.length && op !== 'add') {
    return { ok: false, message: `A hollow profile with the "${op}" operation cannot become separate outlines without changing the section; switch it to add first or merge it with the shapes it combines with.` };
  }
  const taken = new Set<string>([s.id]);
  const out: Shape[] = [{ ...outer, id: s.id, name: s.name, op }];
  for (const h of holes) {
    const id = newShapeId(doc, taken);
    taken.add(id);
    out.push({ ...h, id, name: s.name ? `${s.name} (hole)` : undefined, op: 'subtract' });
  }
  return { ok: true, shapes: out.map(stripUndefined) };
}

function stripUndefined<T extends object>(o: T): T {
  const out = { ...o } as Record<string, unknown>;
  for (const k of Object.keys(out)) if (out[k] === undefined) delete out[k];
  return out as T;
}

