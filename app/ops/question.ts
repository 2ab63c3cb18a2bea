/**
 * A question the editor asks before it does something that cannot be seen to be undone (clearing
 * the section). One small store per editor store, like the exchange dialogs' state; the dialog
 * that shows it is app/ui/QuestionDialog.tsx. Nothing here is part of the document or of undo.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { CommandContext } from '../commands/registry';
import type { EditorStore } from '../store/store';

export interface Question {
  title: string;
  lines: string[];
  /** Label of the button that goes ahead, and of the one that leaves everything as it is. */
  confirm: string;
  cancel: string;
  /** What going ahead does. */
  proceed: () => void;
  /** A stable name for tests (data-question). */
  id: string;
}

export type QuestionStore = StoreApi<{ question: Question | null }>;

const stores = new WeakMap<EditorStore, QuestionStore>();

export function questionStore(editorStore: EditorStore): QuestionStore {
  let s = stores.get(editorStore);
  if (!s) {
    s = createStore<{ question: Question | null }>()(() => ({ question: null }));
    stores.set(editorStore, s);
  }
  return s;
}

export function ask(ctx: CommandContext, q: Question): void {
  questionStore(ctx.store).setState({ question: q });
}

/** Answer the open question: true goes ahead, false leaves everything unchanged. */
export function answer(editorStore: EditorStore, yes: boolean): void {
  const qs = questionStore(editorStore);
  const q = qs.getState().question;
  qs.setState({ question: null });
  if (q && yes) q.proceed();
}
