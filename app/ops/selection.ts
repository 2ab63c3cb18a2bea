/**
 * Operations on the selected shapes, each one undoable step: move, nudge, rotate, mirror,
 * duplicate, delete, reorder and the boolean operation. Moves and turns come from the engine's
 * shape operations, so a shape kind needs nothing here.
 */
import { allShapeIds, kindOf, mirrorShape, newShapeId, regionsBounds, rotateShape, translateShape, type Bounds, type Op, type Shape, type Units } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import type { EditorState } from '../store/store';
import { activeShapes, withActiveShapes } from '../store/section';

export const hasSelection = (ctx: CommandContext): boolean => ctx.store.getState().selected.length > 0;

export function selectedShapes(s: EditorState): Shape[] {
  const sel = new Set(s.selected);
  return activeShapes(s.doc).filter((sh) => sel.has(sh.id));
}

/** Replace the selected shapes by `f(shape)` in one undoable step. */
export function mapSelected(ctx: CommandContext, f: (s: Shape) => Shape): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  let changed = false;
  const shapes = activeShapes(s.doc).map((sh) => {
    if (!sel.has(sh.id)) return sh;
    const n = f(sh);
    if (n !== sh) changed = true;
    return n;
  });
  if (changed) commit(ctx.store, withActiveShapes(s.doc, shapes));
}

/** Bounds of the selected shapes' own outlines. */
export function selectionBounds(ctx: CommandContext): Bounds | null {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  return regionsBounds(ctx.shapesOf(s.doc).filter((r) => sel.has(r.id)).map((r) => r.region));
}

/** The fixed arrow-key step in document units: 1 mm, or 1/16 in for inch and foot documents. */
export function nudgeStep(units: Units): number {
  switch (units) {
    case 'mm': return 1;
    case 'cm': return 0.1;
    case 'm': return 0.001;
    case 'in': return 1 / 16;
    case 'ft': return 1 / 192;
  }
}

export function nudgeSelection(ctx: CommandContext, dx: number, dy: number): void {
  const step = nudgeStep(ctx.store.getState().doc.units);
  mapSelected(ctx, (sh) => translateShape(sh, dx * step, dy * step));
}

export function moveSelection(ctx: CommandContext, dx: number, dy: number): void {
  if (!Number.isFinite(dx) || !Number.isFinite(dy)) return;
  mapSelected(ctx, (sh) => translateShape(sh, dx, dy));
}

/** Rotate by `deg` degrees CCW about the centre of the selection's bounds. */
export function rotateSelection(ctx: CommandContext, deg: number): void {
  if (!Number.isFinite(deg) || deg === 0) return;
  const b = selectionBounds(ctx);
  if (!b) return;
  const px = (b.xmin + b.xmax) / 2, py = (b.ymin + b.ymax) / 2;
  mapSelected(ctx, (sh) => rotateShape(sh, deg, px, py));
}

/** Mirror left–right (about a vertical line) or top–bottom, through the selection's centre. */
export function mirrorSelection(ctx: CommandContext, axis: 'vertical' | 'horizontal'): void {
  const b = selectionBounds(ctx);
  if (!b) return;
  const c = axis === 'vertical' ? (b.xmin + b.xmax) / 2 : (b.ymin + b.ymax) / 2;
  mapSelected(ctx, (sh) => mirrorShape(sh, axis, c));
}

export function deleteSelection(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  commit(ctx.store, withActiveShapes(s.doc, activeShapes(s.doc).filter((sh) => !sel.has(sh.id))), []);
}

/** Copies of the selected shapes, a little down and to the right, selected. */
export function duplicateSelection(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  const step = nudgeStep(s.doc.units) * 10;
  const taken = allShapeIds(s.doc);
  const copies: Shape[] = [];
  for (const sh of activeShapes(s.doc)) {
    if (!sel.has(sh.id)) continue;
    const id = newShapeId(taken);
    taken.add(id);
    const c = translateShape({ ...sh, id, name: sh.name ? `${sh.name} (copy)` : undefined }, step, -step);
    if (c.name === undefined) delete (c as { name?: string }).name;
    copies.push(c);
  }
  commit(ctx.store, withActiveShapes(s.doc, [...activeShapes(s.doc), ...copies]), copies.map((c) => c.id));
}

/** The boolean operation of the selected area shapes (line elements take none). */
export function setSelectionOp(ctx: CommandContext, op: Op): void {
  mapSelected(ctx, (sh) => ((sh.op ?? 'add') === op || kindOf(sh).line ? sh : { ...sh, op }));
}

/** Shapes apply in list order, so the order changes the result. */
export function reorderSelection(ctx: CommandContext, dir: 'forward' | 'backward' | 'front' | 'back'): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return;
  const current = activeShapes(s.doc);
  const shapes = current.slice();
  if (dir === 'front' || dir === 'back') {
    const picked = shapes.filter((sh) => sel.has(sh.id));
    const rest = shapes.filter((sh) => !sel.has(sh.id));
    const next = dir === 'front' ? [...rest, ...picked] : [...picked, ...rest];
    if (next.every((sh, i) => sh === current[i])) return;
    commit(ctx.store, withActiveShapes(s.doc, next));
    return;
  }
  let moved = false;
  if (dir === 'forward') {
    for (let i = shapes.length - 2; i >= 0; i--) {
      if (sel.has(shapes[i].id) && !sel.has(shapes[i + 1].id)) {
        [shapes[i], shapes[i + 1]] = [shapes[i + 1], shapes[i]];
        moved = true;
      }
    }
  } else {
    for (let i = 1; i < shapes.length; i++) {
      if (sel.has(shapes[i].id) && !sel.has(shapes[i - 1].id)) {
        [shapes[i], shapes[i - 1]] = [shapes[i - 1], shapes[i]];
        moved = true;
      }
    }
  }
  if (moved) commit(ctx.store, withActiveShapes(s.doc, shapes));
}
