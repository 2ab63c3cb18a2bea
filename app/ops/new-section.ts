/**
 * "New": an empty section in the same units, in one undo step. A section that has shapes is not
 * cleared without asking (the answer "go ahead" still leaves it one Undo away). The view goes back
 * to a fresh sheet: the origin near the lower left, about 400 mm across, whatever the zoom was.
 */
import { unitFactor, type SectionDocument } from '../../src';
import type { CommandContext } from '../commands/registry';
import { fitBounds } from '../view';
import { newDocument } from './document';
import { ask } from './question';

/** The argument that skips the question (scripts and tests that mean it). */
export const DISCARD = 'discard';

function shapeCount(doc: SectionDocument): number {
  return doc.shapes.length + (doc.variants ?? []).reduce((n, v) => n + v.shapes.filter((e) => typeof e !== 'string').length, 0);
}

/** The view of an empty sheet: x and y from −50 to 350 mm (in the document's units), origin lower left. */
export function freshView(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const k = unitFactor('mm', s.doc.units);
  ctx.store.setState(fitBounds({ xmin: -50 * k, ymin: -50 * k, xmax: 350 * k, ymax: 350 * k }, s.width, s.height, 24));
}

function clear(ctx: CommandContext): void {
  newDocument(ctx);
  ctx.store.setState({ selected: [], cutAt: null });
  freshView(ctx);
}

export function startNewSection(ctx: CommandContext, arg?: unknown): void {
  const doc = ctx.store.getState().doc;
  const n = shapeCount(doc);
  if (n === 0 || arg === DISCARD) return clear(ctx);
  const name = doc.name ? `“${doc.name}”` : 'This section';
  ask(ctx, {
    id: 'new-section',
    title: 'Start a new, empty section?',
    lines: [
      `${name} has ${n === 1 ? 'one shape' : `${n} shapes`}${doc.variants?.length ? ` and ${doc.variants.length === 1 ? 'a proposal' : `${doc.variants.length} proposals`}` : ''}. A new section clears them from the sheet.`,
      'Undo brings them back; Save first to keep a copy in a file.',
    ],
    confirm: 'Clear and start new',
    cancel: 'Keep this section',
    proceed: () => clear(ctx),
  });
}
