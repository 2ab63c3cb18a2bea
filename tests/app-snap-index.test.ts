/**
 * The snap points' crossings between shapes, found through an R-tree, are exactly the crossings a
 * test of every pair of segments of different shapes finds (the index only skips pairs whose
 * boxes do not meet, which cannot cross).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createEvaluator, regionSegments, segmentIntersections, type SectionDocument, type Shape } from '../src';
import { snapPoints } from '../app/geometry/snap';

const key = (x: number, y: number) => `${x.toPrecision(12)},${y.toPrecision(12)}`;

describe('snap crossings through the spatial index', () => {
  it('equal the crossings of every pair of segments of different shapes', () => {
    const shape = fc.oneof(
      fc.record({ type: fc.constant('circle' as const), center: fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: -50, max: 50 })), radius: fc.integer({ min: 3, max: 40 }) }),
      fc.record({ type: fc.constant('rectangle' as const), at: fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: -50, max: 50 })), width: fc.integer({ min: 2, max: 60 }), height: fc.integer({ min: 2, max: 60 }) }),
    );
    fc.assert(
      fc.property(fc.array(shape, { minLength: 1, maxLength: 8 }), (raw) => {
        const shapes = raw.map((s, i) => ({ id: `s${i}`, ...s }) as Shape);
        const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes };
        const results = createEvaluator().shapes(doc);
        const got = snapPoints(results, true)
          .filter((p) => p.kind === 'intersection')
          .map((p) => key(p.x, p.y))
          .sort();
        const want: string[] = [];
        const segs = results.map((r) => regionSegments(r.region));
        for (let i = 0; i < segs.length; i++)
          for (let j = i + 1; j < segs.length; j++)
            for (const a of segs[i]) for (const b of segs[j]) for (const [x, y] of segmentIntersections(a, b)) want.push(key(x, y));
        expect(got).toEqual(want.sort());
      }),
      { numRuns: 1000 },
    );
  });

  it('finds a circle grazing an edge a rounding error outside its box (regression, seed 581386360)', () => {
    const shapes = [
      { id: 'a', type: 'rectangle', at: [-37, -50], width: 2, height: 19 },
      { id: 'b', type: 'circle', center: [-36, 2], radius: 33 },
    ] as Shape[];
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes };
    const hits = snapPoints(createEvaluator().shapes(doc), true).filter((p) => p.kind === 'intersection');
    // The circle's lowest point (−36, 2 − 33) touches the rectangle's top edge y = −31.
    expect(hits.some((p) => Math.abs(p.x + 36) < 1e-9 && Math.abs(p.y + 31) < 1e-9)).toBe(true);
  });
});
