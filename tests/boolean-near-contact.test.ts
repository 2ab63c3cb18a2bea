/**
 * Booleans where two boundaries come closer than the chords clipper is given: nearly equal
 * circles that cross (lunes far thinner than a chord's sagitta), a circle that pokes a hair past
 * a straight edge, a flat arc that passes a corner, a circle that crosses two fillets just past
 * their tangent points, and a few more found by random runs. Each once gave a result off by far
 * more than round-off.
 */
import { describe, expect, it } from 'vitest';
import { booleanRegions } from '../src/boolean';
import type { Region } from '../src/geometry/contour';
import { regionMoments } from '../src/moments/kernel';
import { circle, maxRelDiff, rect, sumMoments } from './fixtures/boolean/shapes';

/**
 * Area of a circular segment of radius r and half angle a: Young & Budynas, Roark's Formulas for
 * Stress and Strain (8th ed.), Appendix Table A.1, circular segment, A = r^2 (a - sin a cos a).
 * Written as r^2 (x - sin x) / 2 with x = 2a, and by its Taylor series for small x, where the
 * difference would cancel.
 */
function segmentArea(r: number, a: number): number {
  const x = 2 * a;
  const f = x < 1e-2 ? x ** 3 / 6 - x ** 5 / 120 + x ** 7 / 5040 : x - Math.sin(x);
  return (r * r * f) / 2;
}

/** Area common to two circles of radii r1, r2 whose centres are D apart (they cross): two segments on the common chord. */
function lensArea(r1: number, r2: number, D: number): number {
  const a = (D * D + (r1 - r2) * (r1 + r2)) / (2 * D); // chord's distance from centre 1 (signed)
  const h = Math.sqrt((r1 - a) * (r1 + a)); // half chord
  // Half angles seen from each centre; a segment beyond the centre is more than half its circle.
  const a1 = Math.atan2(h, a), a2 = Math.atan2(h, D - a);
  return segmentArea(r1, a1) + segmentArea(r2, a2);
}

const area = (r: Region) => regionMoments(r).m00;

describe('nearly equal circles that cross', () => {
  // Circle A (radius 1) and circle B (radius 1 - d) with centres D = d + t apart: they cross,
  // B pokes out of A along a lune of thickness t, A out of B along one of 2d + t. The chords of
  // an arc sag by up to 5e-3 of its radius, far more than either lune.
  const cases: [number, number][] = [[1e-4, 1e-5], [1e-3, 1e-7], [1e-6, 1e-6], [2e-3, 4e-3], [1e-5, 1e-9], [1e-3, 1e-9], [1e-9, 1e-9]];
  for (const [d, t] of cases) {
    for (const th of [0.3, Math.PI / 2, 2.1]) {
      it(`d=${d}, t=${t}, direction ${th.toFixed(2)}`, () => {
        const r1 = 1, r2 = 1 - d, D = d + t;
        const ox = 12.5, oy = -3.25;
        const A: Region = [circle(ox, oy, r1)];
        const B: Region = [circle(ox + D * Math.cos(th), oy + D * Math.sin(th), r2)];
        const lens = lensArea(r1, r2, D);
        const i = area(booleanRegions(A, [B], 'intersection'));
        const u = area(booleanRegions(A, [B], 'union'));
        const aMinusB = area(booleanRegions(A, [B], 'difference'));
        const bMinusA = area(booleanRegions(B, [A], 'difference'));
        // Roark Table A.1, circular segment (two segments on the common chord), and the circle
        // area pi r^2 (Gere & Goodno, App. D). The lunes are the circles less the lens.
        expect(Math.abs(i - lens)).toBeLessThan(1e-12);
        expect(Math.abs(u - (Math.PI * (r1 * r1 + r2 * r2) - lens))).toBeLessThan(1e-12);
        expect(Math.abs(aMinusB - (Math.PI * r1 * r1 - lens))).toBeLessThan(1e-12);
        expect(Math.abs(bMinusA - (Math.PI * r2 * r2 - lens))).toBeLessThan(1e-12);
        // The thin lune is there, even where it is thinner than the integer grid clipper works on
        // (2.5e-8 here): for t = 1e-9 its area is about 2e-11, near the 1e-12 bound above.
        expect(Math.abs(bMinusA / (Math.PI * r2 * r2 - lens) - 1)).toBeLessThan(0.1);
      });
    }
  }

  it('a ring and a circle a hair smaller and off centre (found by a random run)', () => {
    const A: Region = [
      { xy: Float64Array.from([1, 0, -1, 0]), bulge: Float64Array.from([1, 1]) },
      { xy: Float64Array.from([-0.3, 0, 0.3, 0]), bulge: Float64Array.from([-1, -1]) },
    ];
    const B: Region = [{ xy: Float64Array.from([0.9998750223600789, 0.0001356902929962935, -0.9998750223600789, 0.0001356902929962935]), bulge: Float64Array.from([1, 1]) }];
    const r2 = 0.9998750223600789, D = 0.0001356902929962935;
    const lens = lensArea(1, r2, D);
    // As above, with the hole (radius 0.3, inside both circles) taken from A and from the lens.
    const hole = Math.PI * 0.09;
    expect(Math.abs(area(booleanRegions(A, [B], 'intersection')) - (lens - hole))).toBeLessThan(1e-12);
    expect(Math.abs(area(booleanRegions(A, [B], 'union')) - (Math.PI * (1 + r2 * r2) - lens))).toBeLessThan(1e-12);
  });
});

describe('a circle that pokes a hair past a straight edge', () => {
  // Circle of radius 0.25 inside the rectangle [-0.5, 0.5] x [-0.25, 0.25], raised by e: it
  // crosses the top edge and leaves a cap of height e, and it clears the bottom edge by e.
  for (const e of [4.838821693293155e-8, 1e-6, 3e-5]) {
    it(`raised by ${e}`, () => {
      const r = 0.25;
      const A: Region = [rect(-0.5, -0.25, 0.5, 0.25)];
      const B: Region = [circle(0, e, r)];
      const cap = segmentArea(r, Math.acos((r - e) / r)); // Roark Table A.1, circular segment
      const disc = Math.PI * r * r; // Gere & Goodno, App. D
      expect(Math.abs(area(booleanRegions(A, [B], 'intersection')) - (disc - cap))).toBeLessThan(1e-15);
      expect(Math.abs(area(booleanRegions(B, [A], 'difference')) - cap)).toBeLessThan(1e-15);
      expect(Math.abs(area(booleanRegions(A, [B], 'union')) - (0.5 + cap))).toBeLessThan(1e-15);
    });
  }
});

describe('a flat arc that passes a corner', () => {
  // A square turned 45 degrees (corners at distance 0.75 from the origin), one side bowed out
  // by a bulge of 3.2e-7: so flat that the engine keeps it as its chord (carriers.ts), yet it
  // rises 1.7e-7 above the chord, several integer units. The rectangle's corner (0.5, -0.25)
  // lies on that chord, so the rectangle is inside the square, 1.5e-7 clear of the arc.
  it('keeps the rectangle inside', () => {
    const A: Region = [rect(-0.5, -0.25, 0.5, 0.25)];
    const B: Region = [{ xy: Float64Array.from([0.75, 0, 0, 0.75, -0.75, 0, 0, -0.75]), bulge: Float64Array.from([0, 0, 0, 3.2162962315921844e-7]) }];
    const mA = regionMoments(A), mB = regionMoments(B);
    // Set identities for A inside B: A ∩ B = A, A ∪ B = B, A − B is empty.
    expect(maxRelDiff(regionMoments(booleanRegions(A, [B], 'intersection')), mA, 1)).toBeLessThan(1e-15);
    expect(maxRelDiff(regionMoments(booleanRegions(A, [B], 'union')), mB, 1)).toBeLessThan(1e-15);
    expect(booleanRegions(A, [B], 'difference')).toEqual([]);
  });
});

describe('contacts found by random runs', () => {
  // Each pair once broke the exact identities (REFERENCES.md, "Exact identities"):
  // M(A ∪ B) + M(A ∩ B) = M(A) + M(B), M(A − B) + M(A ∩ B) = M(A), M(B − A) + M(A ∩ B) = M(B).
  const C = (xy: number[], b: number[] | null) => ({ xy: Float64Array.from(xy), bulge: b ? Float64Array.from(b) : null });
  const cases: [string, Region, Region][] = [
    [
      // The circle crosses the rectangle's two top fillets 1.5e-5 past their tangent points and
      // touches its sides: the edge clipper gives between the crossings passes three carriers.
      'a circle across two fillets just past their tangent points',
      [C([0.25, 2.2359977207901503e-263, -0.25, 2.2359977207901503e-263], [1, 1])],
      [C([-0.2164918143741314, -0.125, 0.2164918143741314, -0.125, 0.25, -0.09149181437413141, 0.25, 0.09149181437413141, 0.2164918143741314, 0.125, -0.2164918143741314, 0.125, -0.25, 0.09149181437413141, -0.25, -0.09149181437413141], [0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503])],
    ],
    [
      'two rings whose outer circles cross along lunes 0.013 and 0.018 thick',
      [C([1, 0, -1, 0], [1, 1]), C([-0.30000000000000027, 0, 0.30000000000000027, 0], [-1, -1])],
      [C([0.9970853881391082, -0.015519753105575592, -0.9970853881391082, -0.015519753105575592], [1, 1]), C([-0.44709168358488716, -0.015519753105575592, 0.44709168358488716, -0.015519753105575592], [-1, -1])],
    ],
    [
      'a small ring and a circle crossing its outer circle along a thin lune',
      [C([0.24984462299239746, -1.8754293428928509e-16, -0.25015537700760254, -1.8754293428928509e-16], [1, 1]), C([-0.1198713030744561, -1.8754293428928509e-16, 0.11956054905925102, -1.8754293428928509e-16], [-1, -1])],
      [C([0.25, 0, -0.25, 0], [1, 1])],
    ],
    [
      // The hole passes 2.5e-4 inside the rectangle's right side, with no vertex of that side
      // near it, and a fillet's end lies 1.3e-3 inside the hole next to it.
      'a ring whose hole runs along a rounded rectangle\'s side',
      [C([0.720355675434916, 1.860572955016701e-58, -0.720355675434916, 1.860572955016701e-58], [1, 1]), C([-0.24443089878929788, 1.860572955016701e-58, 0.24443089878929788, 1.860572955016701e-58], [-1, -1])],
      [C([-0.21915526937065755, -0.125, 0.20851265153883336, -0.125, 0.2446786910840879, -0.08883396045474545, 0.2446786910840879, 0.08883396045474545, 0.20851265153883336, 0.125, -0.21915526937065755, 0.125, -0.2553213089159121, 0.08883396045474545, -0.2553213089159121, -0.08883396045474545], [0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503])],
    ],
    [
      // Sides whose bulges are subnormal numbers (4.4e-323: a digit or two, and a zero square).
      'an octagon with subnormal bulges and a ring crossing it',
      [C([1, 0, 0.7071067811865476, 0.7071067811865475, 6.123233995736766e-17, 1, -0.7071067811865475, 0.7071067811865476, -1, 1.2246467991473532e-16, -0.7071067811865477, -0.7071067811865475, -1.8369701987210297e-16, -1, 0.7071067811865474, -0.7071067811865477], [0, 4.4e-323, -2.9679001167453546e-63, 0, -3.833291317034655e-171, -8.449310596880408e-204, 0, 0])],
      [C([0.9517977519705452, 3.1251567842436623e-214, -0.8638084740103233, 3.1251567842436623e-214], [1, 1]), C([-0.4351815325886814, 3.1251567842436623e-214, 0.5231708105489034, 3.1251567842436623e-214], [-1, -1])],
    ],
    [
      // A copy moved by 4.5e-7, one side given a slight bulge: its arcs cross their originals
      // along lunes 14 grid units thick, with straight sides and vertices close by.
      'a bulged hexagon and a copy moved by 4.5e-7',
      [C([-0.3444298770105912, 1.316766048902131, -1.2236506009867139, 0.7130354798127085, -1.1404149531020993, -0.3502572872290709, -0.1779585812413623, -0.8098194851814278, 0.7012621427347604, -0.20608891609200597, 0.6180264948501462, 0.8572038509497739], [0.33720455169677727, 0, -0.16077744960784912, 0.007642030715942355, 0, 0.0991312503814697])],
      [C([-0.3444294435881517, 1.3167661714162846, -1.2236501675642744, 0.7130356023268623, -1.1404145196796596, -0.3502571647149173, -0.1779581478189228, -0.8098193626672742, 0.7012625761571999, -0.20608879357785237, 0.6180269282725857, 0.8572039734639275], [0.33720455720510745, 0, -0.16077744960784912, 0.007642030715942355, -0.0068976026296243345, 0.0991312503814697])],
    ],
    [
      // The rectangle is turned by 1.1e-8 rad: its long sides cross the rounded rectangle's at
      // the middle and part from them by less than a grid unit (3e-8) at the ends.
      'a rectangle turned by 1.1e-8 rad on a rounded rectangle with the same long sides',
      [C([-1.1999999867759557, -0.600000026448088, 1.2000000132240438, -0.5999999735519117, 1.1999999867759557, 0.600000026448088, -1.2000000132240438, 0.5999999735519117], null)],
      [C([-1.178499192938776, -0.5999999999999999, 1.1136386446118518, -0.5999999999999996, 1.1675697258365374, -0.546068918775314, 1.1675697258365374, 0.5460689187753143, 1.1136386446118518, 0.5999999999999999, -1.178499192938776, 0.5999999999999996, -1.2324302741634616, 0.546068918775314, -1.2324302741634616, -0.5460689187753143], [0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503, 0, 0.41421356237309503])],
    ],
    [
      // The ring's outer circle touches the plate's sides, passes 4.3e-8 inside its top edge
      // (a neck of plate about one grid unit wide) and pokes as far out of its bottom edge.
      'a ring in a square plate, touching two sides and a hair off the other two',
      [C([-1.199999999999998, -1.1999999572481936, 1.199999999999998, -1.1999999572481936, 1.199999999999998, 1.2000000427518023, -1.199999999999998, 1.2000000427518023], null), C([-0.6068540790590531, 4.2751804278231035e-8, 0.6068540790590531, 4.2751804278231035e-8], [-1, -1])],
      [C([1.1999999999999982, -1.3488839221090337e-286, -1.1999999999999982, -1.3488839221090337e-286], [1, 1]), C([-0.7130687636534727, -1.3488839221090337e-286, 0.7130687636534727, -1.3488839221090337e-286], [-1, -1])],
    ],
    [
      'a plate with a hole and a circle a hair off the plate sides',
      [rect(-0.25, -0.25, 0.25, 0.25), C([-0.14999999999999966, 0, 0.14999999999999966, 0], [-1, -1])],
      [C([0.2500000381401726, 4.367693131083779e-8, -0.24999996185982742, 4.367693131083779e-8], [1, 1])],
    ],
  ];
  for (const [name, A, B] of cases) {
    it(name, () => {
      const mA = regionMoments(A), mB = regionMoments(B);
      const mI = regionMoments(booleanRegions(A, [B], 'intersection'));
      expect(maxRelDiff(sumMoments(regionMoments(booleanRegions(A, [B], 'union')), mI), sumMoments(mA, mB), 3)).toBeLessThan(1e-13);
      expect(maxRelDiff(sumMoments(regionMoments(booleanRegions(A, [B], 'difference')), mI), mA, 3)).toBeLessThan(1e-13);
      expect(maxRelDiff(sumMoments(regionMoments(booleanRegions(B, [A], 'difference')), mI), mB, 3)).toBeLessThan(1e-13);
    });
  }
});
