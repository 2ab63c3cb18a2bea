/** Circle: a centre and a radius; its outline is two exact half-circle arcs. */
import { circleContour } from '../geometry/contour';
import type { Point, ShapeBase } from './base';
import { checkNumber, checkPoint, type Issue } from './check';
import { scalePoint, type ShapeKind } from './kind';
import { pointText } from './schedule';

export interface CircleShape extends ShapeBase {
  type: 'circle';
  center: Point;
  radius: number;
}

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  if (checkPoint(s.center, `${path}.center`, out) && checkNumber(s.radius, `${path}.radius`, out, { positive: true, name: 'radius' })) {
    const c = s.center as Point, r = s.radius as number;
    if (r < 1e-9 * Math.max(Math.abs(c[0]), Math.abs(c[1]))) {
      out.push({ path: `${path}.radius`, message: `radius ${r} is too small for a centre so far from the origin (${c[0]}, ${c[1]}): it would be lost in rounding` });
    }
  }
}

export const circleKind: ShapeKind<CircleShape> = {
  type: 'circle',
  label: 'Circle',
  validate,
  contours: (s) => [circleContour(s.center[0], s.center[1], s.radius)],
  mayCrossItself: false,
  mapPoints: (s, f) => ({ ...s, center: f(s.center) }),
  scaled: (s, k) => ({ ...s, center: scalePoint(k)(s.center), radius: s.radius * k }),
  schedule: (s, f) => ({
    params: [
      ['Centre', pointText(s.center, f)],
      ['Diameter', f.len(2 * s.radius)],
    ],
    table: null,
    extent: null,
  }),
};
