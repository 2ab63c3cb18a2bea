/**
 * The camera: panning with the middle button or Space + drag, and zooming with the wheel about
 * the pointer. It only moves the view (scale and origin), never the document.
 */
import type { EditorStore } from '../store/store';
import { zoomAt } from '../view';

export interface Pan {
  sx: number;
  sy: number;
  ox: number;
  oy: number;
}

export function startPan(store: EditorStore, sx: number, sy: number): Pan {
  const s = store.getState();
  return { sx, sy, ox: s.ox, oy: s.oy };
}

export function dragPan(store: EditorStore, pan: Pan, sx: number, sy: number): void {
  store.setState({ ox: pan.ox + sx - pan.sx, oy: pan.oy + sy - pan.sy });
}

/** Zoom by a wheel event at (sx, sy): lines (deltaMode 1) and pixels scroll at different rates. */
export function wheelZoom(store: EditorStore, sx: number, sy: number, deltaY: number, deltaMode: number): void {
  const factor = Math.exp(-deltaY * (deltaMode === 1 ? 0.05 : 0.0015));
  store.setState(zoomAt(store.getState(), sx, sy, factor));
}
