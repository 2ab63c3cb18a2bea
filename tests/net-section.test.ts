/**
 * Net section along a line, against hand calculations: a flat bar with a row of three holes
 * (net width = gross width − Σ hole diameters on a line through the centres, the net width of a
 * straight failure path: AISC 360-16, Section B4.3b; EN 1993-1-1, 6.2.2.2, from memory), chords
 * of a circle off its centre (2√(r² − e²), Pythagoras), and the classification of each gap.
 * Horizontal lines are also checked against Kern's horizontal cut width b (src/moments/cut.ts),
 * a separate computation of the same length (Σ x_entry − Σ x_exit of the moment integrals).
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDocument, type SectionDocument } from '../src';
import { contourFrom, polygonContour, reverseContour, transformContour, type Region } from '../src/geometry/contour';
import { cutSection } from '../src/properties/section';
import { netSection, NetSectionError } from '../src/netsection';
import { circle, close, props, rect, worst } from './helpers';

/** Flat bar 100 wide (x) and 200 long (y), three holes Ø22 at x = 50, y = 40, 100, 160. */
const bar: Region = [rect(0, 0, 100, 200), ...[40, 100, 160].map((y) => reverseContour(circle(50, y, 11)))];

describe('row of three holes', () => {
  it('line through the centres: net = gross − 3 d0 (hand: 200 − 3·22 = 134)', () => {
    const r = netSection(bar, { x: 50, y: -10 }, { x: 50, y: 210 });
    close(r.grossLength, 200, 1e-12);
    close(r.netLength, 134, 1e-12);
    expect(r.gaps).toHaveLength(3);
    [40, 100, 160].forEach((yc, k) => {
      const g = r.gaps[k];
      expect(g.kind).toBe('hole');
      close(g.diameter!, 22, 1e-12);
      close(g.centre!.y, yc, 1e-12);
      // Distances from the start point (y = −10): the hole spans yc ± 11.
      close(g.from, yc - 11 + 10, 1e-12);
      close(g.to, yc + 11 + 10, 1e-12);
      close(g.length, 22, 1e-12);
    });
    expect(r.entry).toEqual({ x: 50, y: 0 });
    close(r.exit!.y, 200, 1e-12);
    expect(r.notes).toEqual([]);
    expect(r.purpose).toMatch(/Tension checks/);
    expect(r.caution).toMatch(/staggered holes/);
    expect(r.caution).toMatch(/effective net area/);
  });

  it('line 5 off the centres: each hole takes its chord 2√(11² − 5²)', () => {
    const r = netSection(bar, { x: 55, y: -10 }, { x: 55, y: 210 });
    const chord = 2 * Math.sqrt(11 * 11 - 5 * 5);
    close(r.netLength, 200 - 3 * chord, 1e-12);
    for (const g of r.gaps) close(g.length, chord, 1e-12);
  });

  it('at any position and size: moved far from the origin and scaled, to 1e-9', () => {
    for (const [k, dx, dy] of [[1e-3, 5e3, -2e3], [1e3, -4e6, 7e6], [1, 1e5, 1e5]]) {
      const moved = bar.map((c) => transformContour(c, k, 0, 0, k, dx, dy));
      const r = netSection(moved, { x: 50 * k + dx, y: -10 * k + dy }, { x: 50 * k + dx, y: 210 * k + dy });
      close(r.grossLength, 200 * k, 1e-9);
      close(r.netLength, 134 * k, 1e-9);
      for (const g of r.gaps) close(g.diameter!, 22 * k, 1e-9);
    }
  });

  it('the same row built by subtracting circle shapes (the document pipeline)', () => {
    const doc: SectionDocument = {
      format: 'kern-section', version: 2, units: 'mm',
      shapes: [
        { id: 'bar', type: 'rectangle', at: [0, 0], width: 100, height: 200 },
        ...[40, 100, 160].map((y, k) => ({ id: `h${k}`, type: 'circle' as const, center: [50, y] as [number, number], radius: 11, op: 'subtract' as const })),
      ],
    };
    const region = evaluateDocument(doc).region;
    const r = netSection(region, { x: 50, y: 210 }, { x: 50, y: -10 });
    close(r.grossLength, 200, 1e-12);
    close(r.netLength, 134, 1e-12);
    expect(r.gaps.map((g) => g.diameter)).toEqual([22, 22, 22].map(() => expect.closeTo(22, 10)));
  });

  it('an inclined line from edge to edge through the middle hole only', () => {
    // From (0, 40) to (100, 160): length √(100² + 120²); it passes through the centre (50, 100)
    // and misses the other holes (distance 50·120/√(100² + 120²) = 38.4 > 11).
    const r = netSection(bar, { x: 0, y: 40 }, { x: 100, y: 160 });
    const L = Math.hypot(100, 120);
    close(r.grossLength, L, 1e-12);
    close(r.netLength, L - 22, 1e-12);
    expect(r.gaps).toHaveLength(1);
    expect(r.notes).toEqual([]);
  });
});

describe('kinds of gaps and special lines', () => {
  it('a notch in the outline', () => {
    // Plate 200 × 100 with a slot 20 wide and 40 deep cut down from the middle of the top edge.
    const notched: Region = [polygonContour([[0, 0], [200, 0], [200, 100], [110, 100], [110, 60], [90, 60], [90, 100], [0, 100]])];
    const r = netSection(notched, { x: -5, y: 80 }, { x: 205, y: 80 });
    close(r.grossLength, 200, 1e-12);
    close(r.netLength, 180, 1e-12);
    expect(r.gaps).toHaveLength(1);
    expect(r.gaps[0].kind).toBe('notch');
    expect(r.gaps[0].diameter).toBeNull();
  });

  it('a gap between separate parts', () => {
    const parts: Region = [rect(0, 0, 50, 100), rect(80, 0, 50, 100)];
    const r = netSection(parts, { x: -10, y: 50 }, { x: 140, y: 50 });
    close(r.grossLength, 130, 1e-12);
    close(r.netLength, 100, 1e-12);
    expect(r.gaps[0].kind).toBe('between-parts');
    close(r.gaps[0].length, 30, 1e-12);
  });

  it('a rectangular hole is a hole with no diameter', () => {
    const plate: Region = [rect(0, 0, 200, 100), reverseContour(rect(50, 30, 40, 40))];
    const r = netSection(plate, { x: 0, y: 50 }, { x: 200, y: 50 });
    close(r.netLength, 160, 1e-12);
    expect(r.gaps[0]).toMatchObject({ kind: 'hole', diameter: null });
  });

  it('a line that misses, one that starts inside, one tangent to a hole, one along an edge', () => {
    const miss = netSection(bar, { x: -10, y: -10 }, { x: -5, y: 300 });
    expect(miss.grossLength).toBe(0);
    expect(miss.netLength).toBe(0);
    expect(miss.notes[0]).toMatch(/does not cross/);

    const inside = netSection(bar, { x: 50, y: 70 }, { x: 50, y: 210 });
    close(inside.grossLength, 130, 1e-12);
    close(inside.netLength, 130 - 44, 1e-12);
    expect(inside.notes[0]).toMatch(/starts inside/);

    // Tangent to all three holes at x = 61: they touch the line at one point and take nothing.
    const tangent = netSection(bar, { x: 61, y: -10 }, { x: 61, y: 210 });
    close(tangent.netLength, 200, 1e-12);
    expect(tangent.gaps).toEqual([]);

    const edge = netSection(bar, { x: 0, y: -10 }, { x: 0, y: 210 });
    close(edge.netLength, 200, 1e-12);
    expect(edge.notes.join(' ')).toMatch(/along an edge/);
  });

  it('refuses a line of no length or with non-finite points', () => {
    expect(() => netSection(bar, { x: 1, y: 1 }, { x: 1, y: 1 })).toThrow(NetSectionError);
    expect(() => netSection(bar, { x: NaN, y: 1 }, { x: 1, y: 1 })).toThrow(/finite/);
  });
});

/** A plate with random round holes, and a pierced arc-bounded lug, for the cross-checks. */
const holeArb = fc.record({ x: fc.double({ min: 15, max: 185, noNaN: true }), y: fc.double({ min: 15, max: 85, noNaN: true }), r: fc.double({ min: 1, max: 12, noNaN: true }) });

function plateWithHoles(holes: { x: number; y: number; r: number }[]): Region {
  const doc: SectionDocument = {
    format: 'kern-section', version: 2, units: 'mm',
    shapes: [
      { id: 'p', type: 'rectangle', at: [0, 0], width: 200, height: 100, cornerRadius: 8 },
      ...holes.map((h, k) => ({ id: `h${k}`, type: 'circle' as const, center: [h.x, h.y] as [number, number], radius: h.r, op: 'subtract' as const })),
    ],
  };
  return evaluateDocument(doc).region;
}

describe('cross-checks', () => {
  it('horizontal lines give the cut width b of the moment integrals (moments/cut.ts)', () => {
    fc.assert(
      fc.property(fc.array(holeArb, { maxLength: 5 }), fc.double({ min: 0.5, max: 99.5, noNaN: true }), (holes, y) => {
        const region = plateWithHoles(holes);
        const b = cutSection(region, 'y', y, props(region)).width;
        const r = netSection(region, { x: -10, y }, { x: 210, y });
        close(r.netLength, b, 1e-9, 200);
        close(r.netLength + r.gaps.reduce((s, g) => s + g.length, 0), r.grossLength, 1e-12, 200);
      }),
      { numRuns: 60, seed: 7 },
    );
  });

  it('a lug bounded by arcs: the line through the pin hole loses the hole diameter', () => {
    // Lug: half-disc of radius 40 on a 80 × 60 block, pin hole Ø30 at the disc centre (0, 60).
    const outline = contourFrom([-40, 0, 40, 0, 40, 60, -40, 60], [0, 0, 1, 0]);
    const lug: Region = [outline, reverseContour(circle(0, 60, 15))];
    const r = netSection(lug, { x: -50, y: 60 }, { x: 50, y: 60 });
    close(r.grossLength, 80, 1e-12);
    close(r.netLength, 50, 1e-12);
    // Vertical line through the pin: the disc top at y = 100, the hole from 45 to 75.
    const v = netSection(lug, { x: 0, y: -10 }, { x: 0, y: 120 });
    close(v.grossLength, 100, 1e-12);
    close(v.netLength, 70, 1e-12);
  });

  it('fuzzed lines never throw and never give NaN; net ≤ gross ≤ line length', () => {
    const pt = fc.record({ x: fc.double({ min: -50, max: 250, noNaN: true }), y: fc.double({ min: -50, max: 150, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(holeArb, { maxLength: 4 }), pt, pt, (holes, p, q) => {
        fc.pre(Math.hypot(q.x - p.x, q.y - p.y) > 1e-6);
        const r = netSection(plateWithHoles(holes), p, q);
        const nums = [r.grossLength, r.netLength, ...r.gaps.flatMap((g) => [g.from, g.to, g.length])];
        expect(nums.every(Number.isFinite)).toBe(true);
        expect(r.netLength).toBeLessThanOrEqual(r.grossLength + 1e-9);
        expect(r.grossLength).toBeLessThanOrEqual(r.lineLength * (1 + 1e-12));
      }),
      { numRuns: 80, seed: 11 },
    );
  });
});

afterAll(() => {
  console.log(`net-section: largest relative error at tight tolerance ${worst.value.toExponential(2)}`);
});
