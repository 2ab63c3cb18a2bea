/**
 * The select tool: click to select (Shift adds or removes), drag a shape to move the selection,
 * drag a handle to edit a point, drag on empty canvas for a selection box. Moves preview live
 * and record one undo step when the pointer is released.
 */
import { regionBounds, validateShape, formatIssue, type Point, type SectionDocument } from '../../src';
import { pickShape } from '../canvas/geometry';
import { roundTo } from '../canvas/snap';
import { beginGesture, cancelGesture, endGesture, previewGesture } from '../store/history';
import { moveHandle, shapeHandles, translateShape, type HandleRef } from '../shapes';
import { gridStep } from '../view';
import type { PointInput } from '../expr';
import type { PointerInfo, Tool, ToolEnv } from './types';

const HANDLE_PX = 7;
const DRAG_PX = 3;

type State =
  | { name: 'idle' }
  | { name: 'pressShape'; at: [number, number]; start: Point; base: SectionDocument }
  | { name: 'dragShapes'; start: Point; base: SectionDocument; ids: Set<string> }
  | { name: 'dragHandle'; id: string; ref: HandleRef; base: SectionDocument }
  | { name: 'box'; start: Point; additive: boolean };

/** Index of the handle of the single selected shape under (sx, sy), or -1. */
export function handleUnder(env: ToolEnv, sx: number, sy: number): number {
  const s = env.store.getState();
  if (s.selected.length !== 1) return -1;
  const shape = s.doc.shapes.find((x) => x.id === s.selected[0]);
  if (!shape) return -1;
  const hs = shapeHandles(shape);
  let best = -1, bd = HANDLE_PX;
  hs.forEach((h, i) => {
    const d = Math.hypot(s.ox + h.p[0] * s.scale - sx, s.oy - h.p[1] * s.scale - sy);
    if (d <= bd) {
      bd = d;
      best = i;
    }
  });
  return best;
}

export class SelectTool implements Tool {
  readonly id = 'select' as const;
  private state: State = { name: 'idle' };

  prompt() {
    return 'Select: click a shape, drag to move it, drag on empty space to select by box; arrows move by a fixed step';
  }
  busy() {
    return this.state.name !== 'idle';
  }
  reset(env: ToolEnv) {
    if (this.state.name === 'dragShapes' || this.state.name === 'dragHandle') cancelGesture(env.store);
    this.state = { name: 'idle' };
    env.transient.setState({ draft: null });
  }

  down(env: ToolEnv, e: PointerInfo) {
    const s = env.store.getState();
    const h = handleUnder(env, e.sx, e.sy);
    if (h >= 0) {
      const shape = s.doc.shapes.find((x) => x.id === s.selected[0])!;
      beginGesture(env.store);
      this.state = { name: 'dragHandle', id: shape.id, ref: shapeHandles(shape)[h].ref, base: s.doc };
      return;
    }
    const tol = 0.5 / s.scale;
    const id = pickShape(env.results.shapesOf(s.doc), e.raw[0], e.raw[1], tol, 4 / s.scale);
    if (id) {
      let selected = s.selected;
      if (e.shift) selected = selected.includes(id) ? selected.filter((x) => x !== id) : [...selected, id];
      else if (!selected.includes(id)) selected = [id];
      env.store.setState({ selected });
      if (selected.includes(id)) this.state = { name: 'pressShape', at: [e.sx, e.sy], start: e.raw, base: s.doc };
      return;
    }
    if (!e.shift) env.store.setState({ selected: [] });
    this.state = { name: 'box', start: e.raw, additive: e.shift };
  }

  move(env: ToolEnv, e: PointerInfo) {
    const st = this.state;
    const s = env.store.getState();
    if (st.name === 'idle') {
      const h = handleUnder(env, e.sx, e.sy);
      env.transient.setState({ hoverHandle: h >= 0 ? h : null });
      return;
    }
    if (st.name === 'pressShape') {
      if (Math.hypot(e.sx - st.at[0], e.sy - st.at[1]) < DRAG_PX) return;
      beginGesture(env.store);
      this.state = { name: 'dragShapes', start: st.start, base: st.base, ids: new Set(s.selected) };
    }
    const cur = this.state;
    if (cur.name === 'dragShapes') {
      let dx = e.raw[0] - cur.start[0], dy = e.raw[1] - cur.start[1];
      if (s.snap.grid) {
        const { minor } = gridStep(s.scale);
        dx = roundTo(dx, minor);
        dy = roundTo(dy, minor);
      }
      if (e.shift || s.snap.ortho) {
        if (Math.abs(dx) >= Math.abs(dy)) dy = 0;
        else dx = 0;
      }
      const shapes = cur.base.shapes.map((sh) => (cur.ids.has(sh.id) ? translateShape(sh, dx, dy) : sh));
      previewGesture(env.store, { ...cur.base, shapes });
    } else if (cur.name === 'dragHandle') {
      const p = env.snap(e.raw, { exclude: new Set([cur.id]) }).p;
      const shapes = cur.base.shapes.map((sh) => (sh.id === cur.id ? moveHandle(sh, cur.ref, p) : sh));
      previewGesture(env.store, { ...cur.base, shapes });
    } else if (cur.name === 'box') {
      env.transient.setState({ draft: { box: [cur.start, e.raw] } });
    }
  }

  up(env: ToolEnv, e: PointerInfo) {
    const st = this.state;
    this.state = { name: 'idle' };
    if (st.name === 'dragShapes') endGesture(env.store);
    else if (st.name === 'dragHandle') {
      const s = env.store.getState();
      const idx = s.doc.shapes.findIndex((x) => x.id === st.id);
      const issues = idx >= 0 ? validateShape(s.doc.shapes[idx], `shapes[${idx}]`) : [];
      if (issues.length) {
        cancelGesture(env.store);
        env.message(`Point not moved: ${issues.map(formatIssue).join('; ')}`);
      } else endGesture(env.store);
    } else if (st.name === 'box') {
      env.transient.setState({ draft: null });
      const s = env.store.getState();
      const x0 = Math.min(st.start[0], e.raw[0]), x1 = Math.max(st.start[0], e.raw[0]);
      const y0 = Math.min(st.start[1], e.raw[1]), y1 = Math.max(st.start[1], e.raw[1]);
      if ((x1 - x0) * s.scale < DRAG_PX && (y1 - y0) * s.scale < DRAG_PX) return;
      const inside = env.results
        .shapesOf(s.doc)
        .filter((r) => {
          const b = regionBounds(r.region);
          return b && b.xmin >= x0 && b.xmax <= x1 && b.ymin >= y0 && b.ymax <= y1;
        })
        .map((r) => r.id);
      const selected = st.additive ? [...new Set([...s.selected, ...inside])] : inside;
      env.store.setState({ selected });
    }
  }

  key(env: ToolEnv, key: string) {
    if (key === 'escape') {
      if (this.state.name !== 'idle') this.reset(env);
      else env.store.setState({ selected: [] });
      return true;
    }
    return false;
  }

  typed(env: ToolEnv, input: PointInput): string | null {
    // With a selection, "@dx, dy" or "length<angle" moves it.
    const s = env.store.getState();
    if (!s.selected.length) return 'Select a shape first, or pick a drawing tool.';
    let dx: number, dy: number;
    if (input.kind === 'rel') [dx, dy] = [input.dx, input.dy];
    else if (input.kind === 'polar') {
      const t = (input.angleDeg * Math.PI) / 180;
      [dx, dy] = [input.length * Math.cos(t), input.length * Math.sin(t)];
    } else return 'Type a move as "@dx, dy" or "length<angle".';
    const sel = new Set(s.selected);
    const shapes = s.doc.shapes.map((sh) => (sel.has(sh.id) ? translateShape(sh, dx, dy) : sh));
    beginGesture(env.store);
    previewGesture(env.store, { ...s.doc, shapes });
    endGesture(env.store);
    return null;
  }
}
