/**
 * The material a proposal removes and adds (src/compare/material-change.ts), against hand
 * calculations by the composite method: the removed part of an off-centre notch and of a centred
 * hole, each checked moment by moment, and the proposal's Ix rebuilt from the baseline and the
 * removed part as a negative area.
 *
 * Sources: rectangle about its own axes Ix = bh³/12 and a circle πr⁴/4 (Gere & Goodno, Mechanics of
 * Materials, Appendix on plane areas, cases 1 and 9); transfer to other axes by the parallel-axis
 * theorem and holes as negative areas (Hibbeler, Statics, Sec. 10.4 "Moments of inertia for
 * composite areas"; Gere & Goodno Sec. 12.5) (section numbers from memory). The identity
 * proposal = baseline − removed + added for every moment is additivity (exact, no source needed).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { booleanRegions } from '../src/boolean';
import { materialChange } from '../src/compare';
import { polygonContour, reverseContour, type Region } from '../src/geometry/contour';
import { regionMoments, type RawMoments } from '../src/moments/kernel';
import { circle, close, props, rect, worst } from './helpers';

/** Raw moments about the origin of the rectangle [x1, x2] × [y1, y2], integrated by hand. */
function rectMoments(x1: number, x2: number, y1: number, y2: number): RawMoments {
  const b = x2 - x1, h = y2 - y1;
  return {
    m00: b * h,
    m10: (h * (x2 ** 2 - x1 ** 2)) / 2,
    m01: (b * (y2 ** 2 - y1 ** 2)) / 2,
    m20: (h * (x2 ** 3 - x1 ** 3)) / 3,
    m02: (b * (y2 ** 3 - y1 ** 3)) / 3,
    m11: ((x2 ** 2 - x1 ** 2) * (y2 ** 2 - y1 ** 2)) / 4,
  };
}

const KEYS: (keyof RawMoments)[] = ['m00', 'm10', 'm01', 'm20', 'm02', 'm11'];

function checkMoments(region: Region, hand: RawMoments, scale: Record<keyof RawMoments, number>): void {
  const m = regionMoments(region);
  for (const k of KEYS) close(m[k], hand[k], 1e-9, scale[k]);
}

const scaleFor = (L: number) => ({ m00: L ** 2, m10: L ** 3, m01: L ** 3, m20: L ** 4, m02: L ** 4, m11: L ** 4 });

describe('material removed by an off-centre notch in a plate 200 × 100', () => {
  // The notch is drawn past the plate's top edge: 40 wide from x = 120, from y = 70 up to 130.
  // Only the part inside the plate is removed: [120, 160] × [70, 100].
  const plate: Region = [rect(0, 0, 200, 100)];
  const proposal = booleanRegions(plate, [[rect(120, 70, 40, 60)]], 'difference');
  const c = materialChange(plate, proposal);

  it('removes exactly the notch inside the plate, moment by moment', () => {
    checkMoments(c.removed, rectMoments(120, 160, 70, 100), scaleFor(200));
    close(c.removedArea, 40 * 30, 1e-12);
  });
  it('adds nothing', () => {
    expect(c.added).toEqual([]);
    expect(c.addedArea).toBe(0);
  });
  it("rebuilds the proposal's Ix by the composite method (the notch as a negative area)", () => {
    // Plate: A1 = 20000, ȳ1 = 50, Ix1 = 200·100³/12. Notch: A2 = 1200, ȳ2 = 85, Ix2 = 40·30³/12.
    // ȳ = (A1ȳ1 − A2ȳ2)/(A1 − A2); Ix = Ix1 + A1(ȳ1 − ȳ)² − [Ix2 + A2(ȳ2 − ȳ)²].
    const A1 = 20000, y1 = 50, I1 = (200 * 100 ** 3) / 12;
    const A2 = 1200, y2 = 85, I2 = (40 * 30 ** 3) / 12;
    const A = A1 - A2, yb = (A1 * y1 - A2 * y2) / A;
    const Ix = I1 + A1 * (y1 - yb) ** 2 - (I2 + A2 * (y2 - yb) ** 2);
    const p = props(proposal);
    close(p.area, A, 1e-12);
    close(p.centroid.y, yb, 1e-12);
    close(p.Ix, Ix, 1e-10);
  });
});

describe('material removed by a centred hole Ø40 in the same plate', () => {
  const plate: Region = [rect(0, 0, 200, 100)];
  const proposal: Region = [rect(0, 0, 200, 100), reverseContour(circle(100, 50, 20))];
  const c = materialChange(plate, proposal);
  it('removes the disk, with its arcs exact', () => {
    // Disk about the origin: A = πr², ∫x dA = A·cx, ∫x² dA = πr⁴/4 + A·cx², ∫xy dA = A·cx·cy.
    const r = 20, A = Math.PI * r * r, I0 = (Math.PI * r ** 4) / 4;
    checkMoments(c.removed, { m00: A, m10: A * 100, m01: A * 50, m20: I0 + A * 100 ** 2, m02: I0 + A * 50 ** 2, m11: A * 100 * 50 }, scaleFor(200));
    expect(c.added).toEqual([]);
  });
});

describe('a proposal that removes and adds', () => {
  // Baseline: an angle made of two plates. Proposal: a cope cut off the leg's end and a
  // stiffener plate added beside it, partly over the existing material.
  const base: Region = booleanRegions([rect(0, 0, 100, 10)], [[rect(0, 0, 10, 80)]], 'union');
  const cope: Region = [rect(-5, 60, 20, 30)];
  const stiffener: Region = [rect(90, 5, 10, 40)];
  const proposal = booleanRegions(booleanRegions(base, [cope], 'difference'), [stiffener], 'union');
  const c = materialChange(base, proposal);
  it('removes the cope inside the leg and adds the stiffener above the flange', () => {
    checkMoments(c.removed, rectMoments(0, 10, 60, 80), scaleFor(100));
    checkMoments(c.added, rectMoments(90, 100, 10, 45), scaleFor(100));
  });
  it('proposal = baseline − removed + added, for every moment', () => {
    const b = regionMoments(base), p = regionMoments(proposal), r = regionMoments(c.removed), a = regionMoments(c.added);
    const s = scaleFor(100);
    for (const k of KEYS) close(p[k], b[k] - r[k] + a[k], 1e-9, s[k]);
  });
});

describe('edge cases', () => {
  const plate: Region = [rect(0, 0, 10, 10)];
  it('an unchanged proposal removes and adds nothing', () => {
    const c = materialChange(plate, plate);
    expect(c.removedArea).toBeLessThanOrEqual(1e-9);
    expect(c.addedArea).toBeLessThanOrEqual(1e-9);
  });
  it('an empty proposal removes the whole baseline; an empty baseline means all is added', () => {
    expect(materialChange(plate, []).removed).toBe(plate);
    expect(materialChange([], plate).added).toBe(plate);
    expect(materialChange([], []).removedArea).toBe(0);
  });
});

describe('additivity on fuzzed proposals (exact identity)', () => {
  it('proposal = baseline − removed + added', () => {
    const box = fc.record({ x: fc.integer({ min: -40, max: 90 }), y: fc.integer({ min: -40, max: 90 }), w: fc.integer({ min: 5, max: 60 }), h: fc.integer({ min: 5, max: 60 }) });
    fc.assert(
      fc.property(box, box, fc.boolean(), (cut, extra, round) => {
        const base: Region = [rect(0, 0, 100, 60), reverseContour(circle(30, 30, 10))];
        const cutRegion: Region = round ? [circle(cut.x, cut.y, cut.w / 2)] : [rect(cut.x, cut.y, cut.w, cut.h)];
        const proposal = booleanRegions(booleanRegions(base, [cutRegion], 'difference'), [[polygonContour([[extra.x, extra.y], [extra.x + extra.w, extra.y], [extra.x, extra.y + extra.h]])]], 'union');
        const c = materialChange(base, proposal);
        const b = regionMoments(base), p = regionMoments(proposal), r = c.removed.length ? regionMoments(c.removed) : null, a = c.added.length ? regionMoments(c.added) : null;
        const s = scaleFor(200);
        for (const k of KEYS) {
          const want = b[k] - (r ? r[k] : 0) + (a ? a[k] : 0);
          expect(Math.abs(p[k] - want)).toBeLessThanOrEqual(1e-9 * s[k]);
        }
      }),
      { numRuns: 60 },
    );
  });
});

afterAll(() => console.log(`material change: largest relative error against the hand values ${worst.value.toExponential(2)}`));
