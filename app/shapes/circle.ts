/** Circle: a centre handle moves it, a rim handle sets the radius. */
import type { CircleShape } from '../../src';
import type { ShapeKind } from './kind';

export const circleKind: ShapeKind<CircleShape> = {
  label: 'Circle',
  mapPoints: (s, f) => ({ ...s, center: f(s.center) }),
  handles: (s) => [
    { ref: { kind: 'centre' }, p: s.center },
    { ref: { kind: 'radius' }, p: [s.center[0] + s.radius, s.center[1]] },
  ],
  moveHandle: (s, ref, p) => {
    if (ref.kind === 'centre') return { ...s, center: p };
    if (ref.kind === 'radius') return { ...s, radius: Math.hypot(p[0] - s.center[0], p[1] - s.center[1]) };
    return s;
  },
};
