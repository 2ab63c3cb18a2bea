/**
 * Circle editing: a tool that takes the centre, then a radius (typed) or a point on the rim
 * (click, or press-drag-release); a centre handle moves it and a rim handle sets the radius. The
 * panel shows the radius and the diameter, and either may be typed.
 */
import type { CircleShape, Point } from '../../src';
import { NumberField } from '../fields/NumberField';
import { PointFields } from '../fields/PointFields';
import { useShapeEdit } from '../fields/shape-edit';
import type { EntryExpectation, PointInput } from '../expr';
import { HINT } from '../input-syntax';
import { DrawingTool } from '../tools/base';
import { clean, resolveRadius, type ToolEnv } from '../tools/types';
import type { ShapeEditor } from './kind';

class CircleTool extends DrawingTool {
  readonly id = 'circle';
  protected override readonly finishOnDrag = true;
  private centre: Point | null = null;
  prompt() {
    return this.centre ? `Circle: ${HINT.radius}` : `Circle: centre (${HINT.firstPoint})`;
  }
  last() {
    return this.centre;
  }
  busy() {
    return this.centre !== null;
  }
  reset(env: ToolEnv) {
    this.centre = null;
    this.draft(env, null);
  }
  private finish(env: ToolEnv, r: number): string | null {
    if (!(r > 0)) return 'The radius must be greater than 0.';
    if (env.addShape({ type: 'circle', center: this.centre!, radius: clean(r) })) this.reset(env);
    return null;
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    if (!this.centre) {
      this.centre = p;
      this.draft(env, { markers: [p] });
      return null;
    }
    return this.finish(env, Math.hypot(p[0] - this.centre[0], p[1] - this.centre[1]));
  }
  protected preview(env: ToolEnv, p: Point) {
    if (!this.centre) return;
    const r = Math.hypot(p[0] - this.centre[0], p[1] - this.centre[1]);
    if (r > 0) this.draft(env, { shape: { id: '~draft', type: 'circle', center: this.centre, radius: r }, markers: [this.centre], chain: [this.centre, p] });
  }
  override expects(): EntryExpectation {
    return this.centre ? 'number-or-point' : 'point';
  }
  override typed(env: ToolEnv, input: PointInput) {
    const r = resolveRadius(input);
    if (r) {
      if (!this.centre) return `Type the centre first as “${HINT.firstPoint}”.`;
      return 'error' in r ? r.error : this.finish(env, r.r);
    }
    return super.typed(env, input);
  }
}

function CircleFields({ shape }: { shape: CircleShape }) {
  const e = useShapeEdit(shape);
  return (
    <>
      <PointFields label="Centre" p={shape.center} field="center" units={e.units} onPoint={(p) => e.set((s) => ({ ...s, center: p }))} />
      <NumberField label="Radius" value={shape.radius} field="radius" suffix={e.units} onCommit={(v) => e.set((s) => ({ ...s, radius: v }))} />
      {/* Drawings give holes by diameter (Ø): the same circle, either way. */}
      <NumberField label="Diameter Ø" value={2 * shape.radius} field="diameter" suffix={e.units} onCommit={(v) => e.set((s) => ({ ...s, radius: v / 2 }))} />
    </>
  );
}

export const circleEditor: ShapeEditor<CircleShape> = {
  types: ['circle'],
  handles: (s) => [
    { ref: { kind: 'centre' }, p: s.center },
    { ref: { kind: 'radius' }, p: [s.center[0] + s.radius, s.center[1]] },
  ],
  moveHandle: (s, ref, p) => {
    if (ref.kind === 'centre') return { ...s, center: p };
    if (ref.kind === 'radius') return { ...s, radius: Math.hypot(p[0] - s.center[0], p[1] - s.center[1]) };
    return s;
  },
  Fields: CircleFields,
  tools: [{ id: 'circle', label: 'Circle', key: 'c', inDrawGroup: true, create: () => new CircleTool() }],
};
