/**
 * Fuzzed cutouts: the cautions never throw and never carry NaN, and for one round hole in a plate
 * the exact distances equal the hand formula (distance from the centre to the nearest side of the
 * rectangle, min(x, W − x, y, H − y); the clear distance and the ligament are that less r).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDocument, type SectionDocument, type Shape } from '../src';
import { analyseCutouts } from '../src/cautions';
import { close, worst } from './helpers';

const W = 200, H = 100;

function build(extra: Shape[]): { doc: SectionDocument; base: SectionDocument } {
  const plate: Shape = { id: 'p', name: 'Plate', type: 'rectangle', at: [0, 0], width: W, height: H };
  return {
    base: { format: 'kern-section', version: 2, units: 'mm', shapes: [plate] },
    doc: { format: 'kern-section', version: 2, units: 'mm', shapes: [plate, ...extra] },
  };
}

const holeArb = fc.record({ x: fc.double({ min: 3, max: W - 3, noNaN: true }), y: fc.double({ min: 3, max: H - 3, noNaN: true }), r: fc.double({ min: 0.5, max: 2.9, noNaN: true }) });
const notchArb = fc.record({ x: fc.double({ min: -20, max: W, noNaN: true }), y: fc.double({ min: -20, max: H, noNaN: true }), w: fc.double({ min: 1, max: 60, noNaN: true }), h: fc.double({ min: 1, max: 60, noNaN: true }) });

function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === 'object') return Object.values(v).every(allFinite);
  return true;
}

describe('fuzzed cutouts', () => {
  it('never throw and never give NaN, plain or against the baseline, with either rule set', () => {
    fc.assert(
      fc.property(fc.array(holeArb, { maxLength: 4 }), fc.array(notchArb, { maxLength: 2 }), fc.boolean(), (holes, notches, aisc) => {
        const shapes: Shape[] = [
          ...notches.map((n, k) => ({ id: `n${k}`, type: 'rectangle' as const, at: [n.x, n.y] as [number, number], width: n.w, height: n.h, op: 'subtract' as const })),
          ...holes.map((h, k) => ({ id: `h${k}`, type: 'circle' as const, center: [h.x, h.y] as [number, number], radius: h.r, op: 'subtract' as const })),
        ];
        const { doc, base } = build(shapes);
        const ev = evaluateDocument(doc);
        const input = { result: ev.region, shapes: doc.shapes.map((s, k) => ({ id: s.id, op: s.op ?? 'add', region: ev.shapes[k].region })) };
        for (const baseline of [undefined, evaluateDocument(base).region]) {
          const f = analyseCutouts({ ...input, baseline }, { rules: aisc ? 'aisc360' : 'en1993', units: 'mm' });
          for (const c of f.cautions) {
            expect(allFinite(c.at) && allFinite(c.values ?? {})).toBe(true);
            expect(c.message).not.toMatch(/NaN|undefined|Infinity/);
          }
          for (const l of f.ligaments) expect(l.width).toBeGreaterThan(0);
        }
      }),
      { numRuns: 60, seed: 3 },
    );
  });

  it('one round hole: edge distance, clear distance and ligament by the hand formula', () => {
    fc.assert(
      fc.property(holeArb, (h) => {
        const { doc } = build([{ id: 'h', type: 'circle', center: [h.x, h.y], radius: h.r, op: 'subtract' }]);
        const f = analyseCutouts({ result: evaluateDocument(doc).region });
        const e = Math.min(h.x, W - h.x, h.y, H - h.y);
        expect(f.holes).toHaveLength(1);
        close(f.holes[0].edge!.centreDistance, e, 1e-9, W);
        close(f.holes[0].edge!.clearDistance, e - h.r, 1e-9, W);
        close(f.holes[0].d0, 2 * h.r, 1e-12);
        expect(f.ligaments).toHaveLength(1);
        close(f.ligaments[0].width, e - h.r, 1e-9, W);
      }),
      { numRuns: 80, seed: 5 },
    );
  });
});

afterAll(() => {
  console.log(`cautions-fuzz: largest relative error at tight tolerance ${worst.value.toExponential(2)}`);
});
