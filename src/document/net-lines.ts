/**
 * Net-section lines kept in the document (format version 2, optional `netLines`): straight lines
 * drawn across the section, for example through a row of holes, whose gross and net lengths the
 * panel, the report and the CLI give (src/netsection/). They are kept in the document, not in the
 * view, because the report prints their results and a checker must be able to redo them:
 *
 *   "netLines": [{ "name": "Row A", "from": [-90, 205], "to": [90, 205] }]
 *
 * The same lines apply to the baseline and to every proposal (a proposal's holes on the line
 * shorten its net length). Lengths are in the document's units.
 */
import { fmtValue, isObj, type Issue } from '../shapes/check';
import type { Point } from '../shapes/base';

export interface NetLine {
  from: Point;
  to: Point;
  /** Optional label ("Row A", "through the bolt line"). */
  name?: string;
}

function pointIssue(v: unknown, path: string): Issue | null {
  if (!Array.isArray(v) || v.length !== 2) return { path, message: `a point must be [x, y], got ${fmtValue(v)}` };
  if (!v.every((c) => typeof c === 'number' && Number.isFinite(c))) return { path, message: `both coordinates must be finite numbers, got ${fmtValue(v)}` };
  return null;
}

/** Validate `netLines` of a document object, every problem with its path. */
export function validateNetLines(doc: Record<string, unknown>, out: Issue[]): void {
  const lines = doc.netLines;
  if (lines === undefined) return;
  if (!Array.isArray(lines)) {
    out.push({ path: 'netLines', message: 'netLines must be a list of lines like {"from": [x, y], "to": [x, y]}' });
    return;
  }
  lines.forEach((l, k) => {
    const p = `netLines[${k}]`;
    if (!isObj(l)) return out.push({ path: p, message: 'a net-section line must be an object {"from": [x, y], "to": [x, y]}' });
    for (const key of Object.keys(l)) if (!['from', 'to', 'name'].includes(key)) out.push({ path: `${p}.${key}`, message: 'unknown field; a net-section line has from, to and an optional name' });
    const a = pointIssue(l.from, `${p}.from`), b = pointIssue(l.to, `${p}.to`);
    if (a) out.push(a);
    if (b) out.push(b);
    if (!a && !b) {
      const [x1, y1] = l.from as number[], [x2, y2] = l.to as number[];
      if (x1 === x2 && y1 === y2) out.push({ path: p, message: 'the line has no length: from and to are the same point' });
    }
    if (l.name !== undefined && typeof l.name !== 'string') out.push({ path: `${p}.name`, message: 'name must be text' });
  });
}

/** The lines with every coordinate multiplied by k (a change of units). */
export function scaleNetLines(lines: readonly NetLine[], k: number): NetLine[] {
  return lines.map((l) => ({ ...l, from: [l.from[0] * k, l.from[1] * k], to: [l.to[0] * k, l.to[1] * k] }));
}
