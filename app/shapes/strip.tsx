/**
 * Strip editing: draw a thin wall by its centreline (the chain tool, open; Enter finishes) with
 * the thickness and corners shown in the tool rail while the tool is on, then edit them and the
 * centreline (insert, delete, line/arc, bends by radius) in the panel. The panel shows the exact
 * area values beside the thin-wall approximation (the centreline's line properties × t) and their
 * difference in per cent: how far the thin-wall assumption can be trusted for this wall.
 */
import { useMemo } from 'react';
import {
  chainFromPath,
  formatNumber,
  formatQuantity,
  sectionSize,
  shapeToRegion,
  STRIP_CORNERS,
  THIN_WALL_CAUTION,
  thinWallComparison,
  unitFactor,
  type PathSegment,
  type Point,
  type SectionDocument,
  type StripCornerKind,
  type StripShape,
} from '../../src';
import { useEditor, useEditorState } from '../context';
import { ChainFields, chainHandles, movedChainHandle } from '../fields/ChainFields';
import { NumberField } from '../fields/NumberField';
import { useShapeEdit } from '../fields/shape-edit';
import type { EditorState } from '../store/store';
import { activeShapes } from '../store/section';
import { ARC_MODE_COMMAND, ChainTool } from '../tools/chain';
import { clean, type NewShape, type ToolEnv } from '../tools/types';
import type { ShapeEditor } from './kind';

const CORNER_LABEL: Record<StripCornerKind, string> = { mitre: 'Mitred', round: 'Rounded' };

/**
 * The next strip's thickness in the document's units: the one set in the rail, else the last
 * strip's, else 5 mm.
 */
export function stripThickness(s: Pick<EditorState, 'doc' | 'stripDefaults'>): number {
  const d = s.stripDefaults;
  if (d.thickness !== null) return clean(d.thickness * unitFactor(d.units, s.doc.units));
  return lastStrip(s.doc)?.thickness ?? clean(5 * unitFactor('mm', s.doc.units));
}

function lastStrip(doc: SectionDocument): StripShape | undefined {
  return [...activeShapes(doc)].reverse().find((s): s is StripShape => s.type === 'strip');
}

class StripTool extends ChainTool {
  readonly id = 'strip';
  protected readonly noun = 'Strip centreline';
  protected readonly closed = false;
  protected build(env: ToolEnv, start: Point, segments: PathSegment[]): NewShape {
    const s = env.store.getState();
    return { type: 'strip', start, segments, thickness: stripThickness(s), corners: s.stripDefaults.corners };
  }
  override prompt(env: ToolEnv) {
    const s = env.store.getState();
    return `${super.prompt(env)} · t = ${formatNumber(stripThickness(s), 6)} ${s.doc.units}, ${CORNER_LABEL[s.stripDefaults.corners].toLowerCase()} corners`;
  }
}

/** The strip tool's settings in the rail while the tool is on: the next strip's thickness and corners. */
function StripRail() {
  const editor = useEditor();
  const on = useEditorState((s) => s.tool === 'strip');
  const t = useEditorState(stripThickness);
  const units = useEditorState((s) => s.doc.units);
  const corners = useEditorState((s) => s.stripDefaults.corners);
  if (!on) return null;
  const set = (patch: Partial<EditorState['stripDefaults']>) => {
    const s = editor.store.getState();
    editor.store.setState({ stripDefaults: { ...s.stripDefaults, ...patch } });
    editor.transient.setState({ prompt: editor.tool().prompt(editor.env) });
  };
  return (
    <div className="rail-group strip-rail" data-testid="strip-rail">
      <h3>Strip</h3>
      <NumberField label="t" value={t} field="strip-thickness" suffix={units} onCommit={(v) => (v > 0 ? (set({ thickness: v, units }), null) : 'The thickness must be greater than 0.')} />
      <select data-testid="strip-corners" aria-label="Corners of the next strip" value={corners} onChange={(e) => set({ corners: e.target.value as StripCornerKind })}>
        {STRIP_CORNERS.map((c) => (
          <option key={c} value={c}>
            {CORNER_LABEL[c]} corners
          </option>
        ))}
      </select>
    </div>
  );
}

function ThinWall({ shape }: { shape: StripShape }) {
  const units = useEditorState((s) => s.doc.units);
  const cmp = useMemo(() => {
    try {
      return thinWallComparison(chainFromPath(shape.start, shape.segments), shape.thickness, shapeToRegion(shape));
    } catch {
      return null;
    }
  }, [shape]);
  if (!cmp) return null;
  // Zero to round-off of the wall's size, as everywhere (formatQuantity).
  const size = sectionSize(cmp.line.bounds) + shape.thickness;
  const row = (key: 'area' | 'Ix' | 'Iy' | 'Ixy', label: string) => {
    const power = key === 'area' ? 2 : 4;
    const pc = cmp.percent[key];
    const q = (v: number) => formatQuantity(v, power, size);
    return (
      <tr key={key}>
        <td>{label}</td>
        <td className="num" data-exact={key} data-value={String(cmp.exact[key])}>
          {q(cmp.exact[key])}
        </td>
        <td className="num" data-thin={key} data-value={String(cmp.thinWall[key])}>
          {q(cmp.thinWall[key])}
        </td>
        <td className="num" data-thin-wall={key} data-value={String(pc ?? cmp.difference[key])}>
          {pc === null ? q(cmp.difference[key]) : `${formatNumber(pc, 2, 100)} %`}
        </td>
      </tr>
    );
  };
  return (
    <table className="thin-wall" data-testid="thin-wall">
      <caption>
        Exact against thin wall (centreline × t), {units}², {units}⁴
      </caption>
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
        {row('Ixy', 'Ixy')}
        <tr>
          <td>centroid shift</td>
          <td className="num" colSpan={2} />
          <td className="num" data-thin-wall="centroid" data-value={String(cmp.difference.centroid)}>
            {formatQuantity(cmp.difference.centroid, 1, size)} {units}
          </td>
        </tr>
      </tbody>
      <tfoot>
        <tr>
          <td colSpan={4} className="thin-wall-note">
            {THIN_WALL_CAUTION}
          </td>
        </tr>
      </tfoot>
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
              {CORNER_LABEL[c]}
            </option>
          ))}
        </select>
      </label>
      <ThinWall shape={shape} />
      <p className="hint">A bend's centreline radius is its inside radius plus half the thickness.</p>
      <ChainFields key={`${shape.id}:${e.units}`} shape={shape} e={e} defaultRadius={clean(1.5 * shape.thickness)} radiusLabel="Bend radius (centreline)" />
    </>
  );
}

export const stripEditor: ShapeEditor<StripShape> = {
  types: ['strip'],
  handles: (s) => chainHandles(s.start, s.segments),
  moveHandle: (s, ref, p) => movedChainHandle(s, ref, p),
  Fields: StripFields,
  tools: [{ id: 'strip', label: 'Strip', key: 't', hint: 'A thin wall drawn by its centreline, with the thickness shown in the rail', inDrawGroup: true, subCommands: [ARC_MODE_COMMAND.name], create: () => new StripTool() }],
  RailControl: StripRail,
};
