/**
 * Outlines from geometry: a region's contours as path shapes (arcs kept as {to, via} with via the
 * arc's midpoint), for "merge into one outline" and "convert to outline".
 */
import { arcFromChord, type Contour, type Region } from '../geometry/contour';
import { contourArea } from '../moments/kernel';
import { newShapeId } from './ids';
import type { Shape } from './shape';
import type { Point } from './base';
import type { PathSegment, PathShape } from './path';
import { profileToPaths } from './profile/outline';
import type { ProfileShape } from './profile/types';

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
export function regionToPaths(region: Region, used: ReadonlySet<string>): PathShape[] {
  const taken = new Set<string>(used);
  const nextId = () => {
    const id = newShapeId(taken);
    taken.add(id);
    return id;
  };
  const outers: PathShape[] = [], holes: PathShape[] = [];
  for (const c of region) {
    if ((c.xy.length >> 1) < 2) continue;
    if (contourArea(c) >= 0) outers.push(contourToPath(c, nextId(), 'add'));
    else holes.push(contourToPath(c, nextId(), 'subtract'));
  }
  return [...outers, ...holes];
}

/**
 * A profile as plain path shapes (outer loop with the profile's op; holes subtracted after it).
 * Returns an error text when that would not mean the same section.
 */
export function profileToOutline(s: ProfileShape, used: ReadonlySet<string>): { ok: true; shapes: Shape[] } | { ok: false; message: string } {
  const { outer, holes } = profileToPaths(s);
  const op = s.op ?? 'add';
  if (holes.length && op !== 'add') {
    return { ok: false, message: `A hollow profile with the "${op}" operation cannot become separate outlines without changing the section; switch it to add first or merge it with the shapes it combines with.` };
  }
  const taken = new Set<string>([...used, s.id]);
  const out: Shape[] = [{ ...outer, id: s.id, name: s.name, op }];
  for (const h of holes) {
    const id = newShapeId(taken);
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

