/**
 * The list of shape-kind editors. The editor builds its tools from it, the command table its
 * `tool.*` commands, the tool rail its buttons, and the side panel and the select tool look a
 * shape's handles and fields up here. Adding a kind: one engine module in `src/shapes/`, one
 * editor module here, and its entry in this list.
 */
import type { Point, Shape, ShapeType } from '../../src';
import { circleEditor } from './circle';
import type { Handle, HandleRef, ShapeEditor } from './kind';
import { lineEditor } from './line';
import { pathEditor } from './path';
import { polygonEditor } from './polygon';
import { profileEditor } from './profile';
import { stripEditor } from './strip';

export type { Handle, HandleRef, ShapeEditor, ToolSpec } from './kind';

export const SHAPE_EDITORS: readonly ShapeEditor<Shape>[] = [polygonEditor, circleEditor, pathEditor, profileEditor, stripEditor, lineEditor] as unknown as ShapeEditor<Shape>[];

const byType = new Map<string, ShapeEditor<Shape>>();
for (const e of SHAPE_EDITORS) for (const t of e.types) byType.set(t, e);

export function editorForType(type: ShapeType): ShapeEditor<Shape> | undefined {
  return byType.get(type);
}

function editorOf(s: Shape): ShapeEditor<Shape> {
  const e = byType.get(s.type);
  if (!e) throw new Error(`no editor for shape kind "${s.type}"`);
  return e;
}

/** Every drawing tool of every kind, in rail order. */
export const TOOL_SPECS = SHAPE_EDITORS.flatMap((e) => e.tools);

export function shapeHandles(s: Shape): Handle[] {
  return editorOf(s).handles(s);
}

/** The shape with one handle moved to p. */
export function moveHandle(s: Shape, ref: HandleRef, p: Point): Shape {
  return editorOf(s).moveHandle(s, ref, p);
}

export function ShapeFields({ shape }: { shape: Shape }) {
  const F = editorOf(shape).Fields;
  return <F shape={shape} />;
}
