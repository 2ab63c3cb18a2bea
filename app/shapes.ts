/**
 * Editor-side operations on shape records: each returns a new record and never mutates its input.
 * Geometry (outlines, moments) stays in the engine; these only move numbers around.
 */
import {
  arcFromChord,
  profileToPaths,
  type Contour,
  type PathSegment,
  type PathShape,
  type Point,
  type ProfileShape,
  type Region,
  type SectionDocument,
  type Shape,
} from '../src';

export const PROFILE_TYPE_LIST = ['rectangle', 'i-beam', 'channel', 'angle', 'tee', 'rect-tube', 'round-tube', 'bent-plate'] as const;

export const SHAPE_KIND_LABEL: Record<Shape['type'], string> = {
  polygon: 'Polygon',
  circle: 'Circle',
  path: 'Path',
  rectangle: 'Rectangle',
  'i-beam': 'I-beam',
  channel: 'Channel',
  angle: 'Angle',
  tee: 'Tee',
  'rect-tube': 'Rectangular tube',
  'round-tube': 'Round tube',
  'bent-plate': 'Bent plate',
};

export function isProfile(s: Shape): s is ProfileShape {
  return (PROFILE_TYPE_LIST as readonly string[]).includes(s.type);
}

export function shapeLabel(s: Shape, index: number): string {
  return s.name?.trim() ? s.name : `${SHAPE_KIND_LABEL[s.type]} ${index + 1}`;
}

/** A fresh id that the document does not use yet: `s1`, `s2`, ... */
export function newShapeId(doc: SectionDocument, taken: Set<string> = new Set()): string {
  const used = new Set(doc.shapes.map((s) => s.id));
  for (let k = doc.shapes.length + 1; ; k++) {
    const id = `s${k}`;
    if (!used.has(id) && !taken.has(id)) return id;
  }
}

type Map2 = (p: Point) => Point;

/** Apply a point map to every coordinate of a polygon, circle or path (not profiles). */
function mapPoints<T extends Shape>(s: T, f: Map2): T {
  switch (s.type) {
    case 'polygon':
      return { ...s, points: s.points.map(f) };
    case 'circle':
      return { ...s, center: f(s.center) };
    case 'path':
      return { ...s, start: f(s.start), segments: s.segments.map((g) => (g.via ? { to: f(g.to), via: f(g.via) } : { to: f(g.to) })) };
    default:
      return { ...s, at: f((s as ProfileShape).at) } as T;
  }
}

export function translateShape(s: Shape, dx: number, dy: number): Shape {
  if (dx === 0 && dy === 0) return s;
  return mapPoints(s, (p) => [p[0] + dx, p[1] + dy]);
}

/** Rotate by `deg` degrees CCW about (px, py). Profiles keep their parametric form. */
export function rotateShape(s: Shape, deg: number, px: number, py: number): Shape {
  const t = (deg * Math.PI) / 180;
  const c = Math.cos(t), sn = Math.sin(t);
  const f: Map2 = (p) => [px + c * (p[0] - px) - sn * (p[1] - py), py + sn * (p[0] - px) + c * (p[1] - py)];
  const moved = mapPoints(s, f);
  if (isProfile(s)) return { ...(moved as ProfileShape), rotation: normaliseDeg((s.rotation ?? 0) + deg) };
  return moved;
}

function normaliseDeg(d: number): number {
  let r = d % 360;
  if (r > 180) r -= 360;
  if (r <= -180) r += 360;
  return Math.abs(r) < 1e-12 ? 0 : r;
}

/**
 * Mirror about the vertical line x = c ('x') or the horizontal line y = c ('y').
 * A profile toggles its `mirror` flag and its rotation becomes −θ (about x = c) or 180° − θ.
 */
export function mirrorShape(s: Shape, axis: 'vertical' | 'horizontal', c: number): Shape {
  const f: Map2 = axis === 'vertical' ? (p) => [2 * c - p[0], p[1]] : (p) => [p[0], 2 * c - p[1]];
  const moved = mapPoints(s, f);
  if (isProfile(s)) {
    const rot = s.rotation ?? 0;
    return { ...(moved as ProfileShape), mirror: !s.mirror, rotation: normaliseDeg(axis === 'vertical' ? -rot : 180 - rot) };
  }
  if (moved.type === 'polygon') return { ...moved, points: moved.points.slice().reverse() };
  return moved;
}

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

/** Every editable point of a shape, for handles: [role, point]. */
export type HandleRef =
  | { kind: 'vertex'; index: number }
  | { kind: 'start' }
  | { kind: 'to'; index: number }
  | { kind: 'via'; index: number }
  | { kind: 'centre' }
  | { kind: 'radius' }
  | { kind: 'at' };

export function shapeHandles(s: Shape): { ref: HandleRef; p: Point }[] {
  switch (s.type) {
    case 'polygon':
      return s.points.map((p, index) => ({ ref: { kind: 'vertex', index }, p }));
    case 'circle':
      return [
        { ref: { kind: 'centre' }, p: s.center },
        { ref: { kind: 'radius' }, p: [s.center[0] + s.radius, s.center[1]] },
      ];
    case 'path': {
      const out: { ref: HandleRef; p: Point }[] = [{ ref: { kind: 'start' }, p: s.start }];
      s.segments.forEach((g, index) => {
        // The last segment's end is the start (closed path): one handle moves both.
        if (index < s.segments.length - 1) out.push({ ref: { kind: 'to', index }, p: g.to });
        if (g.via) out.push({ ref: { kind: 'via', index }, p: g.via });
      });
      return out;
    }
    default:
      return [{ ref: { kind: 'at' }, p: s.at }];
  }
}

/** The shape with one handle moved to p. */
export function moveHandle(s: Shape, ref: HandleRef, p: Point): Shape {
  switch (ref.kind) {
    case 'vertex':
      if (s.type !== 'polygon') return s;
      return { ...s, points: s.points.map((q, i) => (i === ref.index ? p : q)) };
    case 'centre':
      return s.type === 'circle' ? { ...s, center: p } : s;
    case 'radius':
      return s.type === 'circle' ? { ...s, radius: Math.hypot(p[0] - s.center[0], p[1] - s.center[1]) } : s;
    case 'start': {
      if (s.type !== 'path') return s;
      const last = s.segments.length - 1;
      return { ...s, start: p, segments: s.segments.map((g, i) => (i === last ? { ...g, to: p } : g)) };
    }
    case 'to':
      if (s.type !== 'path') return s;
      return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
    case 'via':
      if (s.type !== 'path') return s;
      return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
    case 'at':
      return isProfile(s) ? { ...s, at: p } : s;
  }
}
