/**
 * Line element: an open chain of lines and three-point arcs (the same `start` and `segments` as a
 * path, without closing). It encloses no area and never takes part in the area booleans; the line
 * elements of one `group` form a line group (a weld group per unit throat), whose length,
 * centroid and second moments come from src/lines/.
 */
import { chainFromPath } from '../lines/chain';
import type { Point, ShapeBase } from './base';
import { dist, type Issue } from './check';
import { scalePoint, type ShapeKind } from './kind';
import { chainCornerRules } from './corners';
import { checkSegments, mapSegments, type PathSegment } from './path';
import { plural, pointsExtent, pointText, segmentPoints, segmentTable } from './schedule';

export interface LineShape extends ShapeBase {
  type: 'line';
  start: Point;
  segments: PathSegment[];
  /** The line group it belongs to; lines with no group form the group "Lines". */
  group?: string;
}

export const DEFAULT_LINE_GROUP = 'Lines';

function validate(s: Record<string, unknown>, path: string, out: Issue[]): void {
  if (s.group !== undefined && (typeof s.group !== 'string' || s.group.trim() === '')) out.push({ path: `${path}.group`, message: 'group must be a name (text)' });
  if (s.op !== undefined && s.op !== 'add') out.push({ path: `${path}.op`, message: 'a line element takes no operation: it encloses no area and stays out of the area booleans' });
  const r = checkSegments(s, path, out);
  if (r && !(r.extent > 0 || (s.segments as PathSegment[]).some((g) => g.via)) && dist(r.last, s.start as Point) === 0) {
    out.push({ path: `${path}.segments`, message: 'the line has no length' });
  }
}

export const lineKind: ShapeKind<LineShape> = {
  type: 'line',
  label: 'Line',
  validate,
  contours: () => [],
  line: { chains: (s) => [chainFromPath(s.start, s.segments)], group: (s) => s.group?.trim() || DEFAULT_LINE_GROUP },
  mayCrossItself: false,
  mapPoints: (s, f) => ({ ...s, start: f(s.start), segments: mapSegments(s.segments, f) }),
  scaled: (s, k) => ({ ...s, start: scalePoint(k)(s.start), segments: mapSegments(s.segments, scalePoint(k)) }),
  corners: chainCornerRules<LineShape>(false),
  schedule: (s, f) => {
    const arcs = s.segments.filter((g) => g.via).length;
    return {
      params: [
        ['Group', s.group?.trim() || DEFAULT_LINE_GROUP],
        ['Start', pointText(s.start, f)],
        ['Segments', `${s.segments.length} (${plural(s.segments.length - arcs, 'line')}, ${plural(arcs, 'arc')})`],
      ],
      table: segmentTable(s.start, s.segments, f, 'segments'),
      extent: pointsExtent(segmentPoints(s.start, s.segments)),
    };
  },
};
