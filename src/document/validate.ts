/**
 * Validation of section documents: every problem is returned with its path in the document
 * (`shapes[2].segments[4].via: arc points are collinear`), never just the first one.
 */
import { CURRENT_VERSION, FORMAT, OPS, UNITS, type SectionDocument } from './types';
import { migrate, KNOWN_VERSIONS } from './migrate';
import { validateProfile } from './profiles';
import type { ProfileShape } from './types';

export interface Issue {
  path: string;
  message: string;
}

export type DocResult =
  | { ok: true; doc: SectionDocument; warnings: Issue[] }
  | { ok: false; errors: Issue[]; warnings: Issue[] };

export function formatIssue(i: Issue): string {
  return i.path ? `${i.path}: ${i.message}` : i.message;
}

const PROFILE_TYPES = ['rectangle', 'i-beam', 'channel', 'angle', 'tee', 'rect-tube', 'round-tube', 'bent-plate'] as const;
const SHAPE_TYPES = ['polygon', 'circle', 'path', ...PROFILE_TYPES] as const;

/** Parse JSON text into a validated, migrated document. */
export function parseDocument(text: string): DocResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    return { ok: false, errors: [{ path: '', message: `the file is not valid JSON (${msg})` }], warnings: [] };
  }
  return validateDocument(value);
}

function isObj(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function fmtNum(v: unknown): string {
  return typeof v === 'number' ? String(v) : JSON.stringify(v) ?? String(v);
}

/** Checks a [x, y] pair of finite numbers; returns the issue or null. */
function checkPoint(v: unknown, path: string, out: Issue[]): v is [number, number] {
  if (!Array.isArray(v) || v.length !== 2) {
    out.push({ path, message: `expected a point [x, y], got ${fmtNum(v)}` });
    return false;
  }
  let ok = true;
  v.forEach((c, k) => {
    if (typeof c !== 'number' || !Number.isFinite(c)) {
      out.push({ path: `${path}[${k}]`, message: `coordinate must be a finite number, got ${fmtNum(c)}` });
      ok = false;
    }
  });
  return ok;
}

function checkNumber(v: unknown, path: string, out: Issue[], opts: { positive?: boolean; optional?: boolean; name: string }): boolean {
  if (v === undefined && opts.optional) return true;
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    out.push({ path, message: `${opts.name} must be a finite number, got ${fmtNum(v)}` });
    return false;
  }
  if (opts.positive && !(v > 0)) {
    out.push({ path, message: `${opts.name} must be greater than 0, got ${v}` });
    return false;
  }
  return true;
}

const dist = (a: readonly number[], b: readonly number[]) => Math.hypot(a[0] - b[0], a[1] - b[1]);

/** Validate one shape record. `path` is its location, e.g. 'shapes[3]'. */
export function validateShape(s: unknown, path: string): Issue[] {
  const out: Issue[] = [];
  if (!isObj(s)) return [{ path, message: 'a shape must be an object' }];
  if (typeof s.id !== 'string' || s.id.trim() === '') out.push({ path: `${path}.id`, message: 'every shape needs a non-empty string id' });
  if (s.name !== undefined && typeof s.name !== 'string') out.push({ path: `${path}.name`, message: 'name must be text' });
  if (s.op !== undefined && !(OPS as readonly unknown[]).includes(s.op)) {
    out.push({ path: `${path}.op`, message: `unknown operation ${fmtNum(s.op)}; use one of ${OPS.join(', ')}` });
  }
  if (!(SHAPE_TYPES as readonly unknown[]).includes(s.type)) {
    out.push({ path: `${path}.type`, message: `unknown shape type ${fmtNum(s.type)}; use one of ${SHAPE_TYPES.join(', ')}` });
    return out;
  }
  switch (s.type) {
    case 'polygon':
      validatePolygon(s, path, out);
      break;
    case 'circle':
      if (checkPoint(s.center, `${path}.center`, out) && checkNumber(s.radius, `${path}.radius`, out, { positive: true, name: 'radius' })) {
        const c = s.center as [number, number], r = s.radius as number;
        if (r < 1e-9 * Math.max(Math.abs(c[0]), Math.abs(c[1]))) {
          out.push({ path: `${path}.radius`, message: `radius ${r} is too small for a centre so far from the origin (${c[0]}, ${c[1]}): it would be lost in rounding` });
        }
      }
      break;
    case 'path':
      validatePath(s, path, out);
      break;
    default:
      validateProfileRecord(s, path, out);
  }
  return out;
}

function validatePolygon(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const pts = s.points;
  if (!Array.isArray(pts)) {
    out.push({ path: `${path}.points`, message: 'a polygon needs a list of points' });
    return;
  }
  if (pts.length < 3) {
    out.push({ path: `${path}.points`, message: `a polygon needs at least 3 points, got ${pts.length}` });
    return;
  }
  let ok = true;
  pts.forEach((p, k) => {
    ok = checkPoint(p, `${path}.points[${k}]`, out) && ok;
  });
  if (!ok) return;
  // Degenerate: every point on one line (a self-crossing outline may have zero net area and is
  // still valid: it is resolved by the even-odd rule).
  const P = pts as [number, number][];
  let far = P[0], fd = 0;
  for (const q of P) {
    if (dist(q, P[0]) > fd) {
      far = q;
      fd = dist(q, P[0]);
    }
  }
  let maxCross = 0;
  for (const q of P) maxCross = Math.max(maxCross, Math.abs((q[0] - P[0][0]) * (far[1] - P[0][1]) - (q[1] - P[0][1]) * (far[0] - P[0][0])));
  if (!(maxCross > 1e-12 * fd * fd)) out.push({ path: `${path}.points`, message: 'the points enclose no area (they are collinear or repeated)' });
}

function validatePath(s: Record<string, unknown>, path: string, out: Issue[]): void {
  if (!checkPoint(s.start, `${path}.start`, out)) return;
  const segs = s.segments;
  if (!Array.isArray(segs) || segs.length === 0) {
    out.push({ path: `${path}.segments`, message: 'a path needs at least one segment' });
    return;
  }
  const start = s.start as [number, number];
  let cur: [number, number] | null = start;
  let ext = 0;
  let ok = true;
  segs.forEach((g, k) => {
    const gp = `${path}.segments[${k}]`;
    if (!isObj(g)) {
      out.push({ path: gp, message: 'a segment must be an object {to} or {to, via}' });
      ok = false;
      cur = null;
      return;
    }
    const toOk = checkPoint(g.to, `${gp}.to`, out);
    const viaOk = g.via === undefined || checkPoint(g.via, `${gp}.via`, out);
    if (!toOk || !viaOk) {
      ok = false;
      cur = null;
      return;
    }
    const to = g.to as [number, number];
    ext = Math.max(ext, dist(to, start));
    if (cur && g.via !== undefined) {
      const via = g.via as [number, number];
      const a = cur;
      const chord = dist(a, to), scale = Math.max(chord, dist(a, via), dist(via, to));
      if (chord <= 1e-12 * Math.max(scale, 1e-300)) {
        out.push({ path: `${gp}.to`, message: 'arc ends where it starts; draw a full circle as two arcs' });
        ok = false;
      } else {
        const cross = (via[0] - a[0]) * (to[1] - a[1]) - (via[1] - a[1]) * (to[0] - a[0]);
        if (!(Math.abs(cross) > 1e-10 * scale * scale)) {
          out.push({ path: `${gp}.via`, message: 'arc points are collinear' });
          ok = false;
        }
      }
    } else if (cur && dist(cur, to) === 0) {
      // A zero-length line is harmless; it is dropped when the outline is built.
    }
    cur = to;
  });
  if (!ok) return;
  const last = (segs[segs.length - 1] as { to: [number, number] }).to;
  const gap = dist(last, start);
  if (gap > 1e-9 * Math.max(ext, 1e-300)) {
    out.push({
      path: `${path}.segments`,
      message: `path does not close: it ends at (${last[0]}, ${last[1]}) but starts at (${start[0]}, ${start[1]})`,
    });
  } else if (segs.length < 2 && (segs[0] as { via?: unknown }).via === undefined) {
    out.push({ path: `${path}.segments`, message: 'a closed path needs at least two segments' });
  }
}

function validateProfileRecord(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const before = out.length;
  checkPoint(s.at, `${path}.at`, out);
  checkNumber(s.rotation, `${path}.rotation`, out, { optional: true, name: 'rotation' });
  if (s.mirror !== undefined && typeof s.mirror !== 'boolean') out.push({ path: `${path}.mirror`, message: 'mirror must be true or false' });
  if (out.length > before) return;
  for (const i of validateProfile(s as unknown as ProfileShape)) out.push({ path: i.path ? `${path}.${i.path}` : path, message: i.message });
}

/** Validate (and migrate) a whole document. */
export function validateDocument(value: unknown): DocResult {
  const errors: Issue[] = [];
  const warnings: Issue[] = [];
  if (!isObj(value)) return { ok: false, errors: [{ path: '', message: 'a section document must be a JSON object' }], warnings };
  if (value.format !== FORMAT) {
    errors.push({ path: 'format', message: `expected "${FORMAT}", got ${fmtNum(value.format)}` });
    return { ok: false, errors, warnings };
  }
  if (typeof value.version !== 'number' || !KNOWN_VERSIONS.includes(value.version)) {
    errors.push({
      path: 'version',
      message: `unknown version ${fmtNum(value.version)}; this Kern reads version${KNOWN_VERSIONS.length > 1 ? 's' : ''} ${KNOWN_VERSIONS.join(', ')}`,
    });
    return { ok: false, errors, warnings };
  }
  const doc = migrate(value) as Record<string, unknown>;
  if (!(UNITS as readonly unknown[]).includes(doc.units)) {
    errors.push({ path: 'units', message: `unknown units ${fmtNum(doc.units)}; use one of ${UNITS.join(', ')}` });
  }
  if (!Array.isArray(doc.shapes)) {
    errors.push({ path: 'shapes', message: 'shapes must be a list' });
  } else {
    const seen = new Map<string, number>();
    doc.shapes.forEach((s, k) => {
      errors.push(...validateShape(s, `shapes[${k}]`));
      if (isObj(s) && typeof s.id === 'string') {
        const prev = seen.get(s.id);
        if (prev !== undefined) errors.push({ path: `shapes[${k}].id`, message: `id "${s.id}" is already used by shapes[${prev}]` });
        else seen.set(s.id, k);
      }
    });
  }
  if (doc.name !== undefined && typeof doc.name !== 'string') errors.push({ path: 'name', message: 'name must be text' });
  if (doc.title !== undefined) {
    if (!isObj(doc.title)) errors.push({ path: 'title', message: 'title must be an object of text fields' });
    else for (const [k, v] of Object.entries(doc.title)) if (typeof v !== 'string') errors.push({ path: `title.${k}`, message: 'must be text' });
  }
  if (errors.length) return { ok: false, errors, warnings };
  return { ok: true, doc: doc as unknown as SectionDocument, warnings };
}

export { CURRENT_VERSION };
