/**
 * Line elements along outlines: each contour of a region as a line element that runs all the way
 * round and ends on its start (a weld all round), lines as {to} and arcs as {to, via} with via
 * the arc's midpoint, exact. The drafter then removes the segments that are not welded.
 */
import type { Region } from '../geometry/contour';
import { contourToPath } from './from-region';
import type { LineShape } from './line';

/** One line element per contour of the region (holes included), in the group given (none: the default group). */
export function linesAlongOutline(region: Region, group?: string): Omit<LineShape, 'id'>[] {
  return region.map((c) => {
    const p = contourToPath(c, '', undefined);
    const line: Omit<LineShape, 'id'> = { type: 'line', start: p.start, segments: p.segments };
    if (group?.trim()) line.group = group.trim();
    return line;
  });
}
