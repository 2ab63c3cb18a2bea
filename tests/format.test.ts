/**
 * The one number formatter (src/properties/catalog.ts): the stated significant figures are the
 * ones shown, large and small values are in engineering form, and values that are zero to within
 * round-off show as 0 with a tolerance taken from the section's size, at sizes from 1e-3 to 1e12.
 *
 * Sources: significant figures and rounding to n figures, ISO 80000-1:2009, Annex B (rounding of
 * numbers: the rounded value is the multiple of the rounding interval nearest the value; from
 * memory). Engineering notation uses powers of ten in steps of three, the steps of the SI prefixes
 * (BIPM, The International System of Units, 9th ed., Table 7, from memory). Closed forms for the
 * round-off checks: rectangle A = bh, Ixy = 0 for a symmetric section (Gere & Goodno, Mechanics of
 * Materials, App. E).
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import {
  cutSection,
  DISPLAY_SIGFIGS,
  evaluateDocument,
  formatNumber,
  formatProperty,
  formatQuantity,
  GEOMETRY_SIGFIGS,
  parseFormatted,
  PROPERTY_CATALOG,
  sectionSize,
  ZERO_RELATIVE,
  type SectionDocument,
} from '../src';

const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹⁻';

/** Mantissa digits and the power of ten of a formatted text, read independently of the formatter. */
function parts(text: string): { mantissa: string; exp: number } {
  const m = /^-?(\d+(?:\.\d+)?)(?: × 10([⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+))?$/.exec(text);
  expect(m, `"${text}" is plain or engineering notation`).not.toBeNull();
  const exp = m![2] ? Number([...m![2]].map((ch) => (ch === '⁻' ? '-' : String(SUP.indexOf(ch)))).join('')) : 0;
  return { mantissa: m![1], exp };
}

/** Significant digits written in a plain decimal (leading zeros are not significant). */
function writtenFigures(mantissa: string): number {
  return mantissa.replace('.', '').replace(/^0+/, '').length;
}

/** The rounding interval of n significant figures at v: 10^(floor(log10|v|) − n + 1). */
function ulpOfFigures(v: number, n: number): number {
  return Math.pow(10, Math.floor(Math.log10(Math.abs(v))) - n + 1);
}

describe('significant figures, stated and applied', () => {
  test(`a sweep from 1e-3 to 1e12: at most ${DISPLAY_SIGFIGS} figures shown, each within half a unit of the last figure`, () => {
    // ISO 80000-1 Annex B: rounding to n figures leaves an error of at most half the rounding interval.
    let checked = 0;
    for (let e = -3; e <= 12; e++) {
      for (const m of [1, 1.00049, 1.2345, 2.5, 3.14159265, 5.369069, 9.87654, 9.99949, 9.99951]) {
        for (const sign of [1, -1]) {
          const v = sign * m * Math.pow(10, e);
          for (const sig of [DISPLAY_SIGFIGS, GEOMETRY_SIGFIGS, 3]) {
            const t = formatNumber(v, sig);
            const { mantissa } = parts(t);
            expect(writtenFigures(mantissa), `${v} at ${sig} figures: "${t}"`).toBeLessThanOrEqual(sig);
            const back = parseFormatted(t);
            expect(Math.abs(back - v), `${v} at ${sig} figures: "${t}"`).toBeLessThanOrEqual(0.5 * ulpOfFigures(v, sig) * (1 + 1e-12));
            checked++;
          }
        }
      }
    }
    expect(checked).toBe(16 * 9 * 2 * 3);
  });

  test('the figures of issue 8: 5369069 mm⁴, 246086518 mm³ and 3.47397e10 read alike', () => {
    expect(formatNumber(5369069)).toBe('5.369 × 10⁶');
    expect(formatNumber(246086518)).toBe('246.1 × 10⁶');
    expect(formatNumber(3.47397e10)).toBe('34.74 × 10⁹');
    // No more than the stated figures: the 7 to 9 digits of old are gone.
    for (const v of [5369069, 246086518, 3.47397e10]) expect(writtenFigures(parts(formatNumber(v)).mantissa)).toBeLessThanOrEqual(4);
  });

  test('rounding carries into the next power (9999.6 at 4 figures is 10 × 10³, 999 960 is 1 × 10⁶)', () => {
    expect(formatNumber(9999.4)).toBe('9999');
    expect(formatNumber(9999.6)).toBe('10 × 10³');
    expect(formatNumber(999960)).toBe('1 × 10⁶');
    expect(formatNumber(0.00099996)).toBe('0.001');
    expect(formatNumber(0.00099994)).toBe('999.9 × 10⁻⁶');
  });

  test('zeros that carry nothing are dropped, integers keep their places', () => {
    expect(formatNumber(2.5)).toBe('2.5');
    expect(formatNumber(2000)).toBe('2000');
    expect(formatNumber(0.1 + 0.2)).toBe('0.3');
    expect(formatNumber(-1234.5678)).toBe('-1235');
    expect(formatNumber(-1234.5678, 6)).toBe('-1234.57');
  });
});

describe('engineering form', () => {
  test('outside 0.001 … 10^sig the power of ten is a multiple of 3 and the mantissa lies in [1, 1000)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e300, max: 1e300, noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 10 }), (v, sig) => {
        if (v === 0) return;
        const t = formatNumber(v, sig);
        const { mantissa, exp } = parts(t);
        const plain = !t.includes('×');
        const a = Math.abs(parseFormatted(t));
        if (plain) {
          expect(exp).toBe(0);
          // Plain only where the figures fit: 0.001 ≤ |v| and no more integer digits than sig.
          expect(a === 0 || (a >= 0.001 * (1 - 1e-12) && mantissa.split('.')[0].replace(/^0+/, '').length <= sig)).toBe(true);
        } else {
          expect(Math.abs(exp % 3)).toBe(0);
          const mv = Number(mantissa);
          expect(mv >= 1 && mv < 1000, `${t}`).toBe(true);
        }
        // Reading it back gives the value to the shown figures.
        expect(Math.abs(parseFormatted(t) - v)).toBeLessThanOrEqual(0.5 * ulpOfFigures(v, sig) * (1 + 1e-9));
      }),
      { numRuns: 3000 },
    );
  });

  test('from 1e-3 to 1e12: the exact texts of a few powers', () => {
    const cases: [number, string][] = [
      [1e-3, '0.001'],
      [1.234e-4, '123.4 × 10⁻⁶'],
      [5.82077e-11, '58.21 × 10⁻¹²'],
      [1, '1'],
      [12345, '12.35 × 10³'],
      [1e9, '1 × 10⁹'],
      [1e12, '1 × 10¹²'],
      [-4.2e7, '-42 × 10⁶'],
    ];
    for (const [v, t] of cases) expect(formatNumber(v), String(v)).toBe(t);
    expect(formatNumber(NaN)).toBe('—');
    expect(formatNumber(Infinity)).toBe('—');
    expect(formatNumber(-0)).toBe('0');
  });
});

describe('zero within round-off, with a tolerance from the section’s size', () => {
  const rect = (L: number, at: [number, number] = [0, 0]): SectionDocument => ({
    format: 'kern-section',
    version: 2,
    units: 'mm',
    shapes: [{ id: 'r', type: 'rectangle', at, width: L, height: L / 2 }],
  });

  test('the tolerance is ZERO_RELATIVE × size^power, not a fixed epsilon', () => {
    for (let e = -3; e <= 12; e++) {
      const L = Math.pow(10, e);
      for (const power of [1, 2, 3, 4]) {
        const tol = ZERO_RELATIVE * Math.pow(L, power);
        expect(formatQuantity(0.9 * tol, power, L)).toBe('0');
        expect(formatQuantity(-0.9 * tol, power, L)).toBe('0');
        expect(formatQuantity(1.1 * tol, power, L)).not.toBe('0');
      }
    }
  });

  test('a cut below a section shows Q = 0 at every size from 1e-3 to 1e12 (issue 8: not 5.82077e-11)', () => {
    for (let e = -3; e <= 12; e++) {
      const L = Math.pow(10, e);
      // Off the origin by 3 sizes, so the round-off is that of a section placed in a drawing
      // (profiles may not be placed beyond 1e12 from the origin, so the largest sits nearer).
      const doc = rect(L, e < 12 ? [3 * L, 2 * L] : [0.3 * L, 0.2 * L]);
      const ev = evaluateDocument(doc);
      const p = ev.props!;
      // Gere & Goodno, App. E: A = bh for the rectangle, to the shown figures.
      expect(parseFormatted(formatProperty(PROPERTY_CATALOG.find((i) => i.key === 'area')!, p, 'mm').text)).toBeCloseTo(0.5 * L * L, -Math.floor(Math.log10(0.5 * L * L)) + 2);
      const below = cutSection(ev.region, 'y', p.bounds.ymin - L, p);
      // The part above a line below the section is the whole section: its Q about the centroid is 0.
      expect(Math.abs(below.Q)).toBeLessThan(ZERO_RELATIVE * L ** 3);
      expect(formatQuantity(below.Q, 3, sectionSize(p.bounds)), `L = ${L}: Q = ${below.Q}`).toBe('0');
      // A symmetric rectangle: Ixy = 0 (Gere & Goodno, App. E), shown as 0 at every size.
      expect(formatProperty(PROPERTY_CATALOG.find((i) => i.key === 'Ixy')!, p, 'mm').text).toBe('0');
      // ... while Ix itself is never taken for round-off: bh³/12 with b = L, h = L/2.
      const ix = parseFormatted(formatProperty(PROPERTY_CATALOG.find((i) => i.key === 'Ix')!, p, 'mm').text);
      expect(Math.abs(ix - L ** 4 / 96)).toBeLessThanOrEqual(0.5 * ulpOfFigures(L ** 4 / 96, DISPLAY_SIGFIGS) * (1 + 1e-9));
    }
  });

  test('sectionSize is the larger side of the bounding box', () => {
    expect(sectionSize({ xmin: -1, xmax: 3, ymin: 10, ymax: 12 })).toBe(4);
    expect(sectionSize(null)).toBe(0);
  });

  test('parseFormatted reads the formatter’s texts and refuses others', () => {
    expect(parseFormatted('5.369 × 10⁶')).toBe(5.369e6);
    expect(parseFormatted('-12.5 × 10⁻⁶')).toBe(-12.5e-6);
    expect(parseFormatted('0')).toBe(0);
    expect(parseFormatted('—')).toBeNaN();
    expect(parseFormatted('1e5')).toBeNaN();
  });
});
