/**
 * Net-section lines (the document's `netLines`): add one drawn across the section, move its end
 * points, name it, delete it. Each is one undo step. The lines belong to the document because the
 * report prints their net sections (src/document/net-lines.ts); they apply to the baseline and to
 * every proposal alike.
 */
import { validateNetLines, formatIssue, type Issue, type NetLine, type Point, type SectionDocument } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';

/** The lines checked by the engine, or what is wrong with them. */
function checked(lines: NetLine[]): NetLine[] | string {
  const issues: Issue[] = [];
  validateNetLines({ netLines: lines }, issues);
  return issues.length ? issues.map(formatIssue).join('; ') : lines;
}

/** Record a planned list of lines as one undo step (an empty list removes the field). */
function applyPlan(ctx: Pick<CommandContext, 'store'>, plan: NetLine[] | string): string | null {
  if (typeof plan === 'string') return plan;
  const doc = ctx.store.getState().doc;
  if (plan === doc.netLines) return null;
  const next: SectionDocument = { ...doc, netLines: plan };
  if (plan.length === 0) delete next.netLines;
  commit(ctx.store, next);
  return null;
}

const isPoint = (p: unknown): p is Point => Array.isArray(p) && p.length === 2 && p.every((v) => typeof v === 'number' && Number.isFinite(v));

/** The lines with one more ({from, to, name?}), or an error text. */
export function netLinesWithAdded(doc: SectionDocument, arg: unknown): NetLine[] | string {
  const a = arg as { from?: unknown; to?: unknown; name?: unknown } | undefined;
  if (!a || !isPoint(a.from) || !isPoint(a.to)) return 'A net-section line needs two points.';
  const line: NetLine = { from: [a.from[0], a.from[1]], to: [a.to[0], a.to[1]] };
  if (typeof a.name === 'string' && a.name.trim()) line.name = a.name.trim();
  return checked([...(doc.netLines ?? []), line]);
}

/** The lines with the one at `index` changed ({index, from?, to?, name?}); the same list when nothing changes. */
export function netLinesWithChange(doc: SectionDocument, arg: unknown): NetLine[] | string {
  const a = arg as { index?: unknown; from?: unknown; to?: unknown; name?: unknown } | undefined;
  const lines = doc.netLines ?? [];
  if (!a || typeof a.index !== 'number' || !lines[a.index]) return 'There is no such line.';
  const old = lines[a.index];
  const l: NetLine = { ...old };
  if (a.from !== undefined) {
    if (!isPoint(a.from)) return 'The start needs two numbers.';
    l.from = [a.from[0], a.from[1]];
  }
  if (a.to !== undefined) {
    if (!isPoint(a.to)) return 'The end needs two numbers.';
    l.to = [a.to[0], a.to[1]];
  }
  if (typeof a.name === 'string') {
    if (a.name.trim()) l.name = a.name.trim();
    else delete l.name;
  }
  if (l.from[0] === old.from[0] && l.from[1] === old.from[1] && l.to[0] === old.to[0] && l.to[1] === old.to[1] && l.name === old.name) return lines;
  return checked(lines.map((x, k) => (k === a.index ? l : x)));
}

/** Add a line {from, to} (one undo step); returns an error text or null. */
export const addNetLine = (ctx: Pick<CommandContext, 'store'>, arg: unknown) => applyPlan(ctx, netLinesWithAdded(ctx.store.getState().doc, arg));

/** Change the line at `index`: its end points or its name. */
export const setNetLine = (ctx: Pick<CommandContext, 'store'>, arg: unknown) => applyPlan(ctx, netLinesWithChange(ctx.store.getState().doc, arg));

/** Delete the line at `index`. */
export function deleteNetLine(ctx: Pick<CommandContext, 'store'>, index: unknown): void {
  const lines = ctx.store.getState().doc.netLines ?? [];
  if (typeof index !== 'number' || !lines[index]) return;
  applyPlan(ctx, lines.filter((_, k) => k !== index));
}

/** A label for a line: its name, else "Line 1", "Line 2", ... */
export function netLineLabel(line: NetLine, index: number): string {
  return line.name ?? `Line ${index + 1}`;
}
