/**
 * UI state of the exchange features (DXF import review, export dialog, problem marks), one small
 * vanilla store per editor store. Nothing here is part of the document or of undo.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Region, Shape, Units } from '../../src';
import type { DxfProblem } from '../../src/exchange';
import type { EditorStore } from '../store/store';

/** A DXF file read and waiting for the user: units to choose, or a review before it is added. */
export type PendingImport =
  | { stage: 'units'; fileName: string; text: string }
  | {
      stage: 'review';
      fileName: string;
      /** Units the file's numbers were read in, and whether the file stated them. */
      sourceUnits: Units;
      unitsFromFile: boolean;
      targetUnits: Units;
      shapes: Shape[];
      region: Region;
      problems: DxfProblem[];
      warnings: string[];
      ignored: { type: string; count: number }[];
    };

export interface ExchangeState {
  pending: PendingImport | null;
  /** Entities left out of the last import, drawn on the canvas until cleared. */
  problems: DxfProblem[];
  problemsFile: string | null;
  exportOpen: boolean;
  titleOpen: boolean;
  /** Opens the browser's file chooser for a .dxf file (installed by the mounted component). */
  pickDxf: (() => void) | null;
}

export type ExchangeStore = StoreApi<ExchangeState>;

const stores = new WeakMap<EditorStore, ExchangeStore>();

export function exchangeStore(editorStore: EditorStore): ExchangeStore {
  let s = stores.get(editorStore);
  if (!s) {
    s = createStore<ExchangeState>()(() => ({ pending: null, problems: [], problemsFile: null, exportOpen: false, titleOpen: false, pickDxf: null }));
    stores.set(editorStore, s);
  }
  return s;
}
