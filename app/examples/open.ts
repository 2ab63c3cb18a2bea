/**
 * Opening an example from the shelf: read its file (bundled with the app, no network), then open
 * it like a file the user picked, so it replaces the section in one undo step and the view fits it.
 */
import type { Command, CommandContext } from '../commands/registry';
import { loadDocumentText } from '../ops/document';
import { notify } from '../ops/notice';
import { EXAMPLE_SHELF, exampleText } from './shelf';

/** Reads an example's text (the shelf's own reader; tests may pass another). */
export type ExampleReader = (file: string) => Promise<string>;

export async function openExample(ctx: CommandContext, file: string, read: ExampleReader = exampleText): Promise<boolean> {
  const entry = EXAMPLE_SHELF.find((e) => e.file === file);
  if (!entry) {
    notify(ctx, 'error', `There is no example "${file}".`, [`The shelf holds ${EXAMPLE_SHELF.map((e) => e.file).join(', ')}.`]);
    return false;
  }
  let text: string;
  try {
    text = await read(file);
  } catch (e) {
    notify(ctx, 'error', `The example “${entry.title}” could not be loaded.`, [String((e as Error).message ?? e), 'Your current section is unchanged.']);
    return false;
  }
  return loadDocumentText(ctx, file, withoutSchemaLink(text));
}

/**
 * The examples name their schema by a path relative to public/examples/ (for editors); a copy
 * saved from the app lands elsewhere, where that path would point nowhere, so it is left out.
 */
function withoutSchemaLink(text: string): string {
  try {
    const v = JSON.parse(text) as unknown;
    if (typeof v !== 'object' || v === null || Array.isArray(v) || !('$schema' in v)) return text;
    const { $schema: _link, ...rest } = v as Record<string, unknown>;
    void _link;
    return JSON.stringify(rest);
  } catch {
    return text; // the document reader reports what is wrong with it
  }
}

/** `file.example` with the example's file name: open it from the shelf. */
export const OPEN_EXAMPLE_COMMAND: Command = {
  name: 'file.example',
  label: 'Open an example',
  group: 'file',
  hint: 'Open one of the example sections (replaces the section; Undo brings it back)',
  perform: (c, arg) => void openExample(c, String(arg)),
};
