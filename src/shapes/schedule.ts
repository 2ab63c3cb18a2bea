/**
 * A shape's schedule as data: its parameters as label–value pairs and, when it has them, a table
 * of vertices or segments, enough to rebuild it by hand. Each kind builds its own from these
 * pieces (`ShapeKind.schedule`); the report renders them (src/report/schedule.ts).
 */
import { arcFromChord, sweepThrough } from '../geometry/contour';
import type { Point } from './base';

/** One listing: a header and rows of text cells. */
export interface ScheduleTable {
  title: string;
  head: string[];
  rows: string[][];
  /** Rows may be laid out in this many side-by-side groups (short columns such as # x y). */
  groupable: boolean;
}

export interface Extent {
  xmin: number;
  xmax: number;
  ymin: number;
  ymax: number;
}

/** What a kind says about one shape. */
export interface KindSchedule {
  /** Parameters and placement as label–value pairs, lengths in the document's units. */
  params: [string, string][];
  /** Vertices or segments, when the shape has them. */
  table: ScheduleTable | null;
  /** Extent of the listed points (vertices, ends and through-points), for a long listing's summary. */
  extent: Extent | null;
  /** For a profile: how its local frame is set. */
  frame?: string | null;
}

/** How numbers are written: lengths and angles (degrees). */
export interface ScheduleFormat {
  len(v: number): string;
  deg(v: number): string;
}

export const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;

export function pointText(p: readonly number[], f: ScheduleFormat): string {
  return `(${f.len(p[0])}, ${f.len(p[1])})`;
}

export function pointsExtent(points: readonly (readonly number[])[]): Extent | null {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (const p of points) {
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1])) continue;
    xmin = Math.min(xmin, p[0]);
    xmax = Math.max(xmax, p[0]);
    ymin = Math.min(ymin, p[1]);
    ymax = Math.max(ymax, p[1]);
  }
  return xmin <= xmax ? { xmin, xmax, ymin, ymax } : null;
}

/** Every point a start-and-segments listing names. */
export function segmentPoints(start: Point, segments: readonly { to: Point; via?: Point }[]): Point[] {
  return [start, ...segments.flatMap((g) => (g.via === undefined ? [g.to] : [g.via, g.to]))];
}

/** Start and segments (a path, or any kind built the same way): one row per segment, arcs with centre, radius and sweep. */
export function segmentTable(start: Point, segments: readonly { to: Point; via?: Point }[], f: ScheduleFormat, title: string): ScheduleTable {
  const rows: string[][] = [['0', 'start', f.len(start[0]), f.len(start[1]), '', '', '', '', '', '']];
  let cur = start;
  segments.forEach((g, k) => {
    const end = [f.len(g.to[0]), f.len(g.to[1])];
    if (g.via === undefined) rows.push([String(k + 1), 'line', ...end, '', '', '', '', '', '']);
    else {
      let centre = ['—', '—'], radius = '—', sweep = 'collinear: no arc';
      const phi = sweepThrough(cur[0], cur[1], g.via[0], g.via[1], g.to[0], g.to[1]);
      if (Number.isFinite(phi)) {
        const a = arcFromChord(cur[0], cur[1], g.to[0], g.to[1], phi);
        centre = [f.len(a.cx), f.len(a.cy)];
        radius = f.len(a.r);
        sweep = f.deg((phi * 180) / Math.PI);
      }
      rows.push([String(k + 1), 'arc', ...end, f.len(g.via[0]), f.len(g.via[1]), centre[0], centre[1], radius, sweep]);
    }
    cur = g.to;
  });
  return { title, head: ['#', 'Segment', 'End x', 'End y', 'Through x', 'Through y', 'Centre x', 'Centre y', 'Radius', 'Sweep °'], rows, groupable: false };
}

export function vertexTable(points: readonly Point[], f: ScheduleFormat, title: string): ScheduleTable {
  return { title, head: ['#', 'x', 'y'], rows: points.map((p, i) => [String(i + 1), f.len(p[0]), f.len(p[1])]), groupable: true };
}

/** The one-line text of a schedule's parameters ("8 segments (6 lines, 2 arcs); start (0, 120)"). */
export function paramsText(params: readonly [string, string][]): string {
  // Counts read number first, everything else label first.
  return params.map(([k, v]) => (COUNT_LABELS.has(k) ? v.replace(/^(\d+)/, `$1 ${k.toLowerCase()}`) : `${k.toLowerCase()} ${v}`)).join('; ');
}
const COUNT_LABELS = new Set(['Corners', 'Segments', 'Points']);
