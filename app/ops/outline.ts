/**
 * Turning shapes into plain outlines: merge a selection into the path outlines of its combined
 * result, or convert a parametric profile into paths. Both keep arcs exact (engine geometry)
 * and record one undo step; a conversion that would change the section is refused.
 */
import { allShapeIds, isProfile, kindOf, profileToOutline, regionToPaths, type Shape } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { notify } from './notice';
import { activeSection, activeShapes, withActiveShapes } from '../store/section';

/** Bake the selected shapes into path shapes from their boolean result (arcs preserved). */
export function mergeSelection(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  const current = activeShapes(s.doc);
  // Only area shapes merge: line elements enclose no area and stay as they are.
  const picked = current.filter((sh) => sel.has(sh.id) && !kindOf(sh).line);
  if (picked.length === 0) return;
  const ev = ctx.evaluate({ ...activeSection(s.doc), shapes: picked });
  if (ev.region.length === 0) {
    notify(ctx, 'error', 'Nothing to merge: the selected shapes combine to an empty section.', ['The section is unchanged.']);
    return;
  }
  const paths = regionToPaths(ev.region, allShapeIds(s.doc));
  const merged = new Set(picked.map((sh) => sh.id));
  const first = current.findIndex((sh) => merged.has(sh.id));
  const before = current.slice(0, first).filter((sh) => !merged.has(sh.id));
  const after = current.slice(first).filter((sh) => !merged.has(sh.id));
  const firstName = picked.length === 1 ? picked[0].name : undefined;
  const named = paths.map((p, i) => (i === 0 ? { ...p, name: firstName ?? 'Merged outline' } : p));
  commit(ctx.store, withActiveShapes(s.doc, [...before, ...named, ...after]), named.map((p) => p.id));
}

export function convertSelectionToOutline(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  const out: Shape[] = [];
  const newSel: string[] = [];
  const used = allShapeIds(s.doc);
  let changed = false;
  for (const sh of activeShapes(s.doc)) {
    if (!sel.has(sh.id) || !isProfile(sh)) {
      out.push(sh);
      if (sel.has(sh.id)) newSel.push(sh.id);
      continue;
    }
    let r;
    try {
      r = profileToOutline(sh, used);
    } catch (e) {
      notify(ctx, 'error', 'This profile cannot be converted.', [(e as Error).message, 'The section is unchanged.']);
      return;
    }
    if (!r.ok) {
      notify(ctx, 'error', 'This profile cannot be converted.', [r.message, 'The section is unchanged.']);
      return;
    }
    out.push(...r.shapes);
    newSel.push(...r.shapes.map((x) => x.id));
    for (const x of r.shapes) used.add(x.id);
    changed = true;
  }
  if (changed) commit(ctx.store, withActiveShapes(s.doc, out), newSel);
}
