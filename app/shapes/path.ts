/**
 * Path: a start point and segments, lines `{to}` and three-point arcs `{to, via}`. The last
 * segment ends on the start, so the start handle moves both.
 */
import type { PathShape } from '../../src';
import type { Handle, ShapeKind } from './kind';

export const pathKind: ShapeKind<PathShape> = {
  label: 'Path',
  mapPoints: (s, f) => ({ ...s, start: f(s.start), segments: s.segments.map((g) => (g.via ? { to: f(g.to), via: f(g.via) } : { to: f(g.to) })) }),
  handles: (s) => {
    const out: Handle[] = [{ ref: { kind: 'start' }, p: s.start }];
    s.segments.forEach((g, index) => {
      if (index < s.segments.length - 1) out.push({ ref: { kind: 'to', index }, p: g.to });
      if (g.via) out.push({ ref: { kind: 'via', index }, p: g.via });
    });
    return out;
  },
  moveHandle: (s, ref, p) => {
    const last = s.segments.length - 1;
    switch (ref.kind) {
      case 'start':
        return { ...s, start: p, segments: s.segments.map((g, i) => (i === last ? { ...g, to: p } : g)) };
      case 'to':
        return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
      case 'via':
        return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
      default:
        return s;
    }
  },
};
