/**
 * The selected shape's numbers and the actions on the selection. Every edit is checked with the
 * engine's validateShape before it is applied; a refused edit changes nothing.
 */
import { useState, type ReactNode } from 'react';
import {
  formatIssue,
  OPS,
  PROFILE_FIELDS,
  shapeToRegion,
  validateShape,
  type Op,
  type PathShape,
  type Point,
  type PolygonShape,
  type ProfileShape,
  type Shape,
} from '../../src';
import { registry } from '../commands/commands';
import { evaluateExpression } from '../expr';
import { commit } from '../store/history';
import { useEditor, useEditorState } from '../store/hooks';
import { isProfile, SHAPE_KIND_LABEL, shapeLabel } from '../shapes';
import {
  pathDeletePoint,
  pathMakeArc,
  pathMakeLine,
  pathSplitSegment,
  polygonDeletePoint,
  polygonInsertAfter,
  type PointEdit,
} from '../shapes/edit-points';
import { NumberField } from './NumberField';
import { CommandButton } from '../ui/CommandButton';

/**
 * Apply `make` to the shape with this id as one undoable step, or return why not. `make` gets the
 * shape's place in the document (`shapes[3]`) for its messages and may refuse with a text.
 */
function useApply() {
  const editor = useEditor();
  return (id: string, make: (s: Shape, at: string) => Shape | string): string | null => {
    const s = editor.store.getState();
    const idx = s.doc.shapes.findIndex((x) => x.id === id);
    if (idx < 0) return 'The shape no longer exists.';
    const cand = make(s.doc.shapes[idx], `shapes[${idx}]`);
    if (typeof cand === 'string') return cand;
    // Enter then blur applies the same value twice: an edit that changes nothing records nothing.
    if (JSON.stringify(cand) === JSON.stringify(s.doc.shapes[idx])) return null;
    const issues = validateShape(cand, `shapes[${idx}]`);
    if (issues.length) return issues.map(formatIssue).join('; ');
    try {
      shapeToRegion(cand);
    } catch (e) {
      return `This value gives no valid outline: ${(e as Error).message}`;
    }
    commit(editor.store, { ...s.doc, shapes: s.doc.shapes.map((x, i) => (i === idx ? cand : x)) });
    return null;
  };
}

const OP_LABEL: Record<Op, string> = { add: 'Add', subtract: 'Subtract', intersect: 'Intersect' };

function PointFields({
  label,
  p,
  onPoint,
  field,
  units,
  tools,
  error,
}: {
  label: string;
  p: Point;
  onPoint: (p: Point) => string | null;
  field: string;
  units: string;
  /** Small buttons beside the label (insert, delete, line/arc). */
  tools?: ReactNode;
  /** A refused point edit on this row. */
  error?: string | null;
}) {
  return (
    <div className="point-fields">
      {tools ? (
        <div className="point-head">
          <span className="point-label">{label}</span>
          <span className="point-tools">{tools}</span>
        </div>
      ) : (
        <span className="point-label">{label}</span>
      )}
      <NumberField label="x" value={p[0]} field={`${field}.x`} suffix={units} onCommit={(v) => onPoint([v, p[1]])} />
      <NumberField label="y" value={p[1]} field={`${field}.y`} suffix={units} onCommit={(v) => onPoint([p[0], v])} />
      {error && (
        <span className="field-error" role="alert" data-error-for={field}>
          {error}
        </span>
      )}
    </div>
  );
}

function ToolButton({ testid, title, label, onClick }: { testid: string; title: string; label: string; onClick: () => void }) {
  return (
    <button type="button" className="btn small point-tool" data-testid={testid} title={title} aria-label={title} onClick={onClick}>
      {label}
    </button>
  );
}

function ShapeFields({ shape }: { shape: Shape }) {
  const apply = useApply();
  const units = useEditorState((s) => s.doc.units);
  // A refused insert/delete/line-arc edit, shown on the row it came from.
  const [edited, setEdited] = useState<{ row: string; message: string } | null>(null);
  const set = (f: (s: Shape) => Shape) => apply(shape.id, f);
  /** One point edit as one undoable step; a refusal is shown on `row` and changes nothing. */
  const edit = <S extends Shape>(row: string, f: (s: S, at: string) => PointEdit<S>) => {
    const err = apply(shape.id, (s, at) => {
      const r = f(s as S, at);
      return r.ok ? r.shape : r.message;
    });
    setEdited(err ? { row, message: err } : null);
  };
  const errorOn = (row: string) => (edited?.row === row ? edited.message : null);
  switch (shape.type) {
    case 'circle':
      return (
        <>
          <PointFields label="Centre" p={shape.center} field="center" units={units} onPoint={(p) => set((s) => ({ ...s, center: p }) as Shape)} />
          <NumberField label="Radius" value={shape.radius} field="radius" suffix={units} onCommit={(v) => set((s) => ({ ...s, radius: v }) as Shape)} />
        </>
      );
    case 'polygon':
      return (
        <div className="vertex-list">
          {shape.points.map((p, i) => (
            <PointFields
              key={i}
              label={`Vertex ${i + 1}`}
              p={p}
              field={`points[${i}]`}
              units={units}
              onPoint={(q) => set((s) => ({ ...s, points: (s as typeof shape).points.map((o, k) => (k === i ? q : o)) }) as Shape)}
              error={errorOn(`points[${i}]`)}
              tools={
                <>
                  <ToolButton testid={`vertex-insert-${i}`} title="Insert point after" label="+" onClick={() => edit<PolygonShape>(`points[${i}]`, (s, at) => polygonInsertAfter(s, i, at))} />
                  <ToolButton testid={`vertex-delete-${i}`} title="Delete point" label="×" onClick={() => edit<PolygonShape>(`points[${i}]`, (s, at) => polygonDeletePoint(s, i, at))} />
                </>
              }
            />
          ))}
        </div>
      );
    case 'path': {
      const last = shape.segments.length - 1;
      const segmentTools = (i: number, row: string) => (
        <>
          <ToolButton testid={`segment-split-${i}`} title="Insert point in segment" label="+" onClick={() => edit<PathShape>(row, (s, at) => pathSplitSegment(s, i, at))} />
          {shape.segments[i].via ? (
            <ToolButton testid={`segment-line-${i}`} title="Make line" label="Line" onClick={() => edit<PathShape>(row, (s, at) => pathMakeLine(s, i, at))} />
          ) : (
            <ToolButton testid={`segment-arc-${i}`} title="Make arc" label="Arc" onClick={() => edit<PathShape>(row, (s, at) => pathMakeArc(s, i, at))} />
          )}
        </>
      );
      const deleteTool = (k: number, row: string) => (
        <ToolButton testid={`point-delete-${k}`} title="Delete point" label="×" onClick={() => edit<PathShape>(row, (s, at) => pathDeletePoint(s, k, at))} />
      );
      return (
        <div className="vertex-list">
          <PointFields
            label="Start"
            p={shape.start}
            field="start"
            units={units}
            onPoint={(q) => set((s) => ({ ...s, start: q, segments: (s as typeof shape).segments.map((g, k) => (k === last ? { ...g, to: q } : g)) }) as Shape)}
            error={errorOn('start')}
            tools={deleteTool(0, 'start')}
          />
          {shape.segments.map((g, i) => (
            <div key={i} className="segment">
              {g.via && (
                <PointFields
                  label={`Arc ${i + 1} through`}
                  p={g.via}
                  field={`segments[${i}].via`}
                  units={units}
                  onPoint={(q) => set((s) => ({ ...s, segments: (s as typeof shape).segments.map((o, k) => (k === i ? { ...o, via: q } : o)) }) as Shape)}
                />
              )}
              {i < last && (
                <PointFields
                  label={`${g.via ? 'Arc' : 'Line'} ${i + 1} to`}
                  p={g.to}
                  field={`segments[${i}].to`}
                  units={units}
                  onPoint={(q) => set((s) => ({ ...s, segments: (s as typeof shape).segments.map((o, k) => (k === i ? { ...o, to: q } : o)) }) as Shape)}
                  error={errorOn(`segments[${i}].to`)}
                  tools={
                    <>
                      {segmentTools(i, `segments[${i}].to`)}
                      {deleteTool(i + 1, `segments[${i}].to`)}
                    </>
                  }
                />
              )}
              {i === last && (
                <>
                  <div className="segment-note point-head">
                    <span>{g.via ? `Arc ${i + 1}` : `Line ${i + 1}`} closes back to the start</span>
                    <span className="point-tools">{segmentTools(i, `segments[${i}]`)}</span>
                  </div>
                  {errorOn(`segments[${i}]`) && (
                    <span className="field-error" role="alert" data-error-for={`segments[${i}]`}>
                      {errorOn(`segments[${i}]`)}
                    </span>
                  )}
                </>
              )}
            </div>
          ))}
        </div>
      );
    }
    default:
      return <ProfileFields shape={shape} set={set} units={units} />;
  }
}

function ProfileFields({ shape, set, units }: { shape: ProfileShape; set: (f: (s: Shape) => Shape) => string | null; units: string }) {
  const fields = PROFILE_FIELDS[shape.type] as readonly { key: string; label: string }[];
  const rec = shape as unknown as Record<string, number | undefined>;
  return (
    <>
      {fields.map((f) => (
        <NumberField
          key={f.key}
          label={f.label}
          value={rec[f.key] ?? 0}
          field={f.key}
          suffix={units}
          onCommit={(v) => set((s) => ({ ...s, [f.key]: v }) as Shape)}
        />
      ))}
      <PointFields label="Placed at" p={shape.at} field="at" units={units} onPoint={(p) => set((s) => ({ ...s, at: p }) as Shape)} />
      <NumberField label="Rotation" value={shape.rotation ?? 0} field="rotation" suffix="°" onCommit={(v) => set((s) => ({ ...s, rotation: v }) as Shape)} />
      <label className="check">
        <input type="checkbox" data-field="mirror" checked={!!shape.mirror} onChange={(e) => set((s) => ({ ...s, mirror: e.target.checked }) as Shape)} />
        Mirrored about its local y axis
      </label>
    </>
  );
}

function RotateBox() {
  const editor = useEditor();
  const [text, setText] = useState('90');
  const [err, setErr] = useState<string | null>(null);
  const go = () => {
    const r = evaluateExpression(text);
    if (!r.ok) return setErr(r.message);
    setErr(null);
    editor.run('edit.rotate', r.value);
  };
  return (
    <div className="rotate-box">
      <label className={`field inline${err ? ' invalid' : ''}`}>
        <span className="field-label">Rotate by</span>
        <input data-field="rotate-by" value={text} onChange={(e) => setText(e.target.value)} onKeyDown={(e) => { e.stopPropagation(); if (e.key === 'Enter') go(); }} />
        <span className="field-suffix">° CCW</span>
      </label>
      <button className="btn" data-command="edit.rotate" onClick={go}>Rotate</button>
      {err && <span className="field-error" role="alert">{err}</span>}
    </div>
  );
}

export function SelectionPanel() {
  const editor = useEditor();
  const selected = useEditorState((s) => s.selected);
  const doc = useEditorState((s) => s.doc);
  const apply = useApply();
  const shapes = doc.shapes.filter((s) => selected.includes(s.id));
  if (shapes.length === 0) {
    return (
      <section className="panel-section" data-testid="selection-panel">
        <h2>Selection</h2>
        <p className="hint">Nothing selected. Click a shape, or draw one with the tools on the left. Type coordinates while drawing: “x, y”, “@dx, dy” or “length&lt;angle”.</p>
      </section>
    );
  }
  const one = shapes.length === 1 ? shapes[0] : null;
  const idx = one ? doc.shapes.indexOf(one) : -1;
  const ops = new Set(shapes.map((s) => s.op ?? 'add'));
  return (
    <section className="panel-section" data-testid="selection-panel">
      <h2>
        {one ? (
          <>
            {shapeLabel(one, idx)} <span className="kind">{SHAPE_KIND_LABEL[one.type]}</span>
          </>
        ) : (
          `${shapes.length} shapes selected`
        )}
      </h2>
      <div className="op-switch" role="radiogroup" aria-label="Operation">
        {OPS.map((op) => (
          <button
            key={op}
            role="radio"
            aria-checked={ops.size === 1 && ops.has(op)}
            className={`op op-${op}${ops.size === 1 && ops.has(op) ? ' on' : ''}`}
            data-testid={`op-${op}`}
            onClick={() => editor.run(`op.${op}`)}
          >
            {OP_LABEL[op]}
          </button>
        ))}
      </div>
      {one && (
        <div className="fields" key={one.id}>
          <label className="field">
            <span className="field-label">Name</span>
            <input
              key={one.name ?? ''} // remount when undo or redo changes the name
              data-field="name"
              defaultValue={one.name ?? ''}
              placeholder={shapeLabel(one, idx)}
              onKeyDown={(e) => { e.stopPropagation(); if (e.key === 'Enter') (e.target as HTMLInputElement).blur(); }}
              onBlur={(e) => {
                const v = e.target.value.trim();
                if (v === (one.name ?? '')) return;
                apply(one.id, (s) => {
                  const n = { ...s } as Shape;
                  if (v) n.name = v;
                  else delete n.name;
                  return n;
                });
              }}
            />
          </label>
          <ShapeFields shape={one} />
        </div>
      )}
      <RotateBox />
      <div className="actions">
        {['edit.mirrorX', 'edit.mirrorY', 'edit.duplicate', 'edit.delete', 'order.backward', 'order.forward'].map((n) => (
          <CommandButton key={n} name={n} />
        ))}
        {shapes.some(isProfile) && <CommandButton name="shape.toOutline" />}
        <CommandButton name="shape.merge" />
      </div>
      {registry.get('shape.merge') && shapes.length > 1 && (
        <p className="hint">Merging replaces the selected shapes by path outlines of their combined result.</p>
      )}
    </section>
  );
}
