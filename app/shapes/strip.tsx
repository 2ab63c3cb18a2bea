/**
 * Strip editing: draw a thin wall by its centreline (the chain tool, open; Enter finishes), then
 * set its thickness and corners in the panel. The panel shows the exact area values beside the
 * thin-wall approximation (the centreline's line properties × t) and their difference in per
 * cent: how far the thin-wall assumption can be trusted for this wall.
 */
import { useMemo } from 'react';
import {
  chainFromPath,
  formatNumber,
  shapeToRegion,
  STRIP_CORNERS,
  thinWallComparison,
  unitFactor,
  type PathSegment,
  type Point,
  type StripCornerKind,
  type StripShape,
} from '../../src';
import { ChainFields, chainHandles } from '../fields/ChainFields';
import { NumberField } from '../fields/NumberField';
import { useShapeEdit } from '../fields/shape-edit';
import { ARC_MODE_COMMAND, ChainTool } from '../tools/chain';
import { clean, type NewShape, type ToolEnv } from '../tools/types';
import type { ShapeEditor } from './kind';

/** A new strip's thickness: the last strip's, else 5 mm in the document's units. */
function defaultThickness(env: ToolEnv): number {
  const doc = env.store.getState().doc;
  const last = [...doc.shapes].reverse().find((s): s is StripShape => s.type === 'strip');
  return last ? last.thickness : clean(5 * unitFactor('mm', doc.units));
}

class StripTool extends ChainTool {
  readonly id = 'strip';
  protected readonly noun = 'Strip centreline';
  protected readonly closed = false;
  protected build(env: ToolEnv, start: Point, segments: PathSegment[]): NewShape {
    return { type: 'strip', start, segments, thickness: defaultThickness(env), corners: 'mitre' };
  }
}

function ThinWall({ shape }: { shape: StripShape }) {
  const cmp = useMemo(() => {
    try {
      return thinWallComparison(chainFromPath(shape.start, shape.segments), shape.thickness, shapeToRegion(shape));
    } catch {
      return null;
    }
  }, [shape]);
  if (!cmp) return null;
  const row = (key: 'area' | 'Ix' | 'Iy', label: string) => (
    <tr key={key}>
      <td>{label}</td>
      <td className="num">{formatNumber(cmp.exact[key])}</td>
      <td className="num">{formatNumber(cmp.thinWall[key])}</td>
      <td className="num" data-thin-wall={key} data-value={String(cmp.percent[key])}>
        {formatNumber(cmp.percent[key], 2, 100)} %
      </td>
    </tr>
  );
  return (
    <table className="thin-wall" data-testid="thin-wall">
      <caption>Exact against thin wall (centreline × t)</caption>
      <thead>
        <tr>
          <th />
          <th>exact</th>
          <th>thin wall</th>
          <th>difference</th>
        </tr>
      </thead>
      <tbody>
        {row('area', 'A')}
        {row('Ix', 'Ix')}
        {row('Iy', 'Iy')}
      </tbody>
    </table>
  );
}

function StripFields({ shape }: { shape: StripShape }) {
  const e = useShapeEdit(shape);
  return (
    <>
      <NumberField label="Thickness" value={shape.thickness} field="thickness" suffix={e.units} onCommit={(v) => e.set((s) => ({ ...s, thickness: v }))} />
      <label className="field">
        <span className="field-label">Corners</span>
        <select data-field="corners" value={shape.corners ?? 'mitre'} onChange={(ev) => e.set((s) => ({ ...s, corners: ev.target.value as StripCornerKind }))}>
          {STRIP_CORNERS.map((c) => (
            <option key={c} value={c}>
              {c === 'mitre' ? 'Mitred' : 'Rounded'}
            </option>
          ))}
        </select>
      </label>
      <ChainFields start={shape.start} segments={shape.segments} units={e.units} onChange={(start, segments) => e.set((s) => ({ ...s, start, segments }))} />
      <ThinWall shape={shape} />
    </>
  );
}

export const stripEditor: ShapeEditor<StripShape> = {
  types: ['strip'],
  handles: (s) => chainHandles(s.start, s.segments),
  moveHandle: (s, ref, p) => {
    if (ref.kind === 'start') return { ...s, start: p };
    if (ref.kind === 'to') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
    if (ref.kind === 'via') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
    return s;
  },
  Fields: StripFields,
  tools: [{ id: 'strip', label: 'Strip', key: 't', hint: 'A thin wall drawn by its centreline; set its thickness in the panel', inDrawGroup: true, subCommands: [ARC_MODE_COMMAND.name], create: () => new StripTool() }],
};
