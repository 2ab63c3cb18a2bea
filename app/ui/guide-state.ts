/**
 * Whether the first-steps guide is showing. It opens by itself only on the very first start (no
 * autosaved section yet, never dismissed); once dismissed that is remembered in the browser's
 * storage, and only the keys sheet opens it again. One small store per editor store.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { KeyValueStorage } from '../persist';
import type { EditorStore } from '../store/store';

export const GUIDE_DISMISSED_KEY = 'kern.guide.dismissed';

interface GuideState {
  open: boolean;
  storage: KeyValueStorage | null;
}

const stores = new WeakMap<EditorStore, StoreApi<GuideState>>();

export function guideStore(editorStore: EditorStore): StoreApi<GuideState> {
  let s = stores.get(editorStore);
  if (!s) {
    s = createStore<GuideState>()(() => ({ open: false, storage: null }));
    stores.set(editorStore, s);
  }
  return s;
}

function dismissed(storage: KeyValueStorage | null): boolean {
  try {
    return storage?.getItem(GUIDE_DISMISSED_KEY) === '1';
  } catch {
    return false;
  }
}

/** At start-up: show the guide on a first start that has not dismissed it before. */
export function startGuide(editorStore: EditorStore, storage: KeyValueStorage | null, firstStart: boolean): void {
  guideStore(editorStore).setState({ storage, open: firstStart && !dismissed(storage) });
}

export function showGuide(editorStore: EditorStore): void {
  guideStore(editorStore).setState({ open: true });
}

/** Close the guide and remember that it was read. */
export function dismissGuide(editorStore: EditorStore): void {
  const g = guideStore(editorStore);
  g.setState({ open: false });
  try {
    g.getState().storage?.setItem(GUIDE_DISMISSED_KEY, '1');
  } catch {
    /* storage refused: the guide may come back next time, nothing worse */
  }
}
