/**
 * The profile kinds: eight parametric shapes that share one behaviour. Each is placed by `at`,
 * `rotation` and `mirror`, has the numeric dimensions listed in PROFILE_FIELDS, and becomes exact
 * path geometry through profileToPaths. A rotation adds to `rotation`; a reflection flips
 * `mirror` and turns the angle: about a vertical line θ becomes −θ, about a horizontal one
 * 180° − θ (reflection ∘ rotation algebra).
 */
import type { PointMap } from '../base';
import { checkNumber, checkPoint, type Issue } from '../check';
import { normaliseDeg, scalePoint, type ShapeKind } from '../kind';
import { pointText } from '../schedule';
import { orient } from '../loops';
import { pathContour } from '../path';
import { PROFILE_FIELDS, validateProfile, type ProfileField } from './fields';
import { profileToPaths } from './outline';
import type { ProfileOf, ProfileShape, ProfileType } from './types';

export const PROFILE_TYPES = ['rectangle', 'i-beam', 'channel', 'angle', 'tee', 'rect-tube', 'round-tube', 'bent-plate'] as const satisfies readonly ProfileType[];

const LABEL: Record<ProfileType, string> = {
  rectangle: 'Rectangle',
  'i-beam': 'I-beam',
  channel: 'Channel',
  angle: 'Angle',
  tee: 'Tee',
  'rect-tube': 'Rectangular tube',
  'round-tube': 'Round tube',
  'bent-plate': 'Bent plate',
};

/** How each profile's local frame is set (see types.ts), for the report's schedule. */
const FRAME: Record<ProfileType, string> = {
  rectangle: 'local origin at the bottom-left corner; the corner radius on all four corners',
  'i-beam': 'doubly symmetric I; local origin at the bottom-left of its bounding box',
  channel: 'web on the left, flanges to the right; local origin at the bottom-left',
  angle: 'vertical leg on the left, horizontal leg at the bottom; local origin at the heel',
  tee: 'flange on top, stem down; local origin at the bottom-left of its bounding box',
  'rect-tube': 'local origin at the bottom-left; inside corner radius = max(outside radius − wall, 0)',
  'round-tube': 'local origin at the centre',
  'bent-plate': '90° bend: horizontal leg along the bottom, vertical leg on the left, legs to the outside faces; local origin where the outside faces meet',
};

/** How every profile is placed from its local frame. */
export const PLACEMENT_RULE = 'A profile is drawn in its local frame, then mirrored about the local y axis (if so), turned counter-clockwise about the local origin, then moved so that its local origin is at the point given.';

const NOT_LENGTHS = new Set(['rotation']);

export function isProfileType(t: unknown): t is ProfileType {
  return (PROFILE_TYPES as readonly unknown[]).includes(t);
}

export function isProfile(s: { type: string }): s is ProfileShape {
  return isProfileType(s.type);
}

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const before = out.length;
  checkPoint(s.at, `${path}.at`, out);
  checkNumber(s.rotation, `${path}.rotation`, out, { optional: true, name: 'rotation' });
  if (s.mirror !== undefined && typeof s.mirror !== 'boolean') out.push({ path: `${path}.mirror`, message: 'mirror must be true or false' });
  if (out.length > before) return;
  for (const i of validateProfile(s as unknown as ProfileShape)) out.push({ path: i.path ? `${path}.${i.path}` : path, message: i.message });
}

function profileKind<T extends ProfileType>(type: T): ShapeKind<ProfileOf<T>> {
  type S = ProfileOf<T>;
  const kind: ShapeKind<ProfileShape> = {
    type,
    label: LABEL[type],
    validate,
    contours: (s) => {
      const { outer, holes } = profileToPaths(s);
      return [orient(pathContour(outer.start, outer.segments), +1), ...holes.map((h) => orient(pathContour(h.start, h.segments), -1))];
    },
    mayCrossItself: false,
    mapPoints: (s, f: PointMap) => ({ ...s, at: f(s.at) }),
    rotated: (s, deg) => ({ ...s, rotation: normaliseDeg((s.rotation ?? 0) + deg) }),
    mirrored: (s, axis) => {
      const rot = s.rotation ?? 0;
      return { ...s, mirror: !s.mirror, rotation: normaliseDeg(axis === 'vertical' ? -rot : 180 - rot) };
    },
    scaled: (s, k) => {
      const out: Record<string, unknown> = { ...s, at: scalePoint(k)(s.at) };
      for (const [key, v] of Object.entries(s)) if (typeof v === 'number' && !NOT_LENGTHS.has(key)) out[key] = v * k;
      return out as unknown as ProfileShape;
    },
    schedule: (s, f) => {
      const fields = PROFILE_FIELDS[type] as readonly ProfileField<ProfileType>[];
      const rec = s as unknown as Record<string, unknown>;
      const params: [string, string][] = fields.map((fl) => [fl.label, typeof rec[fl.key] === 'number' ? f.len(rec[fl.key] as number) : '0 (not set)']);
      params.push(['Local origin at', pointText(s.at, f)], ['Turned', `${f.deg(s.rotation ?? 0)}°`], ['Mirrored', s.mirror ? 'yes' : 'no']);
      return { params, table: null, extent: null, frame: FRAME[type] };
    },
  };
  return kind as unknown as ShapeKind<S>;
}

export const PROFILE_KINDS: { readonly [T in ProfileType]: ShapeKind<ProfileOf<T>> } = {
  rectangle: profileKind('rectangle'),
  'i-beam': profileKind('i-beam'),
  channel: profileKind('channel'),
  angle: profileKind('angle'),
  tee: profileKind('tee'),
  'rect-tube': profileKind('rect-tube'),
  'round-tube': profileKind('round-tube'),
  'bent-plate': profileKind('bent-plate'),
};
