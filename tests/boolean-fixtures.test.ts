/**
 * End-to-end boolean cases replayed from tests/fixtures/boolean/<case>/: input.json holds the
 * operation and operands, expected.json the exact result region derived by hand (its source is
 * stated in the file). The output must have the same moments and the same loops.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { booleanRegions, type BoolOp } from '../src/boolean';
import { contourFrom, type Contour } from '../src/geometry/contour';
import { regionMoments } from '../src/moments/kernel';
import { KEYS } from './fixtures/boolean/shapes';

interface JsonContour {
  xy: number[];
  bulge: number[] | null;
}
const dir = join(__dirname, 'fixtures', 'boolean');
const toContour = (c: JsonContour): Contour => contourFrom(c.xy, c.bulge);
const cases = readdirSync(dir, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name).sort();

describe('boolean fixtures', () => {
  it('finds the fixture folders', () => {
    expect(cases.length).toBeGreaterThanOrEqual(7);
  });
  for (const name of cases) {
    it(name, () => {
      const input = JSON.parse(readFileSync(join(dir, name, 'input.json'), 'utf8')) as { op: BoolOp; subject: JsonContour[]; clips: JsonContour[][] };
      const expected = JSON.parse(readFileSync(join(dir, name, 'expected.json'), 'utf8')) as { source: string; region: JsonContour[]; loops?: 'any' };
      expect(expected.source.length).toBeGreaterThan(0);
      const out = booleanRegions(input.subject.map(toContour), input.clips.map((r) => r.map(toContour)), input.op);
      const ref = expected.region.map(toContour);
      const m = regionMoments(out), e = regionMoments(ref);
      // Source: expected.json "source" (hand-derived exact region).
      const L = Math.sqrt(Math.abs(e.m00));
      KEYS.forEach((k, i) => {
        const scale = Math.pow(L, 2 + [0, 1, 1, 2, 2, 2][i]) + Math.abs(e[k]);
        expect(Math.abs(m[k] - e[k])).toBeLessThanOrEqual(1e-12 * scale);
      });
      // Same loops: count, orientation of each, and the total arc sweep (arcs come back exact).
      if (expected.loops !== 'any') {
        expect(out.length).toBe(ref.length);
        const signs = (r: Contour[]) => r.map((c) => Math.sign(regionMoments([c]).m00)).sort();
        expect(signs(out as Contour[])).toEqual(signs(ref));
      }
      const sweep = (r: readonly Contour[]) => r.reduce((s, c) => s + (c.bulge ? Array.from(c.bulge).reduce((t, b) => t + Math.abs(4 * Math.atan(b)), 0) : 0), 0);
      expect(Math.abs(sweep(out) - sweep(ref))).toBeLessThan(1e-9);
    });
  }
});
