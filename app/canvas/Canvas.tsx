/**
 * The drawing canvas (react-konva): the stage, its layers, and the pointer. World y is up; every
 * layer paints in screen space from the view transform (app/view.ts). Pointer input goes to the
 * camera (pan, zoom) or to the active tool; the layers live in `layers/`, one per thing drawn.
 */
import { useEffect, useRef } from 'react';
import { Layer, Stage } from 'react-konva';
import { useEditor, useEditorShallow, useEditorState } from '../context';
import { nearCutLine } from '../select/DraggingCut';
import { toWorld } from '../view';
import { dragPan, startPan, wheelZoom, type Pan } from './camera';
import { GridLayer } from './layers/Grid';
import { InteractionLayer } from './layers/Interaction';
import { OverlayLayer } from './layers/Overlays';
import { ProblemLayer } from './layers/Problems';
import { ShapesLayer } from './layers/Shapes';
import { WeldLayer } from './layers/Welds';
import { MaterialsLayer } from './layers/Materials';
import { StressMapLayer, StressMarksLayer } from './layers/Stress';
import { KernLayer } from './layers/Kern';
import { GravityLayer } from './layers/Gravity';
import { BaselineLayer } from './layers/Baseline';
import { CautionMarksLayer } from './layers/CautionMarks';
import { NetLinesLayer } from './layers/NetLines';
import { TorsionLayer } from './layers/Torsion';
import { StressLegend } from './StressLegend';

function isField(t: EventTarget | null): boolean {
  return t instanceof HTMLInputElement || t instanceof HTMLTextAreaElement || t instanceof HTMLSelectElement;
}

export function Canvas() {
  const editor = useEditor();
  const wrap = useRef<HTMLDivElement>(null);
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const tool = useEditorState((s) => s.tool);
  const pan = useRef<Pan | null>(null);
  const space = useRef(false);

  useEffect(() => {
    const el = wrap.current!;
    const ro = new ResizeObserver(() => {
      const r = el.getBoundingClientRect();
      editor.store.setState({ width: Math.max(1, Math.floor(r.width)), height: Math.max(1, Math.floor(r.height)) });
    });
    ro.observe(el);
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const r = el.getBoundingClientRect();
      wheelZoom(editor.store, e.clientX - r.left, e.clientY - r.top, e.deltaY, e.deltaMode);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    const kd = (e: KeyboardEvent) => {
      if (e.key === ' ' && !isField(e.target)) {
        space.current = true;
        e.preventDefault();
      }
    };
    const ku = (e: KeyboardEvent) => {
      if (e.key === ' ') space.current = false;
    };
    window.addEventListener('keydown', kd);
    window.addEventListener('keyup', ku);
    return () => {
      ro.disconnect();
      el.removeEventListener('wheel', onWheel);
      window.removeEventListener('keydown', kd);
      window.removeEventListener('keyup', ku);
    };
  }, [editor]);

  const info = (e: React.PointerEvent) => {
    const r = wrap.current!.getBoundingClientRect();
    const sx = e.clientX - r.left, sy = e.clientY - r.top;
    return { sx, sy, raw: toWorld(editor.store.getState(), sx, sy), shift: e.shiftKey, mod: e.ctrlKey || e.metaKey };
  };

  return (
    <div
      ref={wrap}
      className={`canvas tool-${tool}`}
      data-testid="canvas"
      tabIndex={0}
      onContextMenu={(e) => e.preventDefault()}
      onPointerDown={(e) => {
        wrap.current!.focus();
        wrap.current!.setPointerCapture(e.pointerId);
        const i = info(e);
        if (e.button === 1 || (e.button === 0 && space.current)) {
          pan.current = startPan(editor.store, i.sx, i.sy);
          e.preventDefault();
          return;
        }
        if (e.button === 0) editor.tool().down(editor.env, i);
      }}
      onPointerMove={(e) => {
        const i = info(e);
        if (pan.current) return dragPan(editor.store, pan.current, i.sx, i.sy);
        const s = editor.store.getState();
        editor.transient.setState({ pointer: i.raw, snap: null });
        if (s.tool === 'select') wrap.current!.style.cursor = nearCutLine(s, i.sx, i.sy) ? (s.cutAxis === 'x' ? 'ew-resize' : 'ns-resize') : '';
        editor.tool().move(editor.env, i);
      }}
      onPointerUp={(e) => {
        if (pan.current) {
          pan.current = null;
          return;
        }
        if (e.button === 0) editor.tool().up(editor.env, info(e));
      }}
      onPointerLeave={() => editor.transient.setState({ pointer: null, snap: null })}
    >
      <Stage width={width} height={height} listening={false}>
        <GridLayer />
        {/* One layer (one canvas) for everything that changes during a drag: software
            compositing copies each changed canvas every frame. */}
        <Layer listening={false}>
          <BaselineLayer />
          <ShapesLayer />
          <MaterialsLayer />
          <StressMapLayer />
          <TorsionLayer />
          <OverlayLayer />
          <WeldLayer />
          <KernLayer />
          <GravityLayer />
          <StressMarksLayer />
          <NetLinesLayer />
          <CautionMarksLayer />
          <ProblemLayer />
          <InteractionLayer />
        </Layer>
      </Stage>
      <StressLegend />
    </div>
  );
}
