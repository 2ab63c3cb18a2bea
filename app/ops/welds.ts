/**
 * Document operations on weld loads and line groups, each one undoable step: add a load to a
 * group, change or remove a load, and rename a line element's group (a load that named the old
 * group follows it when no other element keeps that name).
 */
import { DEFAULT_LINE_GROUP, documentLineGroups, groupBoundsAbout, unionBounds, type Bounds, type SectionDocument, type Shape, type ShapeResult, type WeldLoadCase } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';

type Store = CommandContext['store'];

function withLoads(doc: SectionDocument, loads: WeldLoadCase[]): SectionDocument {
  const next = { ...doc };
  if (loads.length) next.weldLoads = loads;
  else delete next.weldLoads;
  return next;
}

/** A new load on `group` acting at `at` (no force yet); returns its index. */
export function addWeldLoad(store: Store, group: string, at: [number, number]): number {
  const doc = store.getState().doc;
  const loads = [...(doc.weldLoads ?? []), { group, at, Fx: 0, Fy: 0 }];
  commit(store, withLoads(doc, loads));
  return loads.length - 1;
}

/** Change load `index`; returns a refusal or null. */
export function setWeldLoad(store: Store, index: number, patch: Partial<WeldLoadCase>): string | null {
  const doc = store.getState().doc;
  const loads = doc.weldLoads ?? [];
  if (!loads[index]) return 'That weld load no longer exists.';
  const next = { ...loads[index], ...patch };
  if (patch.M === undefined && 'M' in patch) delete next.M;
  for (const k of ['Fx', 'Fy'] as const) if (!Number.isFinite(next[k])) return `${k} must be a finite number.`;
  if (next.M !== undefined && !Number.isFinite(next.M)) return 'M must be a finite number.';
  if (!next.at.every(Number.isFinite)) return 'The point must be two finite numbers.';
  if (JSON.stringify(next) === JSON.stringify(loads[index])) return null;
  commit(store, withLoads(doc, loads.map((w, k) => (k === index ? next : w))));
  return null;
}

export function removeWeldLoad(store: Store, index: number): void {
  const doc = store.getState().doc;
  const loads = doc.weldLoads ?? [];
  if (!loads[index]) return;
  commit(store, withLoads(doc, loads.filter((_, k) => k !== index)));
}

/**
 * Put the line element `id` of the active section in group `group` ('' for the default group).
 * Weld loads on its old group move with it when no line element of the document keeps that group.
 */
export function setLineGroup(store: Store, id: string, group: string): void {
  const doc = store.getState().doc;
  const shapes = activeShapes(doc);
  const idx = shapes.findIndex((s) => s.id === id);
  const shape = shapes[idx];
  if (!shape || shape.type !== 'line') return;
  const before = documentLineGroups(doc as unknown as Record<string, unknown>);
  const next = { ...shape } as Shape & { group?: string };
  if (group.trim()) next.group = group.trim();
  else delete next.group;
  let out = withActiveShapes(doc, shapes.map((s, k) => (k === idx ? next : s)));
  const after = documentLineGroups(out as unknown as Record<string, unknown>);
  const gone = before.filter((g) => !after.includes(g));
  const target = after.find((g) => !before.includes(g)) ?? (group.trim() || DEFAULT_LINE_GROUP);
  if (gone.length && out.weldLoads) out = withLoads(out, out.weldLoads.map((w) => (gone.includes(w.group.trim()) ? { ...w, group: target } : w)));
  commit(store, out);
}

/** The extent of the line elements and of the weld loads' points (for fitting the view), or null. */
export function linesAndLoadsBounds(shapes: readonly ShapeResult[], doc: SectionDocument): Bounds | null {
  let b: Bounds | null = null;
  for (const s of shapes) if (s.chains) b = unionBounds(b, groupBoundsAbout(s.chains, 0, 0));
  for (const w of doc.weldLoads ?? []) b = unionBounds(b, { xmin: w.at[0], xmax: w.at[0], ymin: w.at[1], ymax: w.at[1] });
  return b;
}
