/**
 * UI state of the materials and loads features, one small vanilla store per editor store: the
 * materials dialog, the point whose stress is shown, and a counter that ticks when a result
 * computed while the editor rests (kern, plastic moments) arrives. Nothing here is part of the
 * document or of undo.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Point } from '../../src';
import type { EditorStore } from '../store/store';

export interface MaterialsUiState {
  dialogOpen: boolean;
  /** The point whose stress the loads panel shows (typed there or clicked with the probe tool). */
  probe: Point | null;
  /** Increments when an idle result is stored (see derived.ts). */
  idleTick: number;
}

export type MaterialsUiStore = StoreApi<MaterialsUiState>;

const stores = new WeakMap<EditorStore, MaterialsUiStore>();

export function materialsUi(editorStore: EditorStore): MaterialsUiStore {
  let s = stores.get(editorStore);
  if (!s) {
    s = createStore<MaterialsUiState>()(() => ({ dialogOpen: false, probe: null, idleTick: 0 }));
    stores.set(editorStore, s);
  }
  return s;
}
