/**
 * The incremental evaluator must give exactly what a fresh evaluation gives, whatever sequence of
 * edits it sees (drags, op switches, reorders, deletions). Exact identity, no outside source.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createEvaluator, evaluateDocument, translateShape, type SectionDocument, type Shape } from '../src';

const base: Shape[] = [
  { id: 'plate', type: 'rectangle', at: [0, 0], width: 200, height: 20 },
  { id: 'web', type: 'rectangle', at: [90, 20], width: 20, height: 150 },
  { id: 'tube', type: 'round-tube', at: [40, 60], outerDiameter: 40, wall: 5 },
  { id: 'hole', type: 'circle', center: [100, 10], radius: 6, op: 'subtract' },
  { id: 'bar', type: 'circle', center: [150, 30], radius: 12 },
  { id: 'clip', type: 'polygon', points: [[-10, -10], [210, -10], [210, 160], [-10, 160]], op: 'intersect' },
  { id: 'angle', type: 'angle', at: [120, 20], legVertical: 60, legHorizontal: 50, thickness: 6, rootRadius: 6 },
  { id: 'lug', type: 'path', start: [20, 20], segments: [{ to: [60, 20] }, { to: [60, 50], via: [72, 35] }, { to: [20, 20] }] },
];

type Edit = { kind: 'move'; k: number; dx: number; dy: number } | { kind: 'op'; k: number; op: 'add' | 'subtract' | 'intersect' } | { kind: 'swap'; k: number } | { kind: 'drop'; k: number };

function apply(shapes: Shape[], e: Edit): Shape[] {
  if (shapes.length === 0) return shapes;
  const k = e.k % shapes.length;
  const out = shapes.slice();
  if (e.kind === 'move') out[k] = translateShape(out[k], e.dx, e.dy);
  else if (e.kind === 'op') out[k] = { ...out[k], op: e.op };
  else if (e.kind === 'swap' && k + 1 < out.length) [out[k], out[k + 1]] = [out[k + 1], out[k]];
  else if (e.kind === 'drop' && out.length > 1) out.splice(k, 1);
  return out;
}

const editArb: fc.Arbitrary<Edit> = fc.oneof(
  { weight: 6, arbitrary: fc.record({ kind: fc.constant('move' as const), k: fc.nat(10), dx: fc.double({ min: -15, max: 15, noNaN: true }), dy: fc.double({ min: -15, max: 15, noNaN: true }) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('op' as const), k: fc.nat(10), op: fc.constantFrom('add' as const, 'subtract' as const, 'intersect' as const) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('swap' as const), k: fc.nat(10) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('drop' as const), k: fc.nat(10) }) },
);

describe('incremental evaluation', () => {
  it('matches a fresh evaluation after any sequence of edits', () => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 12 }), (edits) => {
        const ev = createEvaluator();
        let shapes = base;
        const doc = (s: Shape[]): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes: s });
        ev.evaluate(doc(shapes));
        for (const e of edits) {
          shapes = apply(shapes, e);
          const inc = ev.evaluate(doc(shapes));
          const fresh = evaluateDocument(doc(shapes));
          expect(inc.message).toBe(fresh.message);
          if (fresh.props && inc.props) {
            const scale = fresh.props.J0;
            expect(Math.abs(inc.props.area - fresh.props.area)).toBeLessThanOrEqual(1e-9 * fresh.props.area);
            for (const key of ['Ix', 'Iy', 'Ixy'] as const) expect(Math.abs(inc.props[key] - fresh.props[key])).toBeLessThanOrEqual(1e-9 * scale);
          } else expect(inc.props).toBe(fresh.props);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('reuses unchanged work: the same document returns the same region object', () => {
    const ev = createEvaluator();
    const d: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: base };
    const a = ev.evaluate(d);
    const b = ev.evaluate({ ...d, shapes: d.shapes.slice() });
    expect(b.region).toBe(a.region);
    expect(b.props).toBe(a.props);
  });
});
