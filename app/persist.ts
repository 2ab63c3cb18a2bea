/**
 * Autosave: after every committed edit the document is written to the browser's storage, and it
 * is restored on the next start. A stored document that no longer validates is kept aside under
 * a second key (never thrown away) and the demo is loaded instead.
 */
import { DEMO_DOCUMENT, formatIssue, parseDocument, type SectionDocument } from '../src';
import type { EditorStore } from './store/store';

export const AUTOSAVE_KEY = 'kern.autosave.v1';
export const REJECTED_KEY = 'kern.autosave.rejected';

export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

export function restoreDocument(storage: KeyValueStorage | null): { doc: SectionDocument; restored: boolean; problems: string[] } {
  const text = storage?.getItem(AUTOSAVE_KEY) ?? null;
  if (text === null) return { doc: DEMO_DOCUMENT, restored: false, problems: [] };
  const r = parseDocument(text);
  if (r.ok) return { doc: r.doc, restored: true, problems: [] };
  try {
    storage?.setItem(REJECTED_KEY, text);
  } catch {
    /* storage full: nothing more we can do */
  }
  return { doc: DEMO_DOCUMENT, restored: false, problems: r.errors.map(formatIssue) };
}

/** Save after each committed change (not during a gesture's preview). Returns the unsubscribe. */
export function installAutosave(store: EditorStore, storage: KeyValueStorage): () => void {
  return store.subscribe((s, prev) => {
    if (s.revision === prev.revision || s.gestureBase) return;
    try {
      storage.setItem(AUTOSAVE_KEY, JSON.stringify(s.doc));
    } catch (e) {
      store.setState({
        notice: { kind: 'error', title: 'Autosave failed: the browser refused to store the section.', lines: [String((e as Error).message ?? e), 'Save the section to a file to keep your work.'] },
      });
    }
  });
}
