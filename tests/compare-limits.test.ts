/**
 * Limits: within or beyond, at the limit and just past it, the margin, the verdict, and the
 * validation of limit records with their paths.
 *
 * The geometric cases are hand calculations by the composite method (Hibbeler, Statics, Sec. 9.3):
 * a 200 × 100 plate (A = 20000) with a corner notch of 40 × 50 loses exactly 2000 = 10 % of its area.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { polygonContour } from '../src/geometry/contour';
import {
  compareSections, evaluateLimits, exampleLimits, EXAMPLE_LIMITS_NOTE, overallVerdict, validateLimits, type Limit,
} from '../src/compare';
import type { SectionProperties } from '../src/properties/section';
import { close, props, rect, worst } from './helpers';

/** Plate 200 × 100 with the top-right corner notched w × h. */
const notched = (w: number, h: number) => [polygonContour([[0, 0], [200, 0], [200, 100 - h], [200 - w, 100 - h], [200 - w, 100], [0, 100]])];

describe('limit flags at the limit and just past it (geometry)', () => {
  const base = props([rect(0, 0, 200, 100)]);

  it('an area loss of exactly 10 % is within a 10 % limit', () => {
    // Hand: notch 40 × 50 = 2000 of 20000 = 10 % exactly.
    const c = compareSections(base, props(notched(40, 50)));
    const [r] = evaluateLimits(c, [{ property: 'area', maxLossPercent: 10 }], 'mm');
    close(r.actual!, 10, 1e-12);
    expect(r.status).toBe('within');
    expect(Math.abs(r.margin!)).toBeLessThan(1e-9);
    expect(overallVerdict([r])).toBe('within');
  });

  it('an area loss just past 10 % is beyond, with the margin', () => {
    // Hand: notch 40 × 50.001 = 2000.04 → 10.0002 % loss.
    const c = compareSections(base, props(notched(40, 50.001)));
    const [r] = evaluateLimits(c, [{ property: 'area', maxLossPercent: 10 }], 'mm');
    close(r.actual!, (100 * 40 * 50.001) / 20000, 1e-12);
    expect(r.status).toBe('beyond');
    close(r.margin!, 10 - (100 * 40 * 50.001) / 20000, 1e-9);
    expect(r.message).toMatch(/beyond the loss limit of 10 %/);
    expect(overallVerdict([r])).toBe('beyond');
  });

  it('a gain does not count against a loss limit, and a gain limit catches it', () => {
    // Hand: a 200 × 100 plate against a 200 × 110 plate: area gain 10 %.
    const c = compareSections(base, props([rect(0, 0, 200, 110)]));
    const [loss, gain, gain2] = evaluateLimits(c, [{ property: 'area', maxLossPercent: 0 }, { property: 'area', maxGainPercent: 10 }, { property: 'area', maxGainPercent: 9.999 }]);
    expect(loss.status).toBe('within');
    expect(loss.message).toMatch(/a gain of 10 %/);
    expect(gain.status).toBe('within');
    expect(gain2.status).toBe('beyond');
  });

  it('a centroid shift at the limit and just past it', () => {
    // Hand: the notch 40 × 50 moves the centroid by (−2000·(180 − 100)/18000, −2000·(75 − 50)/18000).
    const c = compareSections(base, props(notched(40, 50)));
    const shift = Math.hypot((2000 * 80) / 18000, (2000 * 25) / 18000);
    close(c.centroidShift.length, shift, 1e-12);
    const [at, past] = evaluateLimits(c, [{ property: 'centroid', maxShift: shift }, { property: 'centroid', maxShift: shift * (1 - 1e-6) }]);
    expect(at.status).toBe('within');
    expect(past.status).toBe('beyond');
    // A single coordinate takes a shift limit too: ȳ moves by 2000·25/18000 = 2.7778.
    const [y] = evaluateLimits(c, [{ property: 'centroid.y', maxShift: 2.7 }]);
    expect(y.status).toBe('beyond');
    close(y.actual!, (2000 * 25) / 18000, 1e-12);
  });
});

/** A section property record by hand (plain data), so values sit exactly on the limits. */
function section(over: Partial<SectionProperties>): SectionProperties {
  const p: SectionProperties = {
    area: 20000, centroid: { x: 100, y: 50 }, Qx: 1e6, Qy: 2e6, Ix: 1e7, Iy: 6e7, Ixy: 0, J0: 7e7, I1: 6e7, I2: 1e7, theta: 90,
    rx: 1, ry: 1, r1: 1, r2: 1, Sx_top: 2e5, Sx_bottom: 2e5, Sy_left: 6e5, Sy_right: 6e5, Zx: 1, Zy: 1, plasticAxis: { y: 50, x: 100 },
    bounds: { xmin: 0, xmax: 200, ymin: 0, ymax: 100 }, perimeter: 600, fibres: { top: 50, bottom: 50, left: 100, right: 100 },
  };
  return { ...p, ...over };
}

describe('limit flags at the limit and just past it (exact records)', () => {
  const base = section({});

  it('per cent: exactly 10 % within, 10.0000001 % beyond', () => {
    // 9e6 is exactly 10 % below 1e7.
    const at = evaluateLimits(compareSections(base, section({ Ix: 9e6 })), [{ property: 'Ix', maxLossPercent: 10 }]);
    expect(at[0].actual).toBe(10);
    expect(at[0].status).toBe('within');
    expect(at[0].margin).toBe(0);
    const past = evaluateLimits(compareSections(base, section({ Ix: 9e6 - 0.01 })), [{ property: 'Ix', maxLossPercent: 10 }]);
    expect(past[0].status).toBe('beyond');
  });

  it('the critical-fibre modulus is the smaller of the pair', () => {
    // Sx,top drops 20 %, Sx,bottom rises: Sx,min = min(…) loses 20 % (Gere & Goodno, Sec. 5.5, S = I/c with the larger c).
    const c = compareSections(base, section({ Sx_top: 1.6e5, Sx_bottom: 2.4e5 }));
    const [r] = evaluateLimits(c, [{ property: 'Sx_min', maxLossPercent: 20 }]);
    close(r.actual!, 20, 1e-12);
    expect(r.status).toBe('within');
    const [r2] = evaluateLimits(c, [{ property: 'Sx_min', maxLossPercent: 19.99 }]);
    expect(r2.status).toBe('beyond');
  });

  it('rotation: exactly 2° within, just past beyond; wrapped across 90°', () => {
    const at = evaluateLimits(compareSections(base, section({ theta: 88 })), [{ property: 'theta', maxRotation: 2 }]);
    expect(at[0].actual).toBe(2);
    expect(at[0].status).toBe('within');
    const past = evaluateLimits(compareSections(base, section({ theta: 87.999 })), [{ property: 'theta', maxRotation: 2 }]);
    expect(past[0].status).toBe('beyond');
    // θ from 90° to −89°: the axis turns by +1° (lines, not arrows).
    const wrap = evaluateLimits(compareSections(base, section({ theta: -89 })), [{ property: 'theta', maxRotation: 1 }]);
    close(wrap[0].actual!, 1, 1e-12);
    expect(wrap[0].status).toBe('within');
  });

  it('a rotation limit on an isotropic section is not applicable and leaves the verdict alone', () => {
    const iso = section({ Ix: 1e7, Iy: 1e7, I1: 1e7, I2: 1e7, theta: 0 });
    const r = evaluateLimits(compareSections(iso, section({ Ix: 1e7, Iy: 1e7, I1: 1e7, I2: 1e7, theta: 0 })), [{ property: 'theta', maxRotation: 2 }]);
    expect(r[0].status).toBe('not-applicable');
    expect(r[0].message).toMatch(/isotropic/);
    expect(overallVerdict(r)).toBe('within');
  });

  it('the verdict is beyond when any limit is beyond', () => {
    const c = compareSections(base, section({ Ix: 8e6, area: 19900 }));
    const r = evaluateLimits(c, [{ property: 'area', maxLossPercent: 10 }, { property: 'Ix', maxLossPercent: 10 }]);
    expect(r.map((x) => x.status)).toEqual(['within', 'beyond']);
    expect(overallVerdict(r)).toBe('beyond');
  });
});

describe('example limits', () => {
  it('are labelled as examples and scale the 2 mm shift to the document units', () => {
    expect(EXAMPLE_LIMITS_NOTE).toMatch(/not values from a design code/);
    const mm = exampleLimits(1e-3);
    expect(mm.map((l) => l.property)).toEqual(['Ix', 'Sx_min', 'area', 'centroid', 'theta']);
    expect(mm.find((l) => l.property === 'centroid')!.maxShift).toBe(2);
    close(exampleLimits(0.0254).find((l) => l.property === 'centroid')!.maxShift!, 2 / 25.4, 1e-12);
    expect(validateLimits(mm, 'limits')).toEqual([]);
  });
});

describe('validateLimits', () => {
  it('accepts the documented record shapes', () => {
    const ok: Limit[] = [
      { property: 'Ix', maxLossPercent: 10 }, { property: 'area', maxLossPercent: 10, maxGainPercent: 5 }, { property: 'Sx_min', maxLossPercent: 10 },
      { property: 'centroid', maxShift: 2 }, { property: 'centroid.y', maxShift: 1 }, { property: 'theta', maxRotation: 2 },
    ];
    expect(validateLimits(ok, 'limits')).toEqual([]);
  });

  it('names every problem with its path', () => {
    const issues = validateLimits(
      [
        { property: 'Ix', maxLossPercent: -1 },
        { property: 'Iz', maxLossPercent: 10 },
        { property: 'centroid', maxLossPercent: 10 },
        { property: 'theta', maxRotation: 'two' },
        { property: 'area', maxLossPercent: 120, colour: 'red' },
        { property: 'Ixy', maxLossPercent: 5 },
        { property: 'area' },
        { property: 'Ix', maxLossPercent: 5 },
        7,
      ],
      'limits',
    );
    const at = (p: string) => issues.filter((i) => i.path === p).map((i) => i.message).join(' | ');
    expect(at('limits[0].maxLossPercent')).toMatch(/0 or more/);
    expect(at('limits[1].property')).toMatch(/unknown property "Iz"/);
    expect(at('limits[2].maxLossPercent')).toMatch(/does not apply to centroid; use maxShift/);
    expect(at('limits[3].maxRotation')).toMatch(/finite number, got "two"/);
    expect(at('limits[4].maxLossPercent')).toMatch(/at most 100/);
    expect(at('limits[4].colour')).toMatch(/unknown field/);
    expect(at('limits[5].maxLossPercent')).toMatch(/Ixy takes no limit/);
    expect(at('limits[6]')).toMatch(/sets nothing/);
    expect(at('limits[7].maxLossPercent')).toMatch(/limits\[0\] already sets maxLossPercent for Ix/);
    expect(at('limits[8]')).toMatch(/must be an object/);
    expect(validateLimits({ property: 'Ix' }, 'limits')[0]).toEqual({ path: 'limits', message: expect.stringMatching(/must be a list/) });
  });

  it('an unvalidated limit that does not apply is reported as not applicable, never thrown', () => {
    const c = compareSections(section({}), section({ Ix: 9e6 }));
    const r = evaluateLimits(c, [{ property: 'Ix', maxShift: 1 }, { property: 'nope', maxLossPercent: 1 }]);
    expect(r.map((x) => x.status)).toEqual(['not-applicable', 'not-applicable']);
  });
});

afterAll(() => {
  console.log(`compare-limits: largest relative error at tight tolerance ${worst.value.toExponential(2)}`);
});
