/**
 * Polygon editing: a tool that takes corners one by one (Enter, or a click on the first corner,
 * closes it; Backspace takes back the last), a handle on every vertex, and the vertex list in the
 * panel with insert and delete.
 */
import { polygonDeletePoint, polygonInsertAfter, type Point, type PolygonShape } from '../../src';
import { PointFields, ToolButton } from '../fields/PointFields';
import { useShapeEdit } from '../fields/shape-edit';
import { DrawingTool, samePoint } from '../tools/base';
import type { ToolEnv } from '../tools/types';
import type { ShapeEditor } from './kind';
import { HINT } from '../input-syntax';

class PolygonTool extends DrawingTool {
  readonly id = 'polygon';
  private points: Point[] = [];
  private hover: Point | null = null;
  prompt() {
    return this.points.length === 0
      ? `Polygon: first point (${HINT.firstPoint})`
      : `Polygon: next point (${HINT.nextPoint}); ${this.points.length >= 3 ? 'Enter or click the first point to close' : 'at least 3 points'}`;
  }
  last() {
    return this.points.length ? this.points[this.points.length - 1] : null;
  }
  busy() {
    return this.points.length > 0;
  }
  protected override extra() {
    return this.points.slice(0, 1);
  }
  reset(env: ToolEnv) {
    this.points = [];
    this.draft(env, null);
  }
  private close(env: ToolEnv): string | null {
    if (this.points.length < 3) return 'A polygon needs at least 3 points.';
    if (env.addShape({ type: 'polygon', points: this.points.slice() })) this.reset(env);
    return null;
  }
  private show(env: ToolEnv) {
    const chain = this.hover ? [...this.points, this.hover] : this.points.slice();
    this.draft(env, { chain, closing: this.points.length >= 2, markers: this.points.slice(0, 1) });
  }
  protected accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null {
    const first = this.points[0];
    if (first && samePoint(p, first)) return this.close(env);
    // Closing by clicking near the first point even when snapping is off.
    if (how === 'click' && first && this.points.length >= 3 && this.pressedNear(env, first)) return this.close(env);
    const lastP = this.last();
    if (lastP && samePoint(p, lastP)) return 'That point repeats the previous one.';
    this.points.push(p);
    this.show(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    this.hover = p;
    if (this.points.length) this.show(env);
  }
  override key(env: ToolEnv, key: string) {
    if (key === 'enter' && this.points.length) {
      env.message(this.close(env));
      return true;
    }
    if (key === 'backspace' && this.points.length) {
      this.points.pop();
      this.show(env);
      return true;
    }
    return super.key(env, key);
  }
}

function PolygonFields({ shape }: { shape: PolygonShape }) {
  const e = useShapeEdit(shape);
  return (
    <div className="vertex-list">
      {shape.points.map((p, i) => (
        <PointFields
          key={i}
          label={`Vertex ${i + 1}`}
          p={p}
          field={`points[${i}]`}
          units={e.units}
          onPoint={(q) => e.set((s) => ({ ...s, points: s.points.map((o, k) => (k === i ? q : o)) }))}
          error={e.errorOn(`points[${i}]`)}
          tools={
            <>
              <ToolButton testid={`vertex-insert-${i}`} title="Insert point after" label="+" onClick={() => e.edit(`points[${i}]`, (s, at) => polygonInsertAfter(s, i, at))} />
              <ToolButton testid={`vertex-delete-${i}`} title="Delete point" label="×" onClick={() => e.edit(`points[${i}]`, (s, at) => polygonDeletePoint(s, i, at))} />
            </>
          }
        />
      ))}
    </div>
  );
}

export const polygonEditor: ShapeEditor<PolygonShape> = {
  types: ['polygon'],
  handles: (s) => s.points.map((p, index) => ({ ref: { kind: 'vertex', index }, p })),
  moveHandle: (s, ref, p) => (ref.kind === 'vertex' ? { ...s, points: s.points.map((q, i) => (i === ref.index ? p : q)) } : s),
  Fields: PolygonFields,
  tools: [{ id: 'polygon', label: 'Polygon', key: 'p', inDrawGroup: true, create: () => new PolygonTool() }],
};
