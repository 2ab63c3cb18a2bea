/**
 * Placing a rolled section from the catalogue (src/catalogue/: IPE, HE A, HE B, W): an `i-beam`
 * profile named by its designation, its dimensions converted to the document's units, centred on
 * the middle of the view (on the grid), selected, in one undo step; if it is larger than the view
 * the view zooms out to show it. It stays an ordinary profile whose dimensions can be edited.
 */
import { allShapeIds, catalogueProfile, CatalogueError, formatIssue, newShapeId, validateShape, type Shape } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';
import { gridStep, toWorld } from '../view';
import { notify } from './notice';
import { revealShapes } from '../reveal';

export interface CatalogueArg {
  series: string;
  designation: string;
}

/** A coordinate on the grid's minor step, without binary noise. */
function onGrid(v: number, step: number): number {
  return Number((Math.round(v / step) * step).toPrecision(12));
}

/** Place a catalogue size; returns the refusal or null. */
export function placeCatalogueSize(ctx: CommandContext, arg: unknown): string | null {
  const a = (arg ?? {}) as Partial<CatalogueArg>;
  if (typeof a.series !== 'string' || typeof a.designation !== 'string') return 'Choose a series and a size.';
  const s = ctx.store.getState();
  let rec;
  try {
    rec = catalogueProfile(a.series, a.designation, { units: s.doc.units });
  } catch (e) {
    if (e instanceof CatalogueError) return e.message;
    throw e;
  }
  const [cx, cy] = toWorld(s, s.width / 2, s.height / 2);
  const step = gridStep(s.scale).minor;
  const id = newShapeId(allShapeIds(s.doc));
  const shape = { ...rec, id, at: [onGrid(cx - rec.flangeWidth / 2, step), onGrid(cy - rec.depth / 2, step)] } as Shape;
  const shapes = activeShapes(s.doc);
  const issues = validateShape(shape, `shapes[${shapes.length}]`);
  if (issues.length) return `Not placed: ${issues.map(formatIssue).join('; ')}`;
  commit(ctx.store, withActiveShapes(s.doc, [...shapes, shape]), [id]);
  revealShapes(ctx, [id]);
  return null;
}

/** `catalogue.place` with {series, designation}. */
export function placeCatalogueCommand(ctx: CommandContext, arg: unknown): void {
  const err = placeCatalogueSize(ctx, arg);
  if (err) notify(ctx, 'error', 'The section was not placed.', [err]);
}
