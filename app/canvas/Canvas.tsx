/**
 * The drawing canvas (react-konva). World y is up; every node paints in screen space from the
 * view transform. Pointer input is read on the wrapper element and handed to the active tool;
 * the middle button or Space+drag pans, the wheel zooms about the pointer.
 */
import { memo, useEffect, useRef } from 'react';
import { Layer, Stage } from 'react-konva';
import { shapeToRegion, formatNumber, formatProperty, PROPERTY_CATALOG, type Evaluation, type Op, type Region, type SectionProperties, type Units } from '../../src';
import { useEditor, useEditorShallow, useEditorState, useResults, useTransient } from '../store/hooks';
import { shapeHandles } from '../shapes';
import { gridStep, toWorld, zoomAt, type ViewTransform } from '../view';
import type { Draft } from '../tools/types';
import type { SnapResult } from './snap';
import { ProblemLayer } from './ProblemLayer';
import { INK, hatch, opStyle, traceRegion } from './paint';
import { cutSection } from '../../src';
import { Paint } from './PaintNode';


const THETA = PROPERTY_CATALOG.find((i) => i.key === 'theta')!;

/** Text on a pale plate so it reads over hatching and grid. */
function label(ctx: CanvasRenderingContext2D, text: string, x: number, y: number, color: string) {
  ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
  const w = ctx.measureText(text).width;
  ctx.fillStyle = 'rgba(245, 244, 239, 0.88)';
  ctx.fillRect(x - 3, y - 11, w + 6, 15);
  ctx.fillStyle = color;
  ctx.fillText(text, x, y);
}

const GridNode = memo(function GridNode({ v, width, height, units }: { v: ViewTransform; width: number; height: number; units: Units }) {
  return (
    <Paint
      paint={(ctx) => {
        ctx.fillStyle = INK.paper;
        ctx.fillRect(0, 0, width, height);
        const { minor, major } = gridStep(v.scale);
        const [x0, y1] = toWorld(v, 0, 0);
        const [x1, y0] = toWorld(v, width, height);
        const lines = (step: number, style: string) => {
          ctx.beginPath();
          for (let x = Math.ceil(x0 / step) * step; x <= x1; x += step) {
            const sx = Math.round(v.ox + x * v.scale) + 0.5;
            ctx.moveTo(sx, 0);
            ctx.lineTo(sx, height);
          }
          for (let y = Math.ceil(y0 / step) * step; y <= y1; y += step) {
            const sy = Math.round(v.oy - y * v.scale) + 0.5;
            ctx.moveTo(0, sy);
            ctx.lineTo(width, sy);
          }
          ctx.strokeStyle = style;
          ctx.lineWidth = 1;
          ctx.stroke();
        };
        if ((x1 - x0) / minor < 400) lines(minor, INK.gridMinor);
        lines(major, INK.gridMajor);
        // Axes through the origin, with arrows and names.
        ctx.strokeStyle = INK.axis;
        ctx.lineWidth = 1.25;
        ctx.beginPath();
        const ax = Math.round(v.ox) + 0.5, ay = Math.round(v.oy) + 0.5;
        ctx.moveTo(0, ay);
        ctx.lineTo(width, ay);
        ctx.moveTo(ax, 0);
        ctx.lineTo(ax, height);
        ctx.stroke();
        ctx.fillStyle = INK.axisText;
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        // Major tick labels along the edges (values in document units).
        const labelY = Math.min(Math.max(ay + 13, 14), height - 4);
        const labelX = Math.min(Math.max(ax + 4, 4), width - 40);
        ctx.textBaseline = 'alphabetic';
        for (let x = Math.ceil(x0 / major) * major; x <= x1; x += major) {
          if (Math.abs(x) < major / 2) continue;
          ctx.fillText(formatNumber(x, 6), v.ox + x * v.scale + 3, labelY);
        }
        for (let y = Math.ceil(y0 / major) * major; y <= y1; y += major) {
          if (Math.abs(y) < major / 2) continue;
          ctx.fillText(formatNumber(y, 6), labelX, v.oy - y * v.scale - 3);
        }
        ctx.font = 'italic 12px ui-serif, Georgia, serif';
        ctx.fillText('x', width - 14, ay - 5);
        ctx.fillText('y', ax + 5, 13);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        ctx.fillText(`grid ${formatNumber(minor, 3)} ${units}`, 8, height - 8);
      }}
    />
  );
});

/** Paint one shape's own outline, hatched by its operation. */
function paintShape(ctx: CanvasRenderingContext2D, region: Region, op: Op, v: ViewTransform, error: boolean) {
  const st = opStyle(op);
  ctx.beginPath();
  traceRegion(ctx, region, v);
  if (st.fill !== 'none') {
    ctx.fillStyle = hatch(ctx, st.fill);
    ctx.fill('evenodd');
  }
  ctx.setLineDash(st.dash);
  ctx.strokeStyle = error ? INK.error : st.line;
  ctx.lineWidth = 1;
  ctx.stroke();
  ctx.setLineDash([]);
}

/**
 * The section: the combined result's fill, every shape's own outline (drawn from the current
 * document, so a dragged shape follows the pointer at once), then the result's outline. One
 * Konva node for all of it: the layer repaints as a whole anyway, and one node keeps the
 * reconciler's work per pointer move constant.
 */
function ShapesLayer() {
  const editor = useEditor();
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  // The combined section may trail a drag by an evaluation; each shape's own outline does not.
  const region = useResults((r) => r.evaluation.region);
  const doc = useEditorState((s) => s.doc);
  const shapes = editor.results.shapesOf(doc);
  return (
    <Paint
      paint={(ctx) => {
        ctx.beginPath();
        traceRegion(ctx, region, v);
        ctx.fillStyle = INK.resultFill;
        ctx.fill('nonzero');
        shapes.forEach((s, i) => paintShape(ctx, s.region, doc.shapes[i]?.op ?? 'add', v, !!s.error));
        ctx.beginPath();
        traceRegion(ctx, region, v);
        ctx.strokeStyle = INK.resultLine;
        ctx.lineWidth = 1.6;
        ctx.lineJoin = 'round';
        ctx.stroke();
      }}
    />
  );
}

/** The grid has a layer of its own: it repaints only when the view changes. */
function GridLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const units = useEditorState((s) => s.doc.units);
  return (
    <Layer listening={false}>
      <GridNode v={v} width={width} height={height} units={units} />
    </Layer>
  );
}

function OverlayLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const overlays = useEditorState((s) => s.overlays);
  const cutAt = useEditorState((s) => s.cutAt);
  const cutAxis = useEditorState((s) => s.cutAxis);
  const units = useEditorState((s) => s.doc.units);
  const ev = useResults((r) => r.evaluation);
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const p = ev.props;
  if (!p) return null;
  return (
    <>
      {overlays.cut && cutAt !== null && <CutNode ev={ev} p={p} axis={cutAxis} at={cutAt} v={v} units={units} width={width} height={height} />}
      {overlays.fibres && <FibreNode p={p} v={v} units={units} />}
      {overlays.principal && <PrincipalNode p={p} v={v} />}
      {overlays.centroid && <CentroidNode p={p} v={v} />}
    </>
  );
}

function CentroidNode({ p, v }: { p: SectionProperties; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const x = v.ox + p.centroid.x * v.scale, y = v.oy - p.centroid.y * v.scale;
        ctx.strokeStyle = INK.centroid;
        ctx.fillStyle = INK.centroid;
        ctx.lineWidth = 1.2;
        ctx.beginPath();
        ctx.arc(x, y, 6, 0, 2 * Math.PI);
        ctx.stroke();
        // Two opposite quarters filled: reads as a centre of area at any zoom.
        ctx.beginPath();
        ctx.moveTo(x, y);
        ctx.arc(x, y, 6, -Math.PI / 2, 0);
        ctx.closePath();
        ctx.moveTo(x, y);
        ctx.arc(x, y, 6, Math.PI / 2, Math.PI);
        ctx.closePath();
        ctx.fill();
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        ctx.fillText('C', x + 8, y - 7);
      }}
    />
  );
}

function PrincipalNode({ p, v }: { p: SectionProperties; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const b = p.bounds;
        const L = 0.6 * Math.hypot(b.xmax - b.xmin, b.ymax - b.ymin) * v.scale + 20;
        const x = v.ox + p.centroid.x * v.scale, y = v.oy - p.centroid.y * v.scale;
        const t = (p.theta * Math.PI) / 180;
        ctx.strokeStyle = INK.principal;
        ctx.fillStyle = INK.principal;
        ctx.lineWidth = 1;
        ctx.setLineDash([10, 3, 2, 3]);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        for (const [ang, name] of [[t, '1'], [t + Math.PI / 2, '2']] as const) {
          const dx = Math.cos(ang) * L, dy = -Math.sin(ang) * L;
          ctx.beginPath();
          ctx.moveTo(x - dx, y - dy);
          ctx.lineTo(x + dx, y + dy);
          ctx.stroke();
          ctx.fillText(name, x + dx + 4, y + dy - 4);
        }
        ctx.setLineDash([]);
        ctx.fillText(`θ = ${formatProperty(THETA, p, 'mm').text}°`, x + 10, y + 16);
      }}
    />
  );
}

function FibreNode({ p, v, units }: { p: SectionProperties; v: ViewTransform; units: Units }) {
  return (
    <Paint
      paint={(ctx) => {
        const b = p.bounds;
        const X = (x: number) => v.ox + x * v.scale, Y = (y: number) => v.oy - y * v.scale;
        ctx.strokeStyle = INK.fibre;
        ctx.fillStyle = INK.fibre;
        ctx.lineWidth = 1;
        ctx.setLineDash([4, 3]);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        const pad = 24;
        ctx.beginPath();
        for (const y of [b.ymax, b.ymin]) {
          ctx.moveTo(X(b.xmin) - pad, Y(y));
          ctx.lineTo(X(b.xmax) + pad, Y(y));
        }
        for (const x of [b.xmin, b.xmax]) {
          ctx.moveTo(X(x), Y(b.ymax) - pad);
          ctx.lineTo(X(x), Y(b.ymin) + pad);
        }
        ctx.stroke();
        ctx.setLineDash([]);
        const f = (n: number) => `${formatNumber(n, 4)} ${units}`;
        label(ctx, `c top ${f(p.fibres.top)}`, X(b.xmax) + pad + 4, Y(b.ymax) + 4, INK.fibre);
        label(ctx, `c bottom ${f(p.fibres.bottom)}`, X(b.xmax) + pad + 4, Y(b.ymin) + 4, INK.fibre);
        const left = `c left ${f(p.fibres.left)}`;
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        label(ctx, left, X(b.xmin) - ctx.measureText(left).width - 6, Y(b.ymax) - pad - 4, INK.fibre);
        label(ctx, `c right ${f(p.fibres.right)}`, X(b.xmax) + 6, Y(b.ymax) - pad - 4, INK.fibre);
      }}
    />
  );
}

/**
 * The cut line: the part beyond it (above a horizontal cut, right of a vertical one) is shaded,
 * with a grip at the line's start and the readout beside it.
 */
function CutNode({ ev, p, axis, at, v, units, width, height }: { ev: Evaluation; p: SectionProperties; axis: 'x' | 'y'; at: number; v: ViewTransform; units: Units; width: number; height: number }) {
  let cut: ReturnType<typeof cutSection> | null;
  try {
    cut = cutSection(ev.region, axis, at, p);
  } catch {
    cut = null;
  }
  const vertical = axis === 'x';
  return (
    <Paint
      paint={(ctx) => {
        const s = vertical ? v.ox + at * v.scale : v.oy - at * v.scale;
        ctx.save();
        ctx.beginPath();
        if (vertical) ctx.rect(s, 0, Math.max(0, width - s), height);
        else ctx.rect(0, 0, width, s);
        ctx.clip();
        ctx.beginPath();
        traceRegion(ctx, ev.region, v);
        ctx.fillStyle = INK.cutFill;
        ctx.fill('nonzero');
        ctx.restore();
        ctx.strokeStyle = INK.cut;
        ctx.lineWidth = 1.5;
        ctx.beginPath();
        if (vertical) {
          ctx.moveTo(s, 0);
          ctx.lineTo(s, height);
        } else {
          ctx.moveTo(0, s);
          ctx.lineTo(width, s);
        }
        ctx.stroke();
        ctx.fillStyle = INK.cut;
        if (vertical) ctx.fillRect(s - 5, 6, 10, 10);
        else ctx.fillRect(6, s - 5, 10, 10);
        if (cut) {
          const t = `cut ${axis} = ${formatNumber(at, 5)}   b = ${formatNumber(cut.width, 5)} ${units}   Q = ${formatNumber(cut.Q, 5)} ${units}³   A ${vertical ? 'right' : 'above'} = ${formatNumber(cut.area, 5)} ${units}²`;
          if (vertical) label(ctx, t, s + 8, 30, INK.cut);
          else label(ctx, t, 24, s - 7, INK.cut);
        }
      }}
    />
  );
}

function DraftNode({ draft, v }: { draft: Draft; v: ViewTransform }) {
  let region: Region | null = null;
  if (draft.shape) {
    try {
      region = shapeToRegion(draft.shape);
    } catch {
      // a half-drawn outline that is not valid yet: show only its points
    }
  }
  return (
    <Paint
      paint={(ctx) => {
        const X = (x: number) => v.ox + x * v.scale, Y = (y: number) => v.oy - y * v.scale;
        ctx.strokeStyle = INK.draft;
        ctx.lineWidth = 1.25;
        if (region) {
          ctx.beginPath();
          traceRegion(ctx, region, v);
          ctx.fillStyle = 'rgba(44, 92, 197, 0.08)';
          ctx.fill();
          ctx.setLineDash([6, 4]);
          ctx.stroke();
          ctx.setLineDash([]);
        }
        if (draft.chain && draft.chain.length > 1) {
          ctx.beginPath();
          ctx.moveTo(X(draft.chain[0][0]), Y(draft.chain[0][1]));
          for (const q of draft.chain.slice(1)) ctx.lineTo(X(q[0]), Y(q[1]));
          ctx.stroke();
          if (draft.closing) {
            const a = draft.chain[draft.chain.length - 1], b = draft.chain[0];
            ctx.setLineDash([3, 4]);
            ctx.beginPath();
            ctx.moveTo(X(a[0]), Y(a[1]));
            ctx.lineTo(X(b[0]), Y(b[1]));
            ctx.stroke();
            ctx.setLineDash([]);
          }
        }
        for (const m of draft.markers ?? []) {
          ctx.fillStyle = '#fff';
          ctx.fillRect(X(m[0]) - 3.5, Y(m[1]) - 3.5, 7, 7);
          ctx.strokeRect(X(m[0]) - 3.5, Y(m[1]) - 3.5, 7, 7);
        }
        if (draft.box) {
          const [a, b] = draft.box;
          ctx.setLineDash([4, 3]);
          ctx.fillStyle = 'rgba(44, 92, 197, 0.06)';
          const x = Math.min(X(a[0]), X(b[0])), y = Math.min(Y(a[1]), Y(b[1]));
          const w = Math.abs(X(a[0]) - X(b[0])), h = Math.abs(Y(a[1]) - Y(b[1]));
          ctx.fillRect(x, y, w, h);
          ctx.strokeRect(x, y, w, h);
        }
      }}
    />
  );
}

const SNAP_LABEL: Record<SnapResult['kind'], string> = {
  vertex: 'vertex',
  midpoint: 'midpoint',
  centre: 'centre',
  intersection: 'intersection',
  grid: '',
  free: '',
};

function SnapNode({ snap, v }: { snap: SnapResult; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const x = v.ox + snap.p[0] * v.scale, y = v.oy - snap.p[1] * v.scale;
        ctx.strokeStyle = INK.snap;
        ctx.fillStyle = INK.snap;
        ctx.lineWidth = 1.5;
        ctx.beginPath();
        switch (snap.kind) {
          case 'vertex':
            ctx.rect(x - 5, y - 5, 10, 10);
            break;
          case 'midpoint':
            ctx.moveTo(x, y - 6);
            ctx.lineTo(x + 6, y + 4);
            ctx.lineTo(x - 6, y + 4);
            ctx.closePath();
            break;
          case 'centre':
            ctx.arc(x, y, 5.5, 0, 2 * Math.PI);
            break;
          case 'intersection':
            ctx.moveTo(x - 5, y - 5);
            ctx.lineTo(x + 5, y + 5);
            ctx.moveTo(x + 5, y - 5);
            ctx.lineTo(x - 5, y + 5);
            break;
          default:
            ctx.moveTo(x - 4, y);
            ctx.lineTo(x + 4, y);
            ctx.moveTo(x, y - 4);
            ctx.lineTo(x, y + 4);
        }
        ctx.stroke();
        const label = SNAP_LABEL[snap.kind] + (snap.ortho ? (SNAP_LABEL[snap.kind] ? ' · ortho' : 'ortho') : '');
        if (label) {
          ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
          ctx.fillText(label, x + 9, y + 15);
        }
      }}
    />
  );
}

function SelectionNode({ v }: { v: ViewTransform }) {
  const editor = useEditor();
  const selected = useEditorState((s) => s.selected);
  const doc = useEditorState((s) => s.doc);
  const hover = useTransient((t) => t.hoverHandle);
  const sel = new Set(selected);
  const regions = editor.results.shapesOf(doc).filter((s) => sel.has(s.id)).map((s) => s.region);
  const single = selected.length === 1 ? doc.shapes.find((s) => s.id === selected[0]) : undefined;
  const handles = single ? shapeHandles(single) : [];
  return (
    <Paint
      paint={(ctx) => {
        ctx.strokeStyle = INK.selection;
        ctx.lineWidth = 2;
        for (const r of regions) {
          ctx.beginPath();
          traceRegion(ctx, r, v);
          ctx.stroke();
        }
        ctx.lineWidth = 1.25;
        handles.forEach((h, i) => {
          const x = v.ox + h.p[0] * v.scale, y = v.oy - h.p[1] * v.scale;
          const s = i === hover ? 5.5 : 4;
          ctx.fillStyle = i === hover ? INK.selection : '#ffffff';
          ctx.beginPath();
          if (h.ref.kind === 'via' || h.ref.kind === 'radius') {
            ctx.moveTo(x, y - s - 1);
            ctx.lineTo(x + s + 1, y);
            ctx.lineTo(x, y + s + 1);
            ctx.lineTo(x - s - 1, y);
            ctx.closePath();
          } else ctx.rect(x - s, y - s, 2 * s, 2 * s);
          ctx.fill();
          ctx.stroke();
        });
      }}
    />
  );
}

function InteractionLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const draft = useTransient((t) => t.draft);
  const snap = useTransient((t) => t.snap);
  return (
    <>
      <SelectionNode v={v} />
      {draft && <DraftNode draft={draft} v={v} />}
      {snap && <SnapNode snap={snap} v={v} />}
    </>
  );
}

export function Canvas() {
  const editor = useEditor();
  const wrap = useRef<HTMLDivElement>(null);
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const tool = useEditorState((s) => s.tool);
  const pan = useRef<{ sx: number; sy: number; ox: number; oy: number } | null>(null);
  const cutDrag = useRef(false);
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
      const s = editor.store.getState();
      const factor = Math.exp(-e.deltaY * (e.deltaMode === 1 ? 0.05 : 0.0015));
      editor.store.setState(zoomAt(s, e.clientX - r.left, e.clientY - r.top, factor));
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    const kd = (e: KeyboardEvent) => {
      if (e.key === ' ' && !(e.target instanceof HTMLInputElement || e.target instanceof HTMLTextAreaElement || e.target instanceof HTMLSelectElement)) {
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
    const s = editor.store.getState();
    return { sx, sy, raw: toWorld(s, sx, sy), shift: e.shiftKey, mod: e.ctrlKey || e.metaKey };
  };

  const nearCut = (sx: number, sy: number) => {
    const s = editor.store.getState();
    if (!s.overlays.cut || s.cutAt === null) return false;
    return s.cutAxis === 'x' ? Math.abs(s.ox + s.cutAt * s.scale - sx) <= 5 : Math.abs(s.oy - s.cutAt * s.scale - sy) <= 5;
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
        const s = editor.store.getState();
        if (e.button === 1 || (e.button === 0 && space.current)) {
          pan.current = { sx: i.sx, sy: i.sy, ox: s.ox, oy: s.oy };
          e.preventDefault();
          return;
        }
        if (e.button !== 0) return;
        if (s.tool === 'select' && nearCut(i.sx, i.sy)) {
          cutDrag.current = true;
          return;
        }
        editor.tool().down(editor.env, i);
      }}
      onPointerMove={(e) => {
        const i = info(e);
        if (pan.current) {
          const p = pan.current;
          editor.store.setState({ ox: p.ox + i.sx - p.sx, oy: p.oy + i.sy - p.sy });
          return;
        }
        if (cutDrag.current) {
          editor.store.setState({ cutAt: editor.store.getState().cutAxis === 'x' ? i.raw[0] : i.raw[1] });
          return;
        }
        const s = editor.store.getState();
        editor.transient.setState({ pointer: i.raw, snap: null });
        if (s.tool === 'select') wrap.current!.style.cursor = nearCut(i.sx, i.sy) ? (s.cutAxis === 'x' ? 'ew-resize' : 'ns-resize') : '';
        editor.tool().move(editor.env, i);
      }}
      onPointerUp={(e) => {
        if (pan.current) {
          pan.current = null;
          return;
        }
        if (cutDrag.current) {
          cutDrag.current = false;
          return;
        }
        if (e.button !== 0) return;
        editor.tool().up(editor.env, info(e));
      }}
      onPointerLeave={() => editor.transient.setState({ pointer: null, snap: null })}
    >
      <Stage width={width} height={height} listening={false}>
        <GridLayer />
        {/* One layer (one canvas) for everything that changes during a drag: software
            compositing copies each changed canvas every frame. */}
        <Layer listening={false}>
          <ShapesLayer />
          <OverlayLayer />
          <ProblemLayer />
          <InteractionLayer />
        </Layer>
      </Stage>
    </div>
  );
}
