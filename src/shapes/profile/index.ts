/**
 * The profile kinds: eight parametric shapes that share one behaviour. Each is placed by `at`,
 * `rotation` and `mirror`, has the numeric dimensions listed in PROFILE_FIELDS, and becomes exact
 * path geometry through profileToPaths. A rotation adds to `rotation`; a reflection flips
 * `mirror` and turns the angle: about a vertical line θ becomes −θ, about a horizontal one
 * 180° − θ (reflection ∘ rotation algebra).
 */
import type { PointMap } from '../base';
import { checkNumber, checkPoint, type Issue } from '../check';
import { normaliseDeg, pointText, scalePoint, type ShapeKind } from '../kind';
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
    describe: (s, num) => {
      const fields = PROFILE_FIELDS[type] as readonly ProfileField<ProfileType>[];
      const rec = s as unknown as Record<string, unknown>;
      const dims = fields.filter((fl) => typeof rec[fl.key] === 'number').map((fl) => `${fl.label.toLowerCase()} ${num(rec[fl.key] as number)}`);
      const place = [`at ${pointText(s.at, num)}`];
      if (s.rotation) place.push(`rotated ${num(s.rotation)}°`);
      if (s.mirror) place.push('mirrored');
      return `${dims.join(', ')}; ${place.join(', ')}`;
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
