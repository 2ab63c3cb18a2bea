/**
 * Editing one shape from the side panel: every change is checked with the engine's
 * validateShape and its exact outline before it is applied, as one undoable step; a refused
 * change returns why and changes nothing.
 */
import { useState } from 'react';
import { formatShapeIssue, shapeToRegion, validateShape, type PointEdit, type Shape } from '../../src';
import { useEditor, useEditorState } from '../context';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';

export type ApplyEdit = (id: string, make: (s: Shape, at: string) => Shape | string) => string | null;

/**
 * Apply `make` to the shape with this id as one undoable step, or return why not. `make` gets the
 * shape's place in the document (`shapes[3]`) for its messages and may refuse with a text.
 */
export function useApply(): ApplyEdit {
  const editor = useEditor();
  return (id, make) => {
    const s = editor.store.getState();
    const shapes = activeShapes(s.doc);
    const idx = shapes.findIndex((x) => x.id === id);
    if (idx < 0) return 'The shape no longer exists.';
    const cand = make(shapes[idx], `shapes[${idx}]`);
    if (typeof cand === 'string') return cand;
    // Enter then blur applies the same value twice: an edit that changes nothing records nothing.
    if (JSON.stringify(cand) === JSON.stringify(shapes[idx])) return null;
    const issues = validateShape(cand, `shapes[${idx}]`);
    if (issues.length) return issues.map((i) => formatShapeIssue(i, shapes)).join('; ');
    try {
      shapeToRegion(cand);
    } catch (e) {
      return `This value gives no valid outline: ${(e as Error).message}`;
    }
    commit(editor.store, withActiveShapes(s.doc, shapes.map((x, i) => (i === idx ? cand : x))));
    return null;
  };
}

export interface ShapeEdit<S extends Shape> {
  units: string;
  /** Replace the shape by f(shape); returns the refusal or null. */
  set(f: (s: S) => S): string | null;
  /** A point edit (insert, delete, line/arc) as one step; a refusal is shown on `row`. */
  edit(row: string, f: (s: S, at: string) => PointEdit<S>): void;
  /** The refusal of the last point edit on this row, or null. */
  errorOn(row: string): string | null;
}

/** The editing handle a kind's panel fields use for one shape. */
export function useShapeEdit<S extends Shape>(shape: S): ShapeEdit<S> {
  const apply = useApply();
  const units = useEditorState((s) => s.doc.units);
  const [edited, setEdited] = useState<{ row: string; message: string } | null>(null);
  return {
    units,
    set: (f) => apply(shape.id, (s) => f(s as S)),
    edit: (row, f) => {
      const err = apply(shape.id, (s, at) => {
        const r = f(s as S, at);
        return r.ok ? r.shape : r.message;
      });
      setEdited(err ? { row, message: err } : null);
    },
    errorOn: (row) => (edited?.row === row ? edited.message : null),
  };
}
