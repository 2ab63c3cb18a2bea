/**
 * The points of an open chain (a line element, a strip's centreline): the start, then each
 * segment's end and, for an arc, its through-point, each as an editable point, with the edits a
 * drafter expects beside them: insert a point in a segment, delete a point, switch a segment
 * between line and arc, round a corner with a tangent arc (a bend), round every corner, and run
 * the chain the other way. Every edit is the engine's (src/shapes/edit-points.ts), checked before
 * it is applied, one undo step each.
 */
import { useState } from 'react';
import {
  chainDeletePoint,
  chainMakeArc,
  chainMakeLine,
  chainReverse,
  chainRoundCorner,
  chainSplitSegment,
  type LineShape,
  type PathSegment,
  type Point,
  type PointEdit,
  type StripShape,
} from '../../src';
import { useEditor } from '../context';
import { removeChainSegment } from '../ops/welds';
import { NumberField } from './NumberField';
import { PointFields, ToolButton } from './PointFields';
import type { ShapeEdit } from './shape-edit';

type OpenChain = LineShape | StripShape;

/** True when the chain ends on its start (a weld all round): its start is a corner too. */
function endsOnStart(s: OpenChain): boolean {
  const e = s.segments[s.segments.length - 1].to;
  return s.segments.length > 1 && e[0] === s.start[0] && e[1] === s.start[1];
}

/** Round every corner, last first so the earlier points keep their numbers; corners already smooth are left. */
function roundAll<S extends OpenChain>(s: S, radius: number, at: string): PointEdit<S> {
  let cur = s;
  let done = 0;
  let last = '';
  for (let k = s.segments.length - 1; k >= (endsOnStart(s) ? 0 : 1); k--) {
    const r = chainRoundCorner(cur, k, radius, at);
    if (r.ok) {
      cur = r.shape;
      done++;
    } else if (!/is straight/.test(r.message)) last = r.message;
  }
  if (done === 0) return { ok: false, message: last || `${at}: there is no corner to round` };
  return { ok: true, shape: cur };
}

export function ChainFields<S extends OpenChain>({ shape, e, defaultRadius, radiusLabel }: { shape: S; e: ShapeEdit<S>; defaultRadius: number; radiusLabel: string }) {
  const editor = useEditor();
  const [radius, setRadius] = useState(defaultRadius);
  const [cutError, setCutError] = useState<{ row: string; message: string } | null>(null);
  const n = shape.segments.length;
  const closedChain = endsOnStart(shape);
  const setSegment = (i: number, f: (g: PathSegment) => PathSegment) => e.set((s) => ({ ...s, segments: s.segments.map((o, k) => (k === i ? f(o) : o)) }));
  const setStart = (q: Point) => e.set((s) => ({ ...s, start: q }));
  const del = (k: number, row: string) => n > 1 && <ToolButton testid={`point-delete-${k}`} title="Delete point" label="×" onClick={() => e.edit(row, (s, at) => chainDeletePoint(s, k, at))} />;
  const round = (k: number, row: string) => <ToolButton testid={`point-round-${k}`} title={`Round this corner (radius ${radius})`} label="Round" onClick={() => e.edit(row, (s, at) => chainRoundCorner(s, k, radius, at))} />;
  return (
    <>
      <div className="chain-tools">
        <NumberField label={radiusLabel} value={radius} field="corner-radius" suffix={e.units} onCommit={(v) => (v > 0 ? (setRadius(v), null) : 'The radius must be greater than 0.')} />
        <div className="chain-buttons">
          <button type="button" className="btn small" data-testid="round-all" title="Round every corner with this radius (a tangent arc; the numbers stay exact)" onClick={() => e.edit('chain', (s, at) => roundAll(s, radius, at))}>
            Round every corner
          </button>
          <button type="button" className="btn small" data-testid="chain-reverse" title="Run the chain from its other end (nothing computed changes)" onClick={() => e.edit('chain', (s, at) => chainReverse(s, at))}>
            Reverse
          </button>
        </div>
        {e.errorOn('chain') && (
          <span className="field-error" role="alert" data-error-for="chain">
            {e.errorOn('chain')}
          </span>
        )}
      </div>
      <div className="vertex-list chain-fields">
        <PointFields
          label="Start"
          p={shape.start}
          field="start"
          units={e.units}
          onPoint={setStart}
          error={e.errorOn('start')}
          tools={
            <>
              {closedChain && round(0, 'start')}
              {del(0, 'start')}
            </>
          }
        />
        {shape.segments.map((g, i) => {
          const row = `segments[${i}].to`;
          const corner = i < n - 1;
          return (
            <div key={i} className="segment">
              {g.via && <PointFields label={`Arc ${i + 1} through`} p={g.via} field={`segments[${i}].via`} units={e.units} onPoint={(q) => setSegment(i, (o) => ({ ...o, via: q }))} />}
              <PointFields
                label={`${g.via ? 'Arc' : 'Line'} ${i + 1} to`}
                p={g.to}
                field={row}
                units={e.units}
                onPoint={(q) => setSegment(i, (o) => ({ ...o, to: q }))}
                error={e.errorOn(row) ?? (cutError?.row === row ? cutError.message : null)}
                tools={
                  <>
                    <ToolButton testid={`segment-split-${i}`} title="Insert a point in this segment" label="+" onClick={() => e.edit(row, (s, at) => chainSplitSegment(s, i, at))} />
                    {g.via ? (
                      <ToolButton testid={`segment-line-${i}`} title="Make this segment a line" label="Line" onClick={() => e.edit(row, (s, at) => chainMakeLine(s, i, at))} />
                    ) : (
                      <ToolButton testid={`segment-arc-${i}`} title="Make this segment an arc" label="Arc" onClick={() => e.edit(row, (s, at) => chainMakeArc(s, i, at))} />
                    )}
                    {corner && round(i + 1, row)}
                    {n > 1 && (
                      <ToolButton
                        testid={`segment-remove-${i}`}
                        title="Remove this segment: the chain is shortened, opened, or split in two there"
                        label="Cut"
                        onClick={() => {
                          const err = removeChainSegment(editor.store, shape.id, i);
                          setCutError(err ? { row, message: err } : null);
                        }}
                      />
                    )}
                    {del(i + 1, row)}
                  </>
                }
              />
            </div>
          );
        })}
      </div>
    </>
  );
}

/** Handles of an open chain: its start, every segment end and every arc's through-point. */
export function chainHandles(start: Point, segments: readonly PathSegment[]) {
  const out: { ref: { kind: 'start' } | { kind: 'to'; index: number } | { kind: 'via'; index: number }; p: Point }[] = [{ ref: { kind: 'start' }, p: start }];
  segments.forEach((g, index) => {
    out.push({ ref: { kind: 'to', index }, p: g.to });
    if (g.via) out.push({ ref: { kind: 'via', index }, p: g.via });
  });
  return out;
}

/**
 * The chain with one handle moved. A closed chain (a path) ends on its start, so moving the
 * start moves the last segment's end with it.
 */
export function movedChainHandle<S extends { start: Point; segments: readonly PathSegment[] }>(s: S, ref: { kind: string; index?: number }, p: Point, closed = false): S {
  const last = s.segments.length - 1;
  if (ref.kind === 'start') return { ...s, start: p, segments: closed ? s.segments.map((g, i) => (i === last ? { ...g, to: p } : g)) : s.segments };
  if (ref.kind === 'to') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
  if (ref.kind === 'via') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
  return s;
}
