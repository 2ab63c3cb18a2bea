/**
 * Perforated plates with random holes: some clear of everything (settled exactly, no grid), some
 * overlapping each other or the plate's edge (through the grid), some outside the plate. The
 * exact identity of additivity (no source needed) must hold for every moment:
 * (plate − holes) + (plate ∩ holes) = plate, and the union adds up the same way.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { booleanRegions } from '../src/boolean';
import { circleContour, polygonContour, type Region } from '../src/geometry/contour';
import { regionMoments, type RawMoments } from '../src/moments/kernel';

const W = 400, H = 200;
const plate: Region = [polygonContour([[0, 0], [W, 0], [W, H], [0, H]])];

const holes = fc.array(
  fc.record({
    x: fc.integer({ min: -20, max: W + 20 }),
    y: fc.integer({ min: -20, max: H + 20 }),
    r: fc.integer({ min: 2, max: 30 }),
  }),
  { minLength: 1, maxLength: 60 },
);

/** Largest difference of two moment sets, each moment relative to the plate's own. */
function gap(a: RawMoments, b: RawMoments): number {
  const ref = regionMoments(plate);
  let e = 0;
  for (const k of ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'] as const) e = Math.max(e, Math.abs(a[k] - b[k]) / Math.abs(ref[k]));
  return e;
}

const add = (a: RawMoments, b: RawMoments): RawMoments => ({
  m00: a.m00 + b.m00, m10: a.m10 + b.m10, m01: a.m01 + b.m01, m20: a.m20 + b.m20, m02: a.m02 + b.m02, m11: a.m11 + b.m11,
});

describe('perforated plates with random holes', () => {
  it('difference and intersection add up to the plate; union and intersection to plate plus holes', () => {
    fc.assert(
      fc.property(holes, (hs) => {
        const clips: Region[] = hs.map((h) => [circleContour(h.x, h.y, h.r)]);
        const diff = regionMoments(booleanRegions(plate, clips, 'difference'));
        const int = regionMoments(booleanRegions(plate, clips, 'intersection'));
        expect(gap(add(diff, int), regionMoments(plate))).toBeLessThan(1e-9);
        const uni = regionMoments(booleanRegions(plate, clips, 'union'));
        const allHoles = regionMoments(booleanRegions(clips[0], clips.slice(1), 'union'));
        expect(gap(add(uni, int), add(regionMoments(plate), allHoles))).toBeLessThan(1e-9);
      }),
      { numRuns: 60 },
    );
  });
});
