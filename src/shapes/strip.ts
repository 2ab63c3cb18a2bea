/**
 * Strip: a thin wall drawn by its centreline (lines and three-point arcs, open) and a thickness.
 * Its outline is exact: the faces are the centreline's offsets at ±t/2 (lines and concentric
 * arcs), the joints meet exactly, outside corners are mitred or rounded, and the ends are square
 * (src/lines/strip-outline.ts). It is an ordinary area shape; the panel shows the thin-wall
 * approximation beside its exact values.
 */
import { chainFromPath, LineError } from '../lines/chain';
import { stripOutline } from '../lines/strip-outline';
import type { Point, ShapeBase } from './base';
import { checkNumber, type Issue } from './check';
import { scalePoint, type ShapeKind } from './kind';
import { chainCornerRules } from './corners';
import { checkSegments, mapSegments, type PathSegment } from './path';
import { plural, pointsExtent, pointText, segmentPoints, segmentTable } from './schedule';

export const STRIP_CORNERS = ['mitre', 'round'] as const;
export type StripCornerKind = (typeof STRIP_CORNERS)[number];

export interface StripShape extends ShapeBase {
  type: 'strip';
  start: Point;
  segments: PathSegment[];
  thickness: number;
  /** How outside corners are closed; mitre when absent. */
  corners?: StripCornerKind;
}

/** The exact outline; throws LineError with a `segments[k]` path when the strip cannot be built. */
function outline(s: StripShape) {
  return [...stripOutline(chainFromPath(s.start, s.segments), s.thickness, s.corners ?? 'mitre')];
}

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  const before = out.length;
  checkNumber(s.thickness, `${path}.thickness`, out, { positive: true, name: 'thickness' });
  if (s.corners !== undefined && !(STRIP_CORNERS as readonly unknown[]).includes(s.corners)) out.push({ path: `${path}.corners`, message: `corners must be ${STRIP_CORNERS.join(' or ')}` });
  if (!checkSegments(s, path, out) || out.length > before) return;
  try {
    outline(s as unknown as StripShape);
  } catch (e) {
    if (!(e instanceof LineError)) throw e;
    // The strip's messages start with the segment they concern ("segments[2]: ...").
    const m = /^(segments\[\d+\](?:\.\w+)?): (.*)$/s.exec(e.message);
    out.push(m ? { path: `${path}.${m[1]}`, message: m[2] } : { path, message: e.message });
  }
}

export const stripKind: ShapeKind<StripShape> = {
  type: 'strip',
  label: 'Strip',
  validate,
  contours: outline,
  mayCrossItself: false,
  mapPoints: (s, f) => ({ ...s, start: f(s.start), segments: mapSegments(s.segments, f) }),
  scaled: (s, k) => ({ ...s, start: scalePoint(k)(s.start), segments: mapSegments(s.segments, scalePoint(k)), thickness: s.thickness * k }),
  corners: chainCornerRules<StripShape>(false),
  schedule: (s, f) => {
    const arcs = s.segments.filter((g) => g.via).length;
    return {
      params: [
        ['Thickness', f.len(s.thickness)],
        ['Corners', s.corners ?? 'mitre'],
        ['Centreline start', pointText(s.start, f)],
        ['Segments', `${s.segments.length} (${plural(s.segments.length - arcs, 'line')}, ${plural(arcs, 'arc')})`],
      ],
      table: segmentTable(s.start, s.segments, f, 'centreline segments'),
      extent: pointsExtent(segmentPoints(s.start, s.segments)),
    };
  },
};
