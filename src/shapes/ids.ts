/** Shape ids: fresh ones for new shapes, never one the document already uses. */
import type { Shape } from './shape';

/** A fresh id that the document does not use yet: `s1`, `s2`, ... */
export function newShapeId(doc: { readonly shapes: readonly Shape[] }, taken: ReadonlySet<string> = new Set()): string {
  const used = new Set(doc.shapes.map((s) => s.id));
  for (let k = doc.shapes.length + 1; ; k++) {
    const id = `s${k}`;
    if (!used.has(id) && !taken.has(id)) return id;
  }
}
