/**
 * The editor store: one vanilla zustand store made of four slices (document, selection, tool,
 * view). No React here; React reads it through `useEditor` (app/store/hooks.ts), and module-level
 * actions (history.ts, commands) write it.
 *
 * Derived results (the evaluation) are not stored here: they come from the evaluator, memoised
 * by document identity (app/store/evaluation.ts).
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { ProfileType, SectionDocument, StripCornerKind, Units } from '../../src';

export interface DocumentSlice {
  /** The document on screen: during a gesture this is the preview. */
  doc: SectionDocument;
  /** Undo stack (oldest first) and redo stack (next redo last). */
  past: SectionDocument[];
  future: SectionDocument[];
  /** Non-null while a gesture previews: the document before it began. */
  gestureBase: SectionDocument | null;
  /** Increments on every committed change (autosave listens to it). */
  revision: number;
}

export interface SelectionSlice {
  selected: string[];
}

/** 'select' or the id of a shape kind's drawing tool (see app/shapes/). */
export type ToolId = string;

export interface SnapSettings {
  grid: boolean;
  vertex: boolean;
  midpoint: boolean;
  centre: boolean;
  intersection: boolean;
  /** Orthogonal constraint: the next point is horizontal or vertical from the previous one. */
  ortho: boolean;
}

export interface ToolSlice {
  tool: ToolId;
  profileType: ProfileType;
  snap: SnapSettings;
  /** Arc mode of the chain tools (path, line, strip): the next two points are (through, end) of a three-point arc. */
  pathArc: boolean;
  /** The weld load whose point the weld-point tool places (index into `weldLoads`). */
  weldTarget: number | null;
  /** The next strip's thickness (in `units`; null: the last strip's, else 5 mm) and corners. */
  stripDefaults: { thickness: number | null; units: Units; corners: StripCornerKind };
}

export interface Overlays {
  centroid: boolean;
  principal: boolean;
  fibres: boolean;
  cut: boolean;
  /** The kern (core) of the section. */
  kern: boolean;
  /** Stress colour map, neutral axis and largest stresses under the document's loads. */
  stress: boolean;
  /** Dimensions of holes, notches and plates, as on the report's figure (app/canvas/layers/Dimensions.tsx). */
  dimensions: boolean;
  /** The shaded shear-stress map of the torsion result (drawn when there is one). */
  stressMap: boolean;
  /** Markers of the structural cautions (app/canvas/layers/CautionMarks.tsx). */
  cautions: boolean;
}

export interface Notice {
  kind: 'error' | 'info';
  title: string;
  lines: string[];
}

export interface ViewSlice {
  /** Pixels per document unit, and the screen position of the world origin (y up on screen means sy = oy − y·scale). */
  scale: number;
  ox: number;
  oy: number;
  width: number;
  height: number;
  overlays: Overlays;
  /** The cut line: horizontal (at world y, part above) or vertical (at world x, part to the right). */
  cutAxis: 'x' | 'y';
  /** World coordinate of the cut line along its axis. */
  cutAt: number | null;
  notice: Notice | null;
  reportOpen: boolean;
  /** The dialog for the revision history, notes and "checked by" (app/ui/CheckerDialog.tsx). */
  checkerOpen: boolean;
}

export type EditorState = DocumentSlice & SelectionSlice & ToolSlice & ViewSlice;
export type EditorStore = StoreApi<EditorState>;

export const HISTORY_LIMIT = 500;

export function createEditorStore(doc: SectionDocument): EditorStore {
  return createStore<EditorState>()(() => ({
    // document slice
    doc,
    past: [],
    future: [],
    gestureBase: null,
    revision: 0,
    // selection slice
    selected: [],
    // tool slice
    tool: 'select',
    profileType: 'i-beam',
    snap: { grid: true, vertex: true, midpoint: true, centre: true, intersection: true, ortho: false },
    pathArc: false,
    weldTarget: null,
    stripDefaults: { thickness: null, units: doc.units, corners: 'mitre' },
    // view slice
    scale: 2,
    ox: 400,
    oy: 400,
    width: 800,
    height: 600,
    overlays: { centroid: true, principal: false, fibres: false, cut: false, kern: false, stress: true, dimensions: false, stressMap: false, cautions: true },
    cutAxis: 'y',
    cutAt: null,
    notice: null,
    reportOpen: false,
    checkerOpen: false,
  }));
}
