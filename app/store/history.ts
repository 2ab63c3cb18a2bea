/**
 * Every document change goes through here and says how undo treats it:
 * - `commit`: record one step now;
 * - `beginGesture` / `previewGesture` / `endGesture`: a drag previews without recording and
 *   records one step when it ends (or nothing if it changed nothing); `cancelGesture` restores;
 * - `replaceWithoutHistory`: never recorded (restoring the autosave at start-up).
 */
import type { SectionDocument } from '../../src';
import { HISTORY_LIMIT, type EditorState, type EditorStore } from './store';
import { activeShapes } from './section';

function keepSelection(s: EditorState, doc: SectionDocument, selected?: string[]): string[] {
  const ids = new Set(activeShapes(doc).map((sh) => sh.id));
  return (selected ?? s.selected).filter((id) => ids.has(id));
}

function pushPast(past: SectionDocument[], doc: SectionDocument): SectionDocument[] {
  const out = past.length >= HISTORY_LIMIT ? past.slice(past.length - HISTORY_LIMIT + 1) : past.slice();
  out.push(doc);
  return out;
}

/** Record `next` as one undoable step. A no-op when `next` is the current document. */
export function commit(store: EditorStore, next: SectionDocument, selected?: string[]): void {
  const s = store.getState();
  if (s.gestureBase) endGesture(store);
  const cur = store.getState();
  if (next === cur.doc) {
    if (selected) store.setState({ selected: keepSelection(cur, next, selected) });
    return;
  }
  store.setState({
    doc: next,
    past: pushPast(cur.past, cur.doc),
    future: [],
    revision: cur.revision + 1,
    selected: keepSelection(cur, next, selected),
  });
}

export function beginGesture(store: EditorStore): void {
  const s = store.getState();
  if (!s.gestureBase) store.setState({ gestureBase: s.doc });
}

/** Show `doc` while a gesture runs; nothing is recorded. */
export function previewGesture(store: EditorStore, doc: SectionDocument): void {
  const s = store.getState();
  if (!s.gestureBase) store.setState({ gestureBase: s.doc });
  store.setState({ doc });
}

/** Finish the gesture: one undo step from the document before it to the one shown now. */
export function endGesture(store: EditorStore): void {
  const s = store.getState();
  const base = s.gestureBase;
  if (!base) return;
  if (base === s.doc) {
    store.setState({ gestureBase: null });
    return;
  }
  store.setState({
    gestureBase: null,
    past: pushPast(s.past, base),
    future: [],
    revision: s.revision + 1,
    selected: keepSelection(s, s.doc),
  });
}

export function cancelGesture(store: EditorStore): void {
  const s = store.getState();
  if (!s.gestureBase) return;
  store.setState({ doc: s.gestureBase, gestureBase: null });
}

export function replaceWithoutHistory(store: EditorStore, doc: SectionDocument): void {
  store.setState({ doc, gestureBase: null, selected: [] });
}

export function canUndo(s: EditorState): boolean {
  return s.past.length > 0;
}
export function canRedo(s: EditorState): boolean {
  return s.future.length > 0;
}

export function undo(store: EditorStore): void {
  cancelGesture(store);
  const s = store.getState();
  if (!s.past.length) return;
  const prev = s.past[s.past.length - 1];
  store.setState({
    doc: prev,
    past: s.past.slice(0, -1),
    future: [...s.future, s.doc],
    revision: s.revision + 1,
    selected: keepSelection(s, prev),
  });
}

export function redo(store: EditorStore): void {
  cancelGesture(store);
  const s = store.getState();
  if (!s.future.length) return;
  const next = s.future[s.future.length - 1];
  store.setState({
    doc: next,
    past: pushPast(s.past, s.doc),
    future: s.future.slice(0, -1),
    revision: s.revision + 1,
    selected: keepSelection(s, next),
  });
}
