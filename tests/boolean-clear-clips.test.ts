/**
 * Clips clear of every other boundary are settled by one exact winding number of the subject
 * (src/boolean/index.ts with region-winding.ts) instead of going through the grid. They must give
 * what the general pipeline gives: the same moments, exactly, for difference and union, with the
 * subject a plate with its own openings (a clip inside an opening is outside the material) and
 * an arc-bounded outline, and the clips circles and squares anywhere: clear inside, clear in an
 * opening, outside, across an edge, overlapping each other. (Identity check, no source needed.)
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { booleanRegions } from '../src/boolean';
import { runBoolean } from '../src/boolean/engine';
import { circleContour, polygonContour, reverseContour, type Region } from '../src/geometry/contour';
import { regionMoments, type RawMoments } from '../src/moments/kernel';

// A 400 × 200 plate with a semicircular right end (an arc boundary), one rectangular and one
// round opening.
const outline = polygonContour([[0, 0], [400, 0], [400, 200], [0, 200]]);
const withArcEnd = { xy: new Float64Array([0, 0, 400, 0, 400, 200, 0, 200]), bulge: new Float64Array([0, 1, 0, 0]) };
const openings = [reverseContour(polygonContour([[40, 40], [120, 40], [120, 160], [40, 160]])), reverseContour(circleContour(300, 100, 40))];

const clip = fc.oneof(
  fc.record({ x: fc.integer({ min: -30, max: 530 }), y: fc.integer({ min: -30, max: 230 }), r: fc.integer({ min: 1, max: 25 }) }).map(({ x, y, r }): Region => [circleContour(x, y, r)]),
  fc.record({ x: fc.integer({ min: -30, max: 530 }), y: fc.integer({ min: -30, max: 230 }), a: fc.integer({ min: 1, max: 30 }) }).map(({ x, y, a }): Region => [polygonContour([[x, y], [x + a, y], [x + a, y + a], [x, y + a]])]),
);

function gap(a: RawMoments, b: RawMoments, ref: RawMoments): number {
  let e = 0;
  for (const k of ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'] as const) e = Math.max(e, Math.abs(a[k] - b[k]) / Math.abs(ref[k]));
  return e;
}

describe('clips clear of every boundary', () => {
  it('give the general pipeline’s moments for difference and union', () => {
    let worst = 0;
    fc.assert(
      fc.property(fc.boolean(), fc.array(clip, { minLength: 1, maxLength: 40 }), fc.constantFrom('difference' as const, 'union' as const), (arcEnd, clips, op) => {
        const subject: Region = [arcEnd ? withArcEnd : outline, ...openings];
        const fast = regionMoments(booleanRegions(subject, clips, op));
        const general = regionMoments(runBoolean([{ contours: subject, group: 0 }, { contours: clips.flat(), group: 1 }], op).region);
        const e = gap(fast, general, regionMoments(subject));
        worst = Math.max(worst, e);
        expect(e).toBeLessThan(1e-12);
      }),
      { numRuns: 300 },
    );
    console.log(`boolean-clear-clips: largest relative difference ${worst.toExponential(2)}`);
  });

  it('keep a clear hole as the hole itself: the result holds the clip turned round', () => {
    const hole = circleContour(200, 100, 10);
    const out = booleanRegions([outline], [[hole]], 'difference');
    expect(out.length).toBe(2);
    const m = regionMoments(out);
    // Plate minus a circle: A = 400·200 − π·10² (Gere & Goodno, composite areas).
    expect(Math.abs(m.m00 - (400 * 200 - Math.PI * 100)) / (400 * 200)).toBeLessThan(1e-14);
    // A clip inside the round opening removes nothing.
    const inOpening = booleanRegions([outline, ...openings], [[circleContour(300, 100, 5)]], 'difference');
    expect(Math.abs(regionMoments(inOpening).m00 - regionMoments([outline, ...openings]).m00)).toBeLessThan(1e-9);
  });
});
