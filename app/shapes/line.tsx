/**
 * Line element editing: the chain tool, open (Enter finishes; a click on the start point closes a
 * weld all round), handles on every point, and in the panel its group (the lines of one group
 * form a weld group; the groups in use are offered) and its points with insert, delete, line/arc,
 * rounding and reverse. A line encloses no area: it is drawn as a stroke and reported in its
 * group's line properties. The weld-point tool (placing a weld load) belongs here too.
 */
import { useEffect, useState } from 'react';
import { DEFAULT_LINE_GROUP, documentLineGroups, unitFactor, type LineShape, type PathSegment, type Point } from '../../src';
import { useEditor, useEditorState } from '../context';
import { ChainFields, chainHandles, movedChainHandle } from '../fields/ChainFields';
import { useShapeEdit } from '../fields/shape-edit';
import { addLinesAlongOutline, setLineGroup } from '../ops/welds';
import type { Command } from '../commands/registry';
import { activeShapes } from '../store/section';
import { ARC_MODE_COMMAND, ChainTool } from '../tools/chain';
import { clean, type NewShape, type ToolEnv } from '../tools/types';
import { WeldPointTool } from '../tools/weld-point';
import type { ShapeEditor } from './kind';

class LineTool extends ChainTool {
  readonly id = 'line';
  protected readonly noun = 'Line element';
  protected readonly closed = false;
  protected build(env: ToolEnv, start: Point, segments: PathSegment[]): NewShape {
    // A new line joins the group of the selected line, else of the last line drawn, so a weld
    // group is drawn line by line.
    const s = env.store.getState();
    const shapes = activeShapes(s.doc);
    const selected = shapes.find((x): x is LineShape => x.type === 'line' && s.selected.includes(x.id));
    const last = selected ?? [...shapes].reverse().find((x): x is LineShape => x.type === 'line');
    return last?.group ? { type: 'line', start, segments, group: last.group } : { type: 'line', start, segments };
  }
}

function GroupField({ shape }: { shape: LineShape }) {
  const editor = useEditor();
  const groups = useEditorState((s) => documentLineGroups(s.doc as unknown as Record<string, unknown>).join('\n'));
  const [text, setText] = useState(shape.group ?? '');
  useEffect(() => setText(shape.group ?? ''), [shape.group]);
  const apply = () => {
    const v = text.trim();
    if (v === (shape.group ?? '')) return;
    setLineGroup(editor.store, shape.id, v);
  };
  const listId = `line-groups-${shape.id}`;
  return (
    <label className="field">
      <span className="field-label">Group</span>
      <input
        data-field="group"
        list={listId}
        value={text}
        placeholder={DEFAULT_LINE_GROUP}
        title="The line elements of one group form one weld group (or one centreline); type a new name to start another group"
        onChange={(ev) => setText(ev.target.value)}
        onKeyDown={(ev) => {
          ev.stopPropagation();
          if (ev.key === 'Enter') (ev.target as HTMLInputElement).blur();
        }}
        onBlur={apply}
      />
      <datalist id={listId}>
        {groups.split('\n').filter(Boolean).map((g) => (
          <option key={g} value={g} />
        ))}
      </datalist>
    </label>
  );
}

function LineFields({ shape }: { shape: LineShape }) {
  const e = useShapeEdit(shape);
  const units = useEditorState((s) => s.doc.units);
  return (
    <>
      <GroupField shape={shape} />
      <ChainFields key={`${shape.id}:${units}`} shape={shape} e={e} defaultRadius={clean(10 * unitFactor('mm', units))} radiusLabel="Corner radius" />
    </>
  );
}

/** Line elements along the selected shapes' outlines (or the section's): a weld all round, to trim. */
const ALONG_OUTLINE_COMMAND: Command = {
  name: 'line.alongOutline',
  label: 'Along outline',
  group: 'tool',
  hint: 'Line elements all round the selected shapes (or the whole section); remove the segments that are not welded',
  perform: addLinesAlongOutline,
};

export const lineEditor: ShapeEditor<LineShape> = {
  types: ['line'],
  handles: (s) => chainHandles(s.start, s.segments),
  moveHandle: (s, ref, p) => movedChainHandle(s, ref, p),
  Fields: LineFields,
  tools: [
    { id: 'line', label: 'Line element', key: 'w', hint: 'A weld line or other line element: it encloses no area', inDrawGroup: true, subCommands: [ARC_MODE_COMMAND.name, ALONG_OUTLINE_COMMAND.name], create: () => new LineTool() },
    {
      id: 'weldPoint',
      label: 'Place weld load',
      hint: 'Click or type the point where a weld load’s force acts',
      inDrawGroup: false,
      configure: (c, arg) => c.store.setState({ weldTarget: typeof arg === 'number' ? arg : c.store.getState().weldTarget }),
      create: () => new WeldPointTool(),
    },
  ],
  commands: [ALONG_OUTLINE_COMMAND],
};
