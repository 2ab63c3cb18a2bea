/**
 * Which corner a handle stands on: the corners themselves come from the engine's kind modules
 * (`shapeCorners`, numbered as the exact fillet numbers them); this maps an editor handle
 * (a vertex, a path's start or a segment's end) to that number.
 */
import { shapeCorners, type Shape } from '../../src';
import type { HandleRef } from './kind';

/** The corner a vertex handle stands on, or null (arc middles, centres, placements). */
export function cornerOfHandle(s: Shape, ref: HandleRef): number | null {
  let index: number | null = null;
  if (ref.kind === 'vertex') index = ref.index;
  else if (ref.kind === 'start') index = 0;
  else if (ref.kind === 'to') index = ref.index + 1;
  if (index === null) return null;
  return shapeCorners(s).some((c) => c.index === index) ? index : null;
}
