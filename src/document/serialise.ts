/** The text a saved section document holds: pretty JSON, two-space indent, a final newline. */
import type { SectionDocument } from './types';

export function serialiseDocumentText(doc: SectionDocument): string {
  return JSON.stringify(doc, null, 2) + '\n';
}
