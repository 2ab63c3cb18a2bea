/**
 * Profile editing (rectangle, I, channel, angle, tee, tubes, bent plate): the rectangle tool
 * (two corners, or press-drag-release), the profile tool that places the chosen profile with its
 * default dimensions, one placement handle, and the dimensions in the panel (PROFILE_FIELDS).
 */
import {
  PROFILE_DEFAULTS,
  PROFILE_FIELDS,
  PROFILE_TYPES,
  SHAPE_KIND_LABEL,
  unitFactor,
  type Point,
  type ProfileShape,
  type ProfileType,
  type Shape,
  type Units,
} from '../../src';
import type { CommandContext } from '../commands/registry';
import { useEditor, useEditorState } from '../context';
import { NumberField } from '../fields/NumberField';
import { PointFields } from '../fields/PointFields';
import { useShapeEdit } from '../fields/shape-edit';
import { DrawingTool, samePoint } from '../tools/base';
import { clean, type NewShape, type ToolEnv } from '../tools/types';
import { CommandButton } from '../fields/CommandButton';
import type { ShapeEditor } from './kind';
import { HINT } from '../input-syntax';
import { revealShapes } from '../reveal';

function rectFrom(a: Point, b: Point): NewShape {
  return { type: 'rectangle', at: [Math.min(a[0], b[0]), Math.min(a[1], b[1])], width: clean(Math.abs(b[0] - a[0])), height: clean(Math.abs(b[1] - a[1])) };
}

class RectangleTool extends DrawingTool {
  readonly id = 'rectangle';
  protected override readonly finishOnDrag = true;
  private corner: Point | null = null;
  prompt() {
    return this.corner ? `Rectangle: opposite corner (${HINT.corner})` : `Rectangle: first corner (${HINT.firstPoint})`;
  }
  last() {
    return this.corner;
  }
  busy() {
    return this.corner !== null;
  }
  reset(env: ToolEnv) {
    this.corner = null;
    this.draft(env, null);
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    if (!this.corner) {
      this.corner = p;
      this.draft(env, { markers: [p] });
      return null;
    }
    if (p[0] === this.corner[0] || p[1] === this.corner[1]) return 'The rectangle needs a width and a height: pick a corner off the first one’s row and column.';
    if (env.addShape(rectFrom(this.corner, p))) this.reset(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    if (this.corner && !samePoint(p, this.corner) && p[0] !== this.corner[0] && p[1] !== this.corner[1]) {
      this.draft(env, { shape: { id: '~draft', ...rectFrom(this.corner, p) } as Shape, markers: [this.corner] });
    }
  }
}

/**
 * Profile dimensions for a new shape: the defaults (mm) converted to the document's units, to three
 * significant figures in other units (7.87 in, not 7.87401574803 in: a starting size, not a
 * catalogue one).
 */
export function defaultProfile(type: ProfileType, units: Units, at: Point): NewShape {
  const k = unitFactor('mm', units);
  const dims: Record<string, number> = {};
  for (const [key, v] of Object.entries(PROFILE_DEFAULTS[type])) dims[key] = units === 'mm' ? clean(v as number) : Number(((v as number) * k).toPrecision(3));
  return { type, at, ...dims } as unknown as NewShape;
}

class ProfileTool extends DrawingTool {
  readonly id = 'profile';
  prompt(env: ToolEnv) {
    return `${SHAPE_KIND_LABEL[env.store.getState().profileType]}: click or type the placement point (${HINT.firstPoint})`;
  }
  last() {
    return null;
  }
  busy() {
    return false;
  }
  reset(env: ToolEnv) {
    this.draft(env, null);
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    const s = env.store.getState();
    // A profile placed near the edge, or at a typed point out of view, is brought into view.
    if (env.addShape(defaultProfile(s.profileType, s.doc.units, p))) revealShapes({ store: env.store, shapesOf: env.results.shapesOf }, env.store.getState().selected);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    const s = env.store.getState();
    this.draft(env, { shape: { id: '~draft', ...defaultProfile(s.profileType, s.doc.units, p) } as Shape, markers: [p] });
  }
}

function ProfileFields({ shape }: { shape: ProfileShape }) {
  const e = useShapeEdit<ProfileShape>(shape);
  const fields = PROFILE_FIELDS[shape.type] as readonly { key: string; label: string }[];
  const rec = shape as unknown as Record<string, number | undefined>;
  return (
    <>
      {fields.map((f) => (
        <NumberField key={f.key} label={f.label} value={rec[f.key] ?? 0} field={f.key} suffix={e.units} onCommit={(v) => e.set((s) => ({ ...s, [f.key]: v }))} />
      ))}
      <PointFields label="Placed at" p={shape.at} field="at" units={e.units} onPoint={(p) => e.set((s) => ({ ...s, at: p }))} />
      <NumberField label="Rotation" value={shape.rotation ?? 0} field="rotation" suffix="°" onCommit={(v) => e.set((s) => ({ ...s, rotation: v }))} />
      <label className="check">
        <input type="checkbox" data-field="mirror" checked={!!shape.mirror} onChange={(ev) => e.set((s) => ({ ...s, mirror: ev.target.checked }))} />
        Mirrored about its local y axis
      </label>
    </>
  );
}

/** The tool rail's profile chooser: pick a type, then place it. */
function ProfileChooser() {
  const editor = useEditor();
  const profileType = useEditorState((s) => s.profileType);
  return (
    <div className="rail-group">
      <h3>Profile</h3>
      <select data-testid="profile-type" value={profileType} onChange={(e) => editor.run('tool.profile', e.target.value as ProfileType)} aria-label="Profile type">
        {PROFILE_TYPES.map((t) => (
          <option key={t} value={t}>
            {SHAPE_KIND_LABEL[t]}
          </option>
        ))}
      </select>
      <CommandButton name="tool.profile" arg={profileType}>
        Place profile
      </CommandButton>
    </div>
  );
}

export const profileEditor: ShapeEditor<ProfileShape> = {
  types: PROFILE_TYPES,
  handles: (s) => [{ ref: { kind: 'at' }, p: s.at }],
  moveHandle: (s, ref, p) => (ref.kind === 'at' ? { ...s, at: p } : s),
  Fields: ProfileFields,
  tools: [
    { id: 'rectangle', label: 'Rectangle', key: 'r', inDrawGroup: true, create: () => new RectangleTool() },
    {
      id: 'profile',
      label: 'Profile',
      key: 'i',
      hint: 'Place the chosen profile with a click',
      inDrawGroup: false,
      create: () => new ProfileTool(),
      configure: (c: CommandContext, arg: unknown) => {
        if ((PROFILE_TYPES as readonly unknown[]).includes(arg)) c.store.setState({ profileType: arg as ProfileType });
      },
    },
  ],
  RailControl: ProfileChooser,
};
