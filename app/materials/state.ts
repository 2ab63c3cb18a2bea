/**
 * UI state of the materials and loads features, one small vanilla store per editor store: the
 * materials dialog, the point whose stress is shown, and a counter that ticks when a result
 * computed while the editor rests (kern, plastic moments) arrives. Nothing here is part of the
 * document or of undo.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { unitFactor, type Point } from '../../src';
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
    const ui = createStore<MaterialsUiState>()(() => ({ dialogOpen: false, probe: null, idleTick: 0 }));
    // The probed point is a place on the section: it follows a change of the document's units.
    editorStore.subscribe((st, prev) => {
      const p = ui.getState().probe;
      if (p && st.doc.units !== prev.doc.units) {
        const f = unitFactor(prev.doc.units, st.doc.units);
        ui.setState({ probe: [p[0] * f, p[1] * f] });
      }
    });
    stores.set(editorStore, ui);
    s = ui;
  }
  return s;
}
