/**
 * The section being edited: the baseline, or the proposal the document marks active. The store
 * holds the whole document (baseline and proposals, so undo covers switching between them);
 * everything that draws, picks or edits shapes works on the active section through these two
 * functions, and an edit is written back into the right list.
 */
import { sectionOf, withSectionShapes, type SectionDocument, type Shape } from '../../src';

const cache = new WeakMap<SectionDocument, SectionDocument>();

/** The active section as a plain document (the same object for the same document). */
export function activeSection(doc: SectionDocument): SectionDocument {
  if (!doc.activeVariant) return doc;
  let s = cache.get(doc);
  if (!s) {
    s = sectionOf(doc, doc.activeVariant);
    cache.set(doc, s);
  }
  return s;
}

/** The shapes of the active section, in order. */
export function activeShapes(doc: SectionDocument): Shape[] {
  return activeSection(doc).shapes;
}

/** The document with the active section's shapes replaced (baseline or proposal). */
export function withActiveShapes(doc: SectionDocument, shapes: Shape[]): SectionDocument {
  return withSectionShapes(doc, doc.activeVariant, shapes);
}
