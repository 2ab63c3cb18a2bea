/**
 * Parametric profiles (rectangle, I, channel, angle, tee, tubes, bent plate): placed by `at`,
 * `rotation` and `mirror`; their dimensions are edited in the panel (PROFILE_FIELDS).
 * A rotation adds to `rotation`; a reflection flips `mirror` and turns the angle: about a
 * vertical line θ becomes −θ, about a horizontal one 180° − θ (reflection ∘ rotation algebra).
 */
import type { ProfileShape } from '../../src';
import { normaliseDeg, type ShapeKind } from './kind';


export const profileKind: ShapeKind<ProfileShape> = {
  label: 'Profile',
  mapPoints: (s, f) => ({ ...s, at: f(s.at) }),
  rotated: (s, deg) => ({ ...s, rotation: normaliseDeg((s.rotation ?? 0) + deg) }),
  mirrored: (s, axis) => {
    const rot = s.rotation ?? 0;
    return { ...s, mirror: !s.mirror, rotation: normaliseDeg(axis === 'vertical' ? -rot : 180 - rot) };
  },
  handles: (s) => [{ ref: { kind: 'at' }, p: s.at }],
  moveHandle: (s, ref, p) => (ref.kind === 'at' ? { ...s, at: p } : s),
};
