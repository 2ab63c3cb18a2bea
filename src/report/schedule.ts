/**
 * The report's geometry schedule: everything needed to rebuild the section by hand, shape by
 * shape, in the order they are applied. A polygon lists its vertices; a path its start and each
 * segment's end, and for an arc also its through-point (as entered), centre, radius and signed
 * sweep; a circle its centre and diameter; a profile every dimension, its local frame and its
 * placement. Kinds this module does not know (newer document versions) list their scalar fields
 * and any point lists they carry, so nothing is left out silently.
 *
 * The schedule is built as data first (`shapeSchedule`), then rendered as compact HTML tables.
 * A shape with more than `inlineRows` vertices or segments gets a summary in the schedule and its
 * full listing in an appendix at the end of the report; the summary says where.
 * Numbers: GEOMETRY_SIGFIGS significant figures (formatQuantity), so the rebuilt area matches
 * the reported one to the DISPLAY_SIGFIGS shown; angles in degrees, positive counter-clockwise.
 */
import type { Shape, Units } from '../document/types';
import { PROFILE_FIELDS, type ProfileType } from '../document/profiles';
import { SHAPE_KIND_LABEL, shapeDisplayName } from '../document/labels';
import { arcFromChord, sweepThrough } from '../geometry/contour';
import { formatNumber, formatQuantity, GEOMETRY_SIGFIGS } from '../properties/catalog';
import { escapeHtml } from './escape';

/** One listing: a header and rows of text cells. */
export interface ScheduleTable {
  title: string;
  head: string[];
  rows: string[][];
  /** Rows may be laid out in this many side-by-side groups (short columns such as # x y). */
  groupable: boolean;
}

export interface ShapeSchedule {
  index: number;
  name: string;
  kind: string;
  operation: string;
  /** Parameters and placement as label–value pairs, lengths in the document's units. */
  params: [string, string][];
  /** Vertices or segments, when the shape has them. */
  table: ScheduleTable | null;
  /** For a profile: how its local frame is set (the placement rule is PLACEMENT_RULE). */
  frame?: string | null;
  /** Extent of the listed points (vertices, ends and through-points), for a long listing's summary. */
  extent: { xmin: number; xmax: number; ymin: number; ymax: number } | null;
}

function pointsExtent(points: readonly unknown[]): ShapeSchedule['extent'] {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (const p of points) {
    if (!isPoint(p) || !Number.isFinite(p[0]) || !Number.isFinite(p[1])) continue;
    xmin = Math.min(xmin, p[0]);
    xmax = Math.max(xmax, p[0]);
    ymin = Math.min(ymin, p[1]);
    ymax = Math.max(ymax, p[1]);
  }
  return xmin <= xmax ? { xmin, xmax, ymin, ymax } : null;
}

/** Every point a start-and-segments listing names. */
function segmentPoints(start: unknown, segments: readonly SegmentLike[]): unknown[] {
  return [start, ...segments.flatMap((g) => (g.via === undefined ? [g.to] : [g.via, g.to]))];
}

const OP_TEXT: Record<string, string> = { add: 'add', subtract: 'subtract', intersect: 'intersect' };

/** How each profile's local frame is set, as the document format defines it (types.ts). */
const PROFILE_FRAME: Record<string, string> = {
  rectangle: 'local origin at the bottom-left corner; the corner radius on all four corners',
  'i-beam': 'doubly symmetric I; local origin at the bottom-left of its bounding box',
  channel: 'web on the left, flanges to the right; local origin at the bottom-left',
  angle: 'vertical leg on the left, horizontal leg at the bottom; local origin at the heel',
  tee: 'flange on top, stem down; local origin at the bottom-left of its bounding box',
  'rect-tube': 'local origin at the bottom-left; inside corner radius = max(outside radius − wall, 0)',
  'round-tube': 'local origin at the centre',
  'bent-plate': '90° bend: horizontal leg along the bottom, vertical leg on the left, legs to the outside faces; local origin where the outside faces meet',
};

/** How every profile is placed from its local frame. */
export const PLACEMENT_RULE = 'A profile is drawn in its local frame, then mirrored about the local y axis (if so), turned counter-clockwise about the local origin, then moved so that its local origin is at the point given.';

type Fmt = (v: unknown) => string;

function numberFormatter(size: number): { len: Fmt; deg: Fmt } {
  const len: Fmt = (v) => (typeof v === 'number' ? formatQuantity(v, 1, size, GEOMETRY_SIGFIGS) : '?');
  const deg: Fmt = (v) => (typeof v === 'number' ? formatNumber(v, GEOMETRY_SIGFIGS, 360) : '?');
  return { len, deg };
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

const isPoint = (p: unknown): p is [number, number] => Array.isArray(p) && p.length === 2 && typeof p[0] === 'number' && typeof p[1] === 'number';

function pointText(p: unknown, len: Fmt): string {
  return isPoint(p) ? `(${len(p[0])}, ${len(p[1])})` : '?';
}

interface SegmentLike {
  to?: unknown;
  via?: unknown;
}

/** Start and segments (a path, or any kind built the same way): one row per segment. */
function segmentTable(start: unknown, segments: readonly SegmentLike[], len: Fmt, deg: Fmt, title: string): ScheduleTable {
  const rows: string[][] = [['0', 'start', len(isPoint(start) ? start[0] : NaN), len(isPoint(start) ? start[1] : NaN), '', '', '', '', '', '']];
  let cur = isPoint(start) ? start : null;
  segments.forEach((g, k) => {
    const to = isPoint(g.to) ? g.to : null;
    const end = to ? [len(to[0]), len(to[1])] : ['?', '?'];
    if (g.via === undefined) rows.push([String(k + 1), 'line', ...end, '', '', '', '', '', '']);
    else {
      const via = isPoint(g.via) ? g.via : null;
      let centre = ['—', '—'], radius = '—', sweep = 'collinear: no arc';
      if (cur && via && to) {
        const phi = sweepThrough(cur[0], cur[1], via[0], via[1], to[0], to[1]);
        if (Number.isFinite(phi)) {
          const a = arcFromChord(cur[0], cur[1], to[0], to[1], phi);
          centre = [len(a.cx), len(a.cy)];
          radius = len(a.r);
          sweep = deg((phi * 180) / Math.PI);
        }
      }
      rows.push([String(k + 1), 'arc', ...end, via ? len(via[0]) : '?', via ? len(via[1]) : '?', centre[0], centre[1], radius, sweep]);
    }
    cur = to;
  });
  return { title, head: ['#', 'Segment', 'End x', 'End y', 'Through x', 'Through y', 'Centre x', 'Centre y', 'Radius', 'Sweep °'], rows, groupable: false };
}

function vertexTable(points: readonly unknown[], len: Fmt, title: string): ScheduleTable {
  return {
    title,
    head: ['#', 'x', 'y'],
    rows: points.map((p, i) => [String(i + 1), len(isPoint(p) ? p[0] : NaN), len(isPoint(p) ? p[1] : NaN)]),
    groupable: true,
  };
}

/** Label for a field name the report does not know: "outerDiameter" → "outer diameter". */
function fieldLabel(key: string): string {
  const s = key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return s.charAt(0).toUpperCase() + s.slice(1);
}

const IDENTITY_KEYS = new Set(['id', 'type', 'name', 'op', 'start', 'segments', 'points']);

/** The schedule of one shape (index = its place in the document's list). */
export function shapeSchedule(shape: Shape, index: number, size: number): ShapeSchedule {
  const { len, deg } = numberFormatter(size);
  const rec = shape as unknown as Record<string, unknown>;
  const type = String(rec.type);
  const name = shapeDisplayName(shape, index);
  const base = {
    index,
    name,
    kind: (SHAPE_KIND_LABEL as Record<string, string | undefined>)[type] ?? type,
    operation: OP_TEXT[String(rec.op ?? 'add')] ?? String(rec.op),
  };
  switch (shape.type) {
    case 'polygon': {
      const n = shape.points.length;
      return { ...base, params: [['Corners', String(n)]], table: vertexTable(shape.points, len, `${name}: vertices`), extent: pointsExtent(shape.points) };
    }
    case 'circle':
      return {
        ...base,
        params: [
          ['Centre', pointText(shape.center, len)],
          ['Diameter', len(2 * shape.radius)],
        ],
        table: null,
        extent: null,
      };
    case 'path': {
      const arcs = shape.segments.filter((g) => g.via).length;
      return {
        ...base,
        params: [
          ['Start', pointText(shape.start, len)],
          ['Segments', `${shape.segments.length} (${plural(shape.segments.length - arcs, 'line')}, ${plural(arcs, 'arc')})`],
        ],
        table: segmentTable(shape.start, shape.segments, len, deg, `${name}: segments`),
        extent: pointsExtent(segmentPoints(shape.start, shape.segments)),
      };
    }
    default: {
      const fields = (PROFILE_FIELDS as Record<string, readonly { key: string; label: string; optional?: boolean }[] | undefined>)[type as ProfileType];
      if (fields) {
        const params: [string, string][] = fields.map((fl) => [fl.label, rec[fl.key] === undefined ? (fl.optional ? '0 (not set)' : '?') : len(rec[fl.key])]);
        params.push(['Local origin at', pointText(rec.at, len)]);
        params.push(['Turned', `${deg(typeof rec.rotation === 'number' ? rec.rotation : 0)}°`]);
        params.push(['Mirrored', rec.mirror ? 'yes' : 'no']);
        return { ...base, params, table: null, extent: null, frame: PROFILE_FRAME[type] ?? null };
      }
      return { ...base, ...genericSchedule(rec, name, len, deg) };
    }
  }
}

/** A kind this version does not know: every scalar field, every point, and any list of points or segments. */
function genericSchedule(rec: Record<string, unknown>, name: string, len: Fmt, deg: Fmt): Pick<ShapeSchedule, 'params' | 'table' | 'extent'> {
  const params: [string, string][] = [];
  for (const [key, v] of Object.entries(rec)) {
    if (IDENTITY_KEYS.has(key)) continue;
    if (typeof v === 'number') params.push([fieldLabel(key), /rotation|angle/i.test(key) ? `${deg(v)}°` : len(v)]);
    else if (typeof v === 'string' || typeof v === 'boolean') params.push([fieldLabel(key), typeof v === 'boolean' ? (v ? 'yes' : 'no') : v]);
    else if (isPoint(v)) params.push([fieldLabel(key), pointText(v, len)]);
  }
  let table: ScheduleTable | null = null;
  let extent: ShapeSchedule['extent'] = null;
  if (Array.isArray(rec.segments)) {
    const segs = rec.segments as SegmentLike[];
    const arcs = segs.filter((g) => g.via !== undefined).length;
    params.unshift(['Start', pointText(rec.start, len)], ['Segments', `${segs.length} (${plural(segs.length - arcs, 'line')}, ${plural(arcs, 'arc')})`]);
    table = segmentTable(rec.start, segs, len, deg, `${name}: segments`);
    extent = pointsExtent(segmentPoints(rec.start, segs));
  } else if (Array.isArray(rec.points)) {
    params.unshift(['Points', String(rec.points.length)]);
    table = vertexTable(rec.points, len, `${name}: vertices`);
    extent = pointsExtent(rec.points);
  }
  return { params, table, extent };
}

// ---------------------------------------------------------------------------------------------
// HTML

export interface ScheduleHtml {
  /** The tables that go right after the list of shapes. */
  tables: string;
  /** Full listings of long shapes, for the end of the report ('' when there are none). */
  appendix: string;
}

/** One note for the profiles used: how each kind's local frame is set, and the placement rule. */
export function frameNotes(items: readonly ShapeSchedule[]): string[] {
  const seen = new Map<string, string>();
  for (const it of items) if (it.frame && !seen.has(it.kind)) seen.set(it.kind, it.frame);
  if (seen.size === 0) return [];
  return [`Local frames: ${[...seen].map(([kind, frame]) => `${kind}, ${frame}`).join('; ')}. ${PLACEMENT_RULE}`];
}

/** The one-line parameter text of a shape, for its row in the list of shapes. */
export function paramsText(s: ShapeSchedule): string {
  // Counts read number first ("8 segments (6 lines, 2 arcs)"), everything else label first.
  return s.params.map(([k, v]) => (COUNT_LABELS.has(k) ? v.replace(/^(\d+)/, `$1 ${k.toLowerCase()}`) : `${k.toLowerCase()} ${v}`)).join('; ');
}
const COUNT_LABELS = new Set(['Corners', 'Segments', 'Points']);

function tableHtml(t: ScheduleTable, id: string, groupsWanted: number, long: boolean): string {
  const groups = t.groupable ? Math.max(1, Math.min(groupsWanted, Math.ceil(t.rows.length / 4))) : 1;
  const per = Math.ceil(t.rows.length / groups);
  const head = Array.from({ length: groups }, (_, g) => t.head.map((h, c) => `<th${c === 0 && g > 0 ? ' class="group-start"' : ''}>${escapeHtml(h)}</th>`).join('')).join('');
  const body: string[] = [];
  for (let r = 0; r < per; r++) {
    const cells: string[] = [];
    for (let g = 0; g < groups; g++) {
      const row = t.rows[g * per + r];
      t.head.forEach((_, c) => {
        const cls = [c === 0 && g > 0 ? 'group-start' : '', c === 1 && !t.groupable ? '' : 'num'].filter(Boolean).join(' ');
        cells.push(`<td class="${cls}">${row ? escapeHtml(row[c]) : ''}</td>`);
      });
    }
    body.push(`<tr>${cells.join('')}</tr>`);
  }
  return (
    `<table class="schedule${long ? ' long' : ''}" id="${id}" data-rows="${t.rows.length}"><caption>${escapeHtml(t.title)}</caption>` +
    `<thead><tr>${head}</tr></thead><tbody>${body.join('')}</tbody></table>`
  );
}

/**
 * The schedule's tables and appendix. `inlineRows`: listings longer than this go to the appendix
 * (the list of shapes then names the appendix table).
 */
export function renderScheduleTables(items: readonly ShapeSchedule[], units: Units, inlineRows = 40): ScheduleHtml & { where: Map<number, string> } {
  const tables: string[] = [];
  const appendix: string[] = [];
  const where = new Map<number, string>();
  let s = 0, a = 0;
  for (const it of items) {
    if (!it.table) continue;
    const n = it.table.rows.length;
    if (n <= inlineRows) {
      const id = `S${++s}`;
      where.set(it.index, `Table ${id}`);
      tables.push(`<div class="block sched">${tableHtml({ ...it.table, title: `Table ${id} · ${it.table.title}` }, id, 3, false)}</div>`);
    } else {
      const id = `A${++a}`;
      where.set(it.index, `Appendix, Table ${id} (${n} rows)`);
      appendix.push(tableHtml({ ...it.table, title: `Table ${id} · ${it.table.title} (${n} rows, all listed)` }, id, 4, true));
    }
  }
  const appendixHtml =
    appendix.length === 0
      ? ''
      : `<section class="appendix"><h2>Appendix: full geometry listings</h2>` +
        `<p class="small">Coordinates in ${escapeHtml(units)}, angles in degrees (positive counter-clockwise), to ${GEOMETRY_SIGFIGS} significant figures. Every row is listed.</p>` +
        appendix.join('') +
        `</section>`;
  return { tables: tables.join(''), appendix: appendixHtml, where };
}

/** Summary of a long listing for the list of shapes: the extent of its points. */
export function listingSummary(it: ShapeSchedule, size: number): string {
  const e = it.extent;
  if (!e) return '';
  const len = (v: number) => formatQuantity(v, 1, size, GEOMETRY_SIGFIGS);
  return `points from x = ${len(e.xmin)} to ${len(e.xmax)}, y = ${len(e.ymin)} to ${len(e.ymax)}`;
}
