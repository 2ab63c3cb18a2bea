/**
 * DXF import: outlines drawn in a CAD program become path shapes of a section document.
 *
 * The steps read like the algorithm:
 *   1. scan: split the text into groups and refuse what is not a complete ASCII DXF (dxf-scan.ts);
 *   2. parse each entity with dxf-parser and turn LINE, ARC, CIRCLE, LWPOLYLINE and POLYLINE into
 *      pieces of exact lines and arcs (bulge = tan(sweep/4), as in the DXF reference);
 *   3. join open pieces whose ends meet within the tolerance into closed loops (chains.ts);
 *   4. nest the loops: even depth is material, odd depth a hole (nesting.ts);
 *   5. emit one shape per loop, outermost first, holes with op 'subtract'.
 * Anything that cannot be closed is reported with its layer, handle and geometry, and left out.
 * Entity kinds, layer names and handles from the file are data only: they are copied into text
 * fields and messages, never interpreted.
 *
 * Sources: AutoCAD DXF Reference (2012): LINE, ARC, CIRCLE, LWPOLYLINE (group 42 bulge, group 70
 * bit 1 closed), POLYLINE/VERTEX/SEQEND, "Object Coordinate Systems (OCS)" and the arbitrary
 * axis algorithm (for extrusion (0, 0, −1) the OCS x axis is −X), and header variable $INSUNITS.
 */
import DxfParser from 'dxf-parser';
import type { Contour, Region } from '../geometry/contour';
import { circleContour, contourFrom, pushArc, reverseContour } from '../geometry/contour';
import { contourArea } from '../moments/kernel';
import type { CircleShape, PathSegment, PathShape, Point, Shape, Units } from '../document/types';
import { UNIT_IN_METRES } from '../document/types';
import { describeSource, joinPieces, type JoinedLoop, type Piece, type PieceSource } from './chains';
import { scanDxf, type ScannedEntity } from './dxf-scan';
import { nestLoops } from './nesting';

export interface DxfProblem {
  handle: string;
  layer: string;
  message: string;
  /** The entity's geometry (arcs as points) in the units of the result, for highlighting. */
  points: [number, number][];
}

export interface DxfImportOk {
  ok: true;
  /** Units of the returned geometry: the file's, else opts.units, else null (ask the user). */
  units: Units | null;
  /** What the file's $INSUNITS says, when it names mm, cm, m, in or ft; otherwise null. */
  unitsFromFile: Units | null;
  /** Path (and circle) shapes, outermost first, holes with op 'subtract'; ready to append. */
  shapes: Shape[];
  /** The same section as an exact region (outer loops CCW, holes CW), for previews. */
  region: Region;
  /** Entities left out of the section. */
  problems: DxfProblem[];
  /** Geometry that was kept but deserves a look (crossing loops, unsupported units, ...). */
  warnings: string[];
  /** Entities that are not outline geometry (text, dimensions, ...), counted by kind. */
  ignored: { type: string; count: number }[];
  /** The joining tolerance used, in the units of the result. */
  tol: number;
}

export type DxfImport = DxfImportOk | { ok: false; error: string };

export interface DxfImportOptions {
  /** Units to assume when the file does not state them. */
  units?: Units;
  /** Convert the geometry into these units (needs known source units). */
  targetUnits?: Units;
  /** Joining tolerance in the file's drawing units; default 1e-6 × the drawing's extent. */
  tol?: number;
  /** Shape ids are `${idPrefix}-1`, `${idPrefix}-2`, ...; default 'dxf'. */
  idPrefix?: string;
}

/** $INSUNITS codes of the DXF reference that are section-document units. */
export const INSUNITS: Readonly<Record<number, Units>> = { 1: 'in', 2: 'ft', 4: 'mm', 5: 'cm', 6: 'm' };
const INSUNITS_NAMES: Readonly<Record<number, string>> = {
  3: 'miles', 7: 'kilometres', 8: 'microinches', 9: 'mils', 10: 'yards', 11: 'ångströms', 12: 'nanometres',
  13: 'micrometres', 14: 'decimetres', 15: 'decametres', 16: 'hectometres', 17: 'gigametres',
  18: 'astronomical units', 19: 'light years', 20: 'parsecs',
};

/** Relative default joining tolerance (common practice, no source: CAD files carry 10+ digits). */
export const DEFAULT_RELATIVE_TOL = 1e-6;

/** Entity kinds that are annotation, not outline: counted, not reported as problems. */
const ANNOTATION = new Set([
  'TEXT', 'MTEXT', 'DIMENSION', 'POINT', 'ATTDEF', 'ATTRIB', 'HATCH', 'SOLID', '3DFACE', 'VIEWPORT',
  'LEADER', 'MLEADER', 'MULTILEADER', 'TOLERANCE', 'XLINE', 'RAY', 'IMAGE', 'WIPEOUT', 'TRACE', 'OLE2FRAME',
]);

interface XY {
  x: number;
  y: number;
}
interface ParsedVertex extends XY {
  bulge?: number;
  splineControlPoint?: boolean;
}
interface ParsedEntity {
  type: string;
  vertices?: ParsedVertex[];
  center?: XY;
  radius?: number;
  startAngle?: number;
  endAngle?: number;
  shape?: boolean;
  is3dPolyline?: boolean;
  is3dPolygonMesh?: boolean;
  isPolyfaceMesh?: boolean;
  position?: XY;
  controlPoints?: XY[];
  fitPoints?: XY[];
  majorAxisEndPoint?: XY;
  axisRatio?: number;
}

class EntityProblem extends Error {}

const finite = (...v: unknown[]) => v.every((x) => typeof x === 'number' && Number.isFinite(x));

export function importDxf(text: string, opts: DxfImportOptions = {}): DxfImport {
  try {
    return importUnsafe(text, opts);
  } catch (e) {
    // Nothing above should throw; if it does, the caller still gets a message, never a crash.
    return { ok: false, error: `The DXF file could not be read: ${e instanceof Error ? e.message : String(e)}` };
  }
}

function importUnsafe(text: string, opts: DxfImportOptions): DxfImport {
  const scan = scanDxf(text);
  if (!scan.ok) return scan;
  if (!scan.hasEntitiesSection) return { ok: false, error: 'The DXF file has no ENTITIES section: there is nothing to import.' };

  const warnings: string[] = [];
  const problems: { source: PieceSource; message: string; points: number[] }[] = [];
  const ignored = new Map<string, number>();
  const ignore = (kind: string) => ignored.set(kind, (ignored.get(kind) ?? 0) + 1);

  // Units.
  const rawUnits = scan.header.get('$INSUNITS');
  const code = rawUnits === undefined ? NaN : Number(rawUnits);
  const unitsFromFile = Number.isInteger(code) ? (INSUNITS[code] ?? null) : null;
  if (Number.isInteger(code) && code !== 0 && !unitsFromFile) {
    warnings.push(`The file's units ($INSUNITS = ${code}${INSUNITS_NAMES[code] ? `, ${INSUNITS_NAMES[code]}` : ''}) are not mm, cm, m, in or ft; give the units to use.`);
  }
  const sourceUnits = unitsFromFile ?? opts.units ?? null;
  let k = 1;
  let units = sourceUnits;
  if (opts.targetUnits && sourceUnits) {
    k = UNIT_IN_METRES[sourceUnits] / UNIT_IN_METRES[opts.targetUnits];
    units = opts.targetUnits;
  }

  // Entities -> pieces (block references expanded).
  const pieces: Piece[] = [];
  const ctx: Collect = { scan, problems, ignore, pieces, stack: [], budget: MAX_ENTITIES, wide: [] };
  for (const ent of scan.entities) collect(ent, ctx, IDENTITY, null);
  if (ctx.budget < 0) warnings.push(`The drawing expands to more than ${MAX_ENTITIES} entities through its block references; the rest were left out.`);
  const hiddenUsed = [...ignored.keys()].filter((key) => key.endsWith(' on a hidden layer'));
  if (hiddenUsed.length > 0) warnings.push('Entities on layers that are off or frozen were left out, as the CAD program hides them.');
  if (ctx.wide.length > 0) {
    const list = ctx.wide.slice(0, 5).join(', ') + (ctx.wide.length > 5 ? ', …' : '');
    warnings.push(`${ctx.wide.length} polyline${ctx.wide.length > 1 ? 's are' : ' is'} drawn with a width (handle ${list}); only the centre line was imported, not the band the width draws.`);
  }

  // Scale into the result's units, then pick the tolerance.
  if (k !== 1) for (const p of pieces) scalePiece(p, k);
  for (const pr of problems) for (let i = 0; i < pr.points.length; i++) pr.points[i] *= k;
  let extent = 0;
  {
    let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
    for (const p of pieces) {
      for (let i = 0; i < p.xy.length; i += 2) {
        xmin = Math.min(xmin, p.xy[i]);
        xmax = Math.max(xmax, p.xy[i]);
        ymin = Math.min(ymin, p.xy[i + 1]);
        ymax = Math.max(ymax, p.xy[i + 1]);
      }
      if (p.circle) extent = Math.max(extent, 2 * p.circle.r);
    }
    if (xmin <= xmax) extent = Math.max(extent, xmax - xmin, ymax - ymin);
  }
  const tol =
    opts.tol !== undefined && Number.isFinite(opts.tol) && opts.tol > 0 ? opts.tol * k : extent > 0 ? DEFAULT_RELATIVE_TOL * extent : 1e-9;

  // Pieces -> loops.
  const joined = joinPieces(pieces, tol);
  for (const u of joined.unjoined) problems.push({ source: u.piece.source, message: u.message, points: piecePoints(u.piece, tol) });

  const contours: Contour[] = [];
  const areas: number[] = [];
  const kept: JoinedLoop[] = [];
  // Loops seen so far, by the grid cell of their bounding box's lower-left corner, to find repeats.
  const seen = new Map<string, number[]>();
  const cell = 8 * tol;
  for (const loop of joined.loops) {
    let c = contourFrom(loop.xy, loop.bulge);
    const n = c.xy.length >> 1;
    const a = n >= 2 ? contourArea(c) : 0;
    if (!(Math.abs(a) > 1e-12 * extent * extent)) {
      for (const s of loop.sources) problems.push({ source: s, message: 'is part of a closed outline that encloses no area, so it was left out', points: loop.xy.slice() });
      continue;
    }
    if (a < 0) c = reverseContour(c);
    // A loop that repeats an earlier one (same area and vertex box) is left out.
    const box = vertexBox(c);
    const ci = Math.floor(box[0] / cell), cj = Math.floor(box[2] / cell);
    let dup = -1;
    for (let di = -1; di <= 1 && dup < 0; di++) {
      for (let dj = -1; dj <= 1 && dup < 0; dj++) {
        for (const k of seen.get(`${ci + di},${cj + dj}`) ?? []) {
          if (Math.abs(areas[k] - Math.abs(a)) <= 1e-9 * Math.abs(a) && vertexBox(contours[k]).every((v, i) => Math.abs(v - box[i]) <= tol)) {
            dup = k;
            break;
          }
        }
      }
    }
    if (dup >= 0) {
      for (const s of loop.sources) {
        problems.push({ source: s, message: `repeats the outline of ${describeSource(kept[dup].sources[0])} and was left out`, points: loop.xy.slice() });
      }
      continue;
    }
    const key = `${ci},${cj}`;
    const list = seen.get(key);
    if (list) list.push(contours.length);
    else seen.set(key, [contours.length]);
    contours.push(c);
    areas.push(Math.abs(a));
    kept.push(loop);
  }

  const nesting = nestLoops(contours, areas, tol);
  for (const [i, j] of nesting.crossing) {
    warnings.push(`The outline of ${describeSource(kept[i].sources[0])} crosses the outline of ${describeSource(kept[j].sources[0])}; check the drawing.`);
  }

  // Shapes, outermost first so that the document's sequential operations rebuild the nesting.
  const prefix = opts.idPrefix ?? 'dxf';
  const order = contours.map((_, i) => i).sort((p, q) => nesting.depth[p] - nesting.depth[q] || p - q);
  const shapes: Shape[] = [];
  const region: Contour[] = [];
  order.forEach((i, n) => {
    const hole = nesting.depth[i] % 2 === 1;
    const src = kept[i].sources[0];
    const name = `${hole ? 'Hole' : 'Outline'} ${n + 1} (layer ${src.layer})`;
    shapes.push(loopShape(`${prefix}-${n + 1}`, name, hole, contours[i], kept[i]));
    region.push(hole ? reverseContour(contours[i]) : contours[i]);
  });

  return {
    ok: true,
    units,
    unitsFromFile,
    shapes,
    region,
    problems: problems.map((p) => ({ handle: p.source.handle, layer: p.source.layer, message: `${describeSource(p.source)} ${p.message}`, points: pairs(p.points) })),
    warnings,
    ignored: [...ignored.entries()].map(([type, count]) => ({ type, count })),
    tol,
  };
}

/** A similarity map p -> (a·x + b·y + e, c·x + d·y + f) with uniform scale |s|. */
interface Xform {
  a: number;
  b: number;
  c: number;
  d: number;
  e: number;
  f: number;
}
const IDENTITY: Xform = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

/** outer ∘ inner: apply inner first. */
function compose(o: Xform, i: Xform): Xform {
  return {
    a: o.a * i.a + o.b * i.c,
    b: o.a * i.b + o.b * i.d,
    c: o.c * i.a + o.d * i.c,
    d: o.c * i.b + o.d * i.d,
    e: o.a * i.e + o.b * i.f + o.e,
    f: o.c * i.e + o.d * i.f + o.f,
  };
}

function transformPiece(p: Piece, t: Xform): Piece {
  if (t === IDENTITY) return p;
  const xy = p.xy.slice();
  for (let i = 0; i < xy.length; i += 2) {
    const x = xy[i], y = xy[i + 1];
    xy[i] = t.a * x + t.b * y + t.e;
    xy[i + 1] = t.c * x + t.d * y + t.f;
  }
  const det = t.a * t.d - t.b * t.c;
  const bulge = det < 0 ? p.bulge.map((v) => -v) : p.bulge.slice();
  const out: Piece = { ...p, xy, bulge };
  if (p.circle) {
    const { cx, cy, r } = p.circle;
    out.circle = { cx: t.a * cx + t.b * cy + t.e, cy: t.c * cx + t.d * cy + t.f, r: r * Math.sqrt(Math.abs(det)) };
  }
  return out;
}

interface Collect {
  scan: Extract<ReturnType<typeof scanDxf>, { ok: true }>;
  problems: { source: PieceSource; message: string; points: number[] }[];
  ignore: (kind: string) => void;
  pieces: Piece[];
  /** Names of the blocks being expanded (to refuse a block that contains itself). */
  stack: string[];
  /** Entities still allowed to be read (guards against block references that multiply without end). */
  budget: number;
  /** Handles of polylines drawn with a width (only their centre line is imported). */
  wide: string[];
}

/** Most entities read, counting each entity once per block reference that places it. */
export const MAX_ENTITIES = 200_000;

/** Largest nesting of block references that is expanded. */
const MAX_BLOCK_DEPTH = 16;

function transformPoints(xy: number[], t: Xform): number[] {
  const out = xy.slice();
  for (let i = 0; i + 1 < out.length; i += 2) {
    out[i] = t.a * xy[i] + t.b * xy[i + 1] + t.e;
    out[i + 1] = t.c * xy[i] + t.d * xy[i + 1] + t.f;
  }
  return out;
}

/**
 * One entity into pieces (in world coordinates through `t`), or into a problem or an ignored
 * count. `inherit` is the layer of the block reference when expanding a block: entities on
 * layer 0 inside a block take the layer of the reference (DXF reference, "BLOCK" notes).
 */
function collect(ent: ScannedEntity, ctx: Collect, t: Xform, inherit: { layer: string; block: string } | null): void {
  const layer = inherit && ent.layer === '0' ? inherit.layer : ent.layer;
  const source: PieceSource = { type: ent.type, handle: ent.handle ?? '', layer, line: ent.line, block: inherit?.block };
  if (--ctx.budget < 0) return;
  const report = (message: string, points: number[] = []): void => {
    ctx.problems.push({ source, message, points: transformPoints(points, t) });
  };
  if (ent.paperSpace) return ctx.ignore(`${ent.type} in paper space`);
  if (ctx.scan.hiddenLayers.has(layer)) return ctx.ignore(`${ent.type} on a hidden layer`);
  if (ent.text === null) {
    if (ANNOTATION.has(ent.type)) return ctx.ignore(ent.type);
    return report(`${ent.type} entities are not supported; draw the outline with lines, arcs, circles or polylines`);
  }
  if (ent.damage) return report(`could not be read: ${ent.damage}`);
  const parsed = parseOnce(ent);
  if (typeof parsed === 'string') return report(parsed);
  if (ent.type === 'LWPOLYLINE' && (parsed.vertices?.length ?? 0) !== ent.vertexGroups) {
    return report(`could not be read: it has ${ent.vertexGroups} vertices but its vertex count (group 90) says otherwise`, entityPoints(parsed));
  }
  if (ent.type === 'INSERT') return expandInsert(parsed, ent, ctx, t, source, report);
  if ((ent.type === 'LWPOLYLINE' || ent.type === 'POLYLINE') && hasWidth(parsed)) ctx.wide.push(ent.handle ?? '?');
  try {
    const made = entityPieces(parsed, ent, source);
    if (made === 'ignore') ctx.ignore(ent.type);
    else for (const p of made) ctx.pieces.push(transformPiece(p, t));
  } catch (e) {
    if (!(e instanceof EntityProblem)) throw e;
    report(e.message, entityPoints(parsed));
  }
}

/** True when a polyline has a constant width or any vertex with a start or end width. */
function hasWidth(e: ParsedEntity): boolean {
  const w = (e as { width?: number }).width;
  if (typeof w === 'number' && w > 0) return true;
  const vs = (e as { vertices?: { startWidth?: number; endWidth?: number }[] }).vertices ?? [];
  return vs.some((v) => (v.startWidth ?? 0) > 0 || (v.endWidth ?? 0) > 0);
}

/** Parsed entities, so an entity placed by many block references is parsed once. */
const PARSED = new WeakMap<ScannedEntity, ParsedEntity | string>();

/** dxf-parser's reading of one entity, or the message saying why it could not be read. */
function parseOnce(ent: ScannedEntity): ParsedEntity | string {
  const hit = PARSED.get(ent);
  if (hit !== undefined) return hit;
  let out: ParsedEntity | string;
  try {
    const dxf = new DxfParser().parse(ent.text!) as unknown as { entities?: ParsedEntity[] } | null;
    out = dxf?.entities?.[0] ?? 'could not be read';
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    out = `could not be read: ${/n must be greater than 0/.test(why) ? 'it has no vertices (group 90 is missing or 0)' : why}`;
  }
  PARSED.set(ent, out);
  return out;
}

/** A block reference: its block's entities placed by position, rotation and a uniform scale. */
function expandInsert(e: ParsedEntity, ent: ScannedEntity, ctx: Collect, t: Xform, source: PieceSource, report: (m: string, pts?: number[]) => void): void {
  const ins = e as ParsedEntity & { name?: string; xScale?: number; yScale?: number; rotation?: number; columnCount?: number; rowCount?: number };
  const name = ins.name ?? '';
  const block = ctx.scan.blocks.get(name);
  const at = ins.position && finite(ins.position.x, ins.position.y) ? [ins.position.x, ins.position.y] : [];
  if (!block) return report(`refers to a block "${name}" that the file does not define`, at);
  if (ctx.stack.includes(name) || ctx.stack.length >= MAX_BLOCK_DEPTH) return report(`refers to block "${name}", which contains itself or is nested too deeply`, at);
  if ((ins.columnCount ?? 1) > 1 || (ins.rowCount ?? 1) > 1) return report('is an arrayed block reference (MINSERT), which is not expanded; explode it in the CAD program', at);
  const sx = ins.xScale ?? 1, sy = ins.yScale ?? 1, rot = ((ins.rotation ?? 0) * Math.PI) / 180;
  if (!finite(sx, sy, rot) || sx === 0 || sy === 0 || at.length === 0) return report('has an invalid position, scale or rotation', at);
  if (Math.abs(Math.abs(sx) - Math.abs(sy)) > 1e-9 * Math.max(Math.abs(sx), Math.abs(sy))) {
    return report(`scales block "${name}" unequally in x and y (${sx}, ${sy}), which would turn its arcs into ellipses; explode it in the CAD program`, at);
  }
  let m: 1 | -1;
  try {
    m = ocsMirror(ent);
  } catch (err) {
    return report((err as Error).message, at);
  }
  // World = OCS mirror ∘ translate(position) ∘ rotate ∘ scale ∘ translate(−base).
  const cs = Math.cos(rot), sn = Math.sin(rot);
  const [bx, by] = block.base;
  const local: Xform = { a: cs * sx, b: -sn * sy, c: sn * sx, d: cs * sy, e: at[0], f: at[1] };
  const placed = compose(local, { a: 1, b: 0, c: 0, d: 1, e: -bx, f: -by });
  const world = compose(t, compose({ a: m, b: 0, c: 0, d: 1, e: 0, f: 0 }, placed));
  ctx.stack.push(name);
  for (const child of block.entities) collect(child, ctx, world, { layer: source.layer, block: name });
  ctx.stack.pop();
}

function pairs(xy: number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < xy.length; i += 2) out.push([xy[i], xy[i + 1]]);
  return out;
}

/** [xmin, xmax, ymin, ymax] of a contour's vertices. */
function vertexBox(c: Contour): [number, number, number, number] {
  let x0 = Infinity, x1 = -Infinity, y0 = Infinity, y1 = -Infinity;
  for (let i = 0; i < c.xy.length; i += 2) {
    const x = c.xy[i], y = c.xy[i + 1];
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  return [x0, x1, y0, y1];
}

function scalePiece(p: Piece, k: number): void {
  for (let i = 0; i < p.xy.length; i++) p.xy[i] *= k;
  if (p.circle) p.circle = { cx: p.circle.cx * k, cy: p.circle.cy * k, r: p.circle.r * k };
}

/** Points along an open or closed piece (arcs sampled), for highlighting only. */
function piecePoints(p: Piece, tol: number): number[] {
  const n = p.xy.length >> 1;
  const out: number[] = [];
  const segs = p.closed ? n : n - 1;
  for (let i = 0; i < segs; i++) {
    const j = (i + 1) % n;
    const ax = p.xy[2 * i], ay = p.xy[2 * i + 1], bx = p.xy[2 * j], by = p.xy[2 * j + 1];
    out.push(ax, ay);
    const b = p.bulge[i];
    if (b !== 0) {
      const steps = 8;
      const phi = 4 * Math.atan(b);
      // Points on the arc by its centre (drawing only).
      const L = Math.hypot(bx - ax, by - ay);
      if (L > tol) {
        const r = L / (2 * Math.sin(Math.abs(phi) / 2));
        const s = phi > 0 ? 1 : -1;
        const ux = (s * (by - ay)) / L, uy = (-s * (bx - ax)) / L;
        const d = r * Math.cos(Math.abs(phi) / 2);
        const cx = (ax + bx) / 2 - ux * d, cy = (ay + by) / 2 - uy * d;
        const t0 = Math.atan2(ay - cy, ax - cx);
        for (let q = 1; q < steps; q++) out.push(cx + r * Math.cos(t0 + (phi * q) / steps), cy + r * Math.sin(t0 + (phi * q) / steps));
      }
    }
  }
  if (!p.closed) out.push(p.xy[2 * n - 2], p.xy[2 * n - 1]);
  else if (n > 0) out.push(p.xy[0], p.xy[1]);
  return out;
}

/** Whatever points an entity that could not be used has, for highlighting. */
function entityPoints(e: ParsedEntity): number[] {
  const out: number[] = [];
  const add = (p: XY | undefined) => {
    if (p && finite(p.x, p.y)) out.push(p.x, p.y);
  };
  if (e.vertices) e.vertices.forEach(add);
  if (e.fitPoints && e.fitPoints.length > 0) e.fitPoints.forEach(add);
  else if (e.controlPoints) e.controlPoints.forEach(add);
  if (e.type === 'ELLIPSE' && e.center && e.majorAxisEndPoint && finite(e.axisRatio)) {
    const { x: cx, y: cy } = e.center, { x: mx, y: my } = e.majorAxisEndPoint;
    const ratio = e.axisRatio as number;
    for (let q = 0; q <= 32; q++) {
      const t = (2 * Math.PI * q) / 32;
      out.push(cx + mx * Math.cos(t) - my * ratio * Math.sin(t), cy + my * Math.cos(t) + mx * ratio * Math.sin(t));
    }
  } else if (e.center && finite(e.radius)) {
    add(e.center);
  }
  add(e.position);
  return out;
}

/** The plane mapping of an OCS entity: +1 keeps x, −1 mirrors it (extrusion (0, 0, −1)). */
function ocsMirror(ent: ScannedEntity): 1 | -1 {
  const [ex, ey, ez] = ent.extrusion;
  const len = Math.hypot(ex, ey, ez);
  if (len > 0 && Math.hypot(ex, ey) <= 1e-9 * len) return ez > 0 ? 1 : -1;
  throw new EntityProblem(`lies outside the XY plane (extrusion direction ${ex}, ${ey}, ${ez}), so it cannot be part of a 2D section`);
}

function entityPieces(e: ParsedEntity, ent: ScannedEntity, source: PieceSource): Piece[] | 'ignore' {
  switch (ent.type) {
    case 'LINE': {
      const v = e.vertices ?? [];
      if (v.length < 2 || !finite(v[0].x, v[0].y, v[1].x, v[1].y)) throw new EntityProblem('has missing or invalid end points');
      if (v[0].x === v[1].x && v[0].y === v[1].y) return [];
      return [{ xy: [v[0].x, v[0].y, v[1].x, v[1].y], bulge: [0], closed: false, source }];
    }
    case 'ARC': {
      const m = ocsMirror(ent);
      if (!e.center || !finite(e.center.x, e.center.y, e.radius, e.startAngle, e.endAngle) || !((e.radius as number) > 0)) {
        throw new EntityProblem('has a missing or invalid centre, radius or angle');
      }
      const TWO_PI = 2 * Math.PI;
      let sweep = ((((e.endAngle as number) - (e.startAngle as number)) % TWO_PI) + TWO_PI) % TWO_PI;
      if (sweep === 0) throw new EntityProblem('has equal start and end angles');
      if (sweep > TWO_PI - 1e-12) sweep = TWO_PI;
      return [arcPiece(e.center.x, e.center.y, e.radius as number, e.startAngle as number, sweep, m, source)];
    }
    case 'CIRCLE': {
      const m = ocsMirror(ent);
      if (!e.center || !finite(e.center.x, e.center.y, e.radius) || !((e.radius as number) > 0)) {
        throw new EntityProblem('has a missing or invalid centre or radius');
      }
      const cx = m * e.center.x, cy = e.center.y, r = e.radius as number;
      const c = circleContour(cx, cy, r);
      return [{ xy: Array.from(c.xy), bulge: Array.from(c.bulge!), closed: true, source, circle: { cx, cy, r } }];
    }
    case 'LWPOLYLINE':
      return polylinePiece(e.vertices ?? [], e.shape === true, ocsMirror(ent), source);
    case 'POLYLINE': {
      if (e.is3dPolygonMesh || e.isPolyfaceMesh) throw new EntityProblem('is a 3D mesh, not an outline');
      const verts = (e.vertices ?? []).filter((v) => !v.splineControlPoint);
      if (e.is3dPolyline) {
        const zs = (e.vertices ?? []).map((v) => (v as { z?: number }).z ?? 0);
        if (zs.some((z) => Math.abs(z - zs[0]) > 1e-9 * (1 + Math.abs(zs[0])))) throw new EntityProblem('is a 3D polyline that does not lie in one plane');
        return polylinePiece(verts.map((v) => ({ x: v.x, y: v.y })), e.shape === true, 1, source);
      }
      return polylinePiece(verts, e.shape === true, ocsMirror(ent), source);
    }
    case 'ELLIPSE':
      throw new EntityProblem('is an ellipse; only circular arcs can be imported exactly (convert it to arcs or a polyline)');
    case 'SPLINE':
      throw new EntityProblem('is a spline; only lines and circular arcs can be imported exactly (convert it to a polyline with arcs)');
    default:
      if (ANNOTATION.has(ent.type)) return 'ignore';
      throw new EntityProblem(`${ent.type} entities are not supported`);
  }
}

/** An arc by its centre, split into pieces of at most 180° (each |bulge| ≤ 1), mirrored if m = −1. */
function arcPiece(cx: number, cy: number, r: number, t0: number, sweep: number, m: 1 | -1, source: PieceSource): Piece {
  const parts = Math.max(1, Math.ceil(sweep / Math.PI - 1e-12));
  const xy: number[] = [];
  const bulge: number[] = [];
  const b = Math.tan(sweep / parts / 4);
  for (let q = 0; q <= parts; q++) {
    const t = t0 + (sweep * q) / parts;
    xy.push(m * (cx + r * Math.cos(t)), cy + r * Math.sin(t));
    if (q < parts) bulge.push(m * b);
  }
  if (sweep === 2 * Math.PI) {
    // A whole circle drawn as an ARC: close it instead of leaving two coincident ends.
    xy.length -= 2;
    return { xy, bulge, closed: true, source, circle: { cx: m * cx, cy, r } };
  }
  return { xy, bulge, closed: false, source };
}

/** Vertices with bulges -> a piece (none for an open run of zero length): repeated vertices dropped, arcs over 180° split. */
function polylinePiece(vertices: ParsedVertex[], closed: boolean, m: 1 | -1, source: PieceSource): Piece[] {
  const vs = vertices.map((v) => ({ x: v.x, y: v.y, b: v.bulge ?? 0 }));
  if (vs.some((v) => !finite(v.x, v.y, v.b))) throw new EntityProblem('has a vertex with missing or invalid coordinates');
  // A vertex equal to the next one starts a segment of zero length: drop it (the next keeps its bulge).
  const kept: { x: number; y: number; b: number }[] = [];
  for (let i = 0; i < vs.length; i++) {
    const next = i + 1 < vs.length ? vs[i + 1] : closed ? kept[0] ?? vs[0] : null;
    if (next && next !== vs[i] && next.x === vs[i].x && next.y === vs[i].y) continue;
    kept.push(vs[i]);
  }
  if (closed && kept.length < 2) throw new EntityProblem('is a closed polyline with fewer than two distinct vertices');
  if (!closed && kept.length < 2) return [];
  const xy: number[] = [m * kept[0].x, kept[0].y];
  const bulge: number[] = [];
  const segs = closed ? kept.length : kept.length - 1;
  for (let i = 0; i < segs; i++) {
    const a = kept[i], b = kept[(i + 1) % kept.length];
    const ax = m * a.x, bx = m * b.x;
    if (a.b === 0) bulge.push(0);
    else pushArc(xy, bulge, ax, a.y, bx, b.y, m * 4 * Math.atan(a.b));
    if (i + 1 < kept.length) xy.push(bx, b.y);
  }
  return [{ xy, bulge, closed, source }];
}

/** One loop as a document shape: a circle shape for a whole circle, otherwise a closed path. */
function loopShape(id: string, name: string, hole: boolean, c: Contour, loop: JoinedLoop): Shape {
  const op = hole ? ({ op: 'subtract' } as const) : {};
  if (loop.circle) {
    const s: CircleShape = { id, name, type: 'circle', center: [loop.circle.cx, loop.circle.cy], radius: loop.circle.r, ...op };
    return s;
  }
  const n = c.xy.length >> 1;
  const pt = (i: number): Point => [c.xy[2 * (i % n)], c.xy[2 * (i % n) + 1]];
  const segments: PathSegment[] = [];
  for (let i = 0; i < n; i++) {
    const a = pt(i), b = pt(i + 1);
    const bu = c.bulge ? c.bulge[i] : 0;
    if (bu === 0) segments.push({ to: b });
    else {
      // The arc's midpoint: chord midpoint moved by the sagitta (bulge · chord / 2) to the right of a->b.
      const via: Point = [(a[0] + b[0]) / 2 + (bu * (b[1] - a[1])) / 2, (a[1] + b[1]) / 2 - (bu * (b[0] - a[0])) / 2];
      segments.push({ to: b, via });
    }
  }
  const s: PathShape = { id, name, type: 'path', start: pt(0), segments, ...op };
  return s;
}
