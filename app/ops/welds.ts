/**
 * Document operations on weld loads and line groups, each one undoable step: add a load to a
 * group, change or remove a load, and rename a line element's group (a load that named the old
 * group follows it when no other element keeps that name).
 */
import { allShapeIds, chainRemoveSegment, DEFAULT_LINE_GROUP, documentLineGroups, groupBoundsAbout, linesAlongOutline, newShapeId, unionBounds, type Bounds, type SectionDocument, type Shape, type ShapeResult, type WeldLoadCase } from '../../src';
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

/**
 * Remove segment i of the line element or strip `id` (src/shapes/edit-points.ts): the chain is
 * shortened, opened, or split in two, the second part a new shape right after the first.
 * Returns a refusal or null.
 */
export function removeChainSegment(store: Store, id: string, i: number): string | null {
  const doc = store.getState().doc;
  const shapes = activeShapes(doc);
  const idx = shapes.findIndex((s) => s.id === id);
  const s = shapes[idx];
  if (!s || (s.type !== 'line' && s.type !== 'strip')) return 'The shape no longer exists.';
  const r = chainRemoveSegment(s, i, `shapes[${idx}]`);
  if (!r.ok) return r.message;
  const [first, ...rest] = r.shapes;
  const used = allShapeIds(doc);
  const more = rest.map((p) => {
    const nid = newShapeId(used);
    used.add(nid);
    return { ...p, id: nid };
  });
  commit(store, withActiveShapes(doc, [...shapes.slice(0, idx), first, ...more, ...shapes.slice(idx + 1)]), [first.id, ...more.map((m) => m.id)]);
  return null;
}

/**
 * Line elements along the outlines of the selected area shapes (each its own outline), or of the
 * whole section when none is selected: a weld all round, to be trimmed to the welded faces. They
 * join the group of the selected line element, else of the last one drawn.
 */
export function addLinesAlongOutline(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const doc = s.doc;
  const shapes = activeShapes(doc);
  const own = ctx.shapesOf(doc);
  const picked = shapes.map((sh, i) => ({ sh, r: own[i] })).filter((x) => s.selected.includes(x.sh.id) && !x.r?.chains && x.r && !x.r.error && x.r.region.length > 0);
  const region = picked.length ? picked.flatMap((x) => x.r.region) : ctx.evaluate(doc).region;
  if (region.length === 0) {
    ctx.store.setState({ notice: { kind: 'info', title: 'No outline to follow.', lines: ['Select an area shape (or draw one) first: the line elements follow its outline.'] } });
    return;
  }
  const lineOf = (x: Shape | undefined) => (x?.type === 'line' ? x.group : undefined);
  const group = lineOf(shapes.find((x) => x.type === 'line' && s.selected.includes(x.id))) ?? lineOf([...shapes].reverse().find((x) => x.type === 'line'));
  const used = allShapeIds(doc);
  const added = linesAlongOutline(region, group).map((l) => {
    const id = newShapeId(used);
    used.add(id);
    return { ...l, id } as Shape;
  });
  commit(ctx.store, withActiveShapes(doc, [...shapes, ...added]), added.map((a) => a.id));
}
