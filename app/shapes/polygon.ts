/** Polygon: a list of vertices, each one a handle. */
import type { PolygonShape } from '../../src';
import type { ShapeKind } from './kind';

export const polygonKind: ShapeKind<PolygonShape> = {
  label: 'Polygon',
  mapPoints: (s, f) => ({ ...s, points: s.points.map(f) }),
  // A reflection reverses the winding; keep it counter-clockwise as drawn.
  mirrored: (s) => ({ ...s, points: s.points.slice().reverse() }),
  handles: (s) => s.points.map((p, index) => ({ ref: { kind: 'vertex', index }, p })),
  moveHandle: (s, ref, p) => (ref.kind === 'vertex' ? { ...s, points: s.points.map((q, i) => (i === ref.index ? p : q)) } : s),
};
