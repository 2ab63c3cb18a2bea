/**
 * "Open…" for any file the user picks: a section document opens (replacing the section, one undo
 * step); a DXF drawing, told by its name or its first group codes, goes to the DXF import instead,
 * which shows what it found and offers to add it to the section or cut it out, rather than
 * refusing it as a document that is not valid JSON.
 */
import type { CommandContext } from '../commands/registry';
import { loadDocumentText } from '../ops/document';
import { readDxf } from './dxf';

/** True for a DXF drawing: a .dxf name, or text that opens with the group code 0 and SECTION. */
export function looksLikeDxf(name: string, text: string): boolean {
  if (/\.dxf$/i.test(name)) return true;
  return /^\s*0\s*\r?\n\s*SECTION\b/.test(text.slice(0, 200));
}

/** Open a picked file: a section document, or a DXF drawing through the import. */
export function openFileText(ctx: CommandContext, name: string, text: string): void {
  if (!looksLikeDxf(name, text)) {
    loadDocumentText(ctx, name, text);
    return;
  }
  const next = readDxf(ctx, name, text);
  if (next !== 'refused') {
    ctx.store.setState({
      notice: {
        kind: 'info',
        title: `“${name}” is a DXF drawing, not a section document: it is offered for import.`,
        lines: [next === 'units' ? 'Choose the units its numbers are in, then review what was found.' : 'Review what was found, then add it to the section or cut it out of it. Your section is unchanged until you do.'],
      },
    });
  }
}
