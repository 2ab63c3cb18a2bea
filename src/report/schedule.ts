/**
 * The report's geometry schedule: everything needed to rebuild the section by hand, shape by
 * shape, in the order they are applied. A polygon lists its vertices; a path its start and each
 * segment's end, and for an arc also its through-point (as entered), centre, radius and signed
 * sweep; a circle its centre and diameter; a profile every dimension, its local frame and its
 * placement. Each kind builds its own part (`ShapeKind.schedule` in src/shapes/); this module
 * names the shapes and renders the tables.
 *
 * The schedule is built as data first (`shapeSchedule`), then rendered as compact HTML tables.
 * A shape with more than `inlineRows` vertices or segments gets a summary in the schedule and its
 * full listing in an appendix at the end of the report; the summary says where.
 * Numbers: GEOMETRY_SIGFIGS significant figures (formatQuantity), so the rebuilt area matches
 * the reported one to the DISPLAY_SIGFIGS shown; angles in degrees, positive counter-clockwise.
 */
import type { Shape, Units } from '../document/types';
import { formatNumber, formatQuantity, GEOMETRY_SIGFIGS } from '../properties/catalog';
import { PLACEMENT_RULE } from '../shapes/profile';
import { kindOf } from '../shapes/registry';
import { shapeDisplayName } from '../shapes/ops';
import { paramsText, type KindSchedule, type ScheduleFormat, type ScheduleTable } from '../shapes/schedule';
import { escapeHtml } from './escape';

export type { ScheduleTable } from '../shapes/schedule';
export { PLACEMENT_RULE, paramsText };

export interface ShapeSchedule extends KindSchedule {
  index: number;
  name: string;
  kind: string;
  operation: string;
}

const OP_TEXT: Record<string, string> = { add: 'add', subtract: 'subtract', intersect: 'intersect' };

/** Lengths to GEOMETRY_SIGFIGS (zero to round-off of the section's size), angles in degrees. */
export function scheduleFormat(size: number): ScheduleFormat {
  return { len: (v) => formatQuantity(v, 1, size, GEOMETRY_SIGFIGS), deg: (v) => formatNumber(v, GEOMETRY_SIGFIGS, 360) };
}

/** The schedule of one shape (index = its place in the document's list): its kind's own, named. */
export function shapeSchedule(shape: Shape, index: number, size: number): ShapeSchedule {
  const kind = kindOf(shape);
  const name = shapeDisplayName(shape, index);
  const own = kind.schedule(shape, scheduleFormat(size));
  const table = own.table ? { ...own.table, title: `${name}: ${own.table.title}` } : null;
  // A line element takes no operation: it stays out of the area booleans.
  return { index, name, kind: kind.label, operation: kind.line ? 'none (line)' : OP_TEXT[shape.op ?? 'add'], ...own, table };
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
