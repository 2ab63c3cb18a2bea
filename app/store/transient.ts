/**
 * Transient editor state that is never part of the document or of undo: the pointer, the snap
 * target, what the active tool draws while it works, its prompt and the last input error.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { Point, Shape } from '../../src';

/** Where snapping put the pointer, and why. */
export interface SnapResult {
  p: Point;
  kind: 'vertex' | 'midpoint' | 'centre' | 'intersection' | 'grid' | 'free';
  /** True when the orthogonal constraint moved the point. */
  ortho: boolean;
}

/** What a tool shows while it works (world coordinates). */
export interface Draft {
  shape?: Shape;
  /** An open chain of points (an outline being drawn), with `closing` drawn dashed back to its start. */
  chain?: Point[];
  closing?: boolean;
  markers?: Point[];
  box?: [Point, Point];
}

export interface Transient {
  pointer: Point | null;
  snap: SnapResult | null;
  draft: Draft | null;
  prompt: string;
  inputError: string | null;
  /** Handle under the pointer (index into the selected shape's handles), for the hover style. */
  hoverHandle: number | null;
  /** The corner picked for rounding (a click on a vertex handle): shape id and vertex index. */
  corner: { id: string; index: number } | null;
}

export type TransientStore = StoreApi<Transient>;

export function createTransientStore(): TransientStore {
  return createStore<Transient>()(() => ({ pointer: null, snap: null, draft: null, prompt: '', inputError: null, hoverHandle: null, corner: null }));
}
