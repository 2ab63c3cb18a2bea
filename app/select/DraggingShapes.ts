/**
 * Moving the selection: previews every pointer move, records one undo step on release.
 * A vertex of the moving shapes that comes within the snap radius of another shape's snap
 * point (vertex, midpoint, centre, intersection) pulls the move onto it; otherwise the move goes
 * in whole grid steps when the grid snap is on.
 */
import { regionSegments, translateShape, type Point, type SectionDocument } from '../../src';
import { roundTo, snapPoints, SNAP_RADIUS_PX, type SnapKind, type SnapPoint } from '../geometry/snap';
import { cancelGesture, endGesture, previewGesture } from '../store/history';
import { gridStep } from '../view';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { IDLE, type Next, type SelectState } from './state';
import { activeShapes, withActiveShapes } from '../store/section';

export class DraggingShapes implements SelectState {
  readonly name = 'draggingShapes';
  private anchors: Point[] | null = null;
  private fixed: SnapPoint[] | null = null;
  constructor(
    private readonly start: Point,
    private readonly base: SectionDocument,
    private readonly ids: ReadonlySet<string>,
  ) {}

  /** The moving shapes' vertices and arc midpoints (before the move). */
  private movingPoints(env: ToolEnv): Point[] {
    if (!this.anchors) {
      this.anchors = [];
      for (const r of env.results.shapesOf(this.base)) {
        if (!this.ids.has(r.id)) continue;
        for (const g of regionSegments(r.region)) this.anchors.push([g.ax, g.ay]);
      }
    }
    return this.anchors;
  }

  /** The smallest correction that puts a moving vertex on a fixed snap point, or null. */
  private pull(env: ToolEnv, dx: number, dy: number): { dx: number; dy: number; at: Point; kind: SnapKind } | null {
    const s = env.store.getState();
    const g = s.snap;
    if (!(g.vertex || g.midpoint || g.centre || g.intersection)) return null;
    const r = SNAP_RADIUS_PX / s.scale;
    const fixed = (this.fixed ??= snapPoints(env.results.shapesOf(this.base), g.intersection).filter(
      (p) => !this.ids.has(p.shape) && (p.kind === 'vertex' ? g.vertex : p.kind === 'midpoint' ? g.midpoint : p.kind === 'centre' ? g.centre : g.intersection),
    ));
    let best: { dx: number; dy: number; at: Point; kind: SnapKind; d: number } | null = null;
    for (const [ax, ay] of this.movingPoints(env)) {
      const mx = ax + dx, my = ay + dy;
      for (const p of fixed) {
        const d = Math.hypot(p.x - mx, p.y - my);
        if (d <= r && (!best || d < best.d)) best = { dx: p.x - ax, dy: p.y - ay, at: [p.x, p.y], kind: p.kind, d };
      }
    }
    return best;
  }

  move(env: ToolEnv, e: PointerInfo): Next {
    const s = env.store.getState();
    let dx = e.raw[0] - this.start[0], dy = e.raw[1] - this.start[1];
    const ortho = e.shift || s.snap.ortho;
    const pulled = ortho ? null : this.pull(env, dx, dy);
    if (pulled) {
      dx = pulled.dx;
      dy = pulled.dy;
      env.transient.setState({ snap: { p: pulled.at, kind: pulled.kind, ortho: false } });
    } else {
      env.transient.setState({ snap: null });
      if (s.snap.grid) {
        // Moves go in whole grid steps, so a shape on the grid stays on it.
        const { minor } = gridStep(s.scale);
        dx = roundTo(dx, minor);
        dy = roundTo(dy, minor);
      }
      if (ortho) {
        if (Math.abs(dx) >= Math.abs(dy)) dy = 0;
        else dx = 0;
      }
    }
    const shapes = activeShapes(this.base).map((sh) => (this.ids.has(sh.id) ? translateShape(sh, dx, dy) : sh));
    previewGesture(env.store, withActiveShapes(this.base, shapes));
    return this;
  }
  up(env: ToolEnv): Next {
    env.transient.setState({ snap: null });
    endGesture(env.store);
    return IDLE;
  }
  cancel(env: ToolEnv): void {
    env.transient.setState({ snap: null });
    cancelGesture(env.store);
  }
}
