/**
 * The number-field expression parser and the typed-coordinate syntax (app/expr.ts, stated in
 * app/input-syntax.ts, resolved in app/tools/types.ts). Expected values follow the usual order
 * of operations of ISO 80000-2 (powers before products before sums) and IEEE 754 double
 * arithmetic; trigonometric values are the exact ones of the named angles. The notation is
 * ordinary mathematics: Δ for a difference, r∠θ for a phasor (ISO 80000-2 writes the polar form
 * r·e^{iθ}; the angle sign is the usual engineering shorthand), Ø for a diameter (ISO 129-1).
 */
import { describe, expect, it } from 'vitest';
import { cosSinDegrees, evaluateExpression, parsePointInput, type EntryExpectation, type PointInput } from '../app/expr';
import { ENTRY_START, HELP_LINES, HINT, MESSAGE, PLACEHOLDER } from '../app/input-syntax';
import { clean, resolveArc, resolveMove, resolveRadius, resolveTyped } from '../app/tools/types';
import { createEditor } from '../app/editor';
import { registry } from '../app/command-table';
import type { Point, SectionDocument, Shape } from '../src';

function value(s: string): number {
  const r = evaluateExpression(s);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}
function input(s: string, expects?: EntryExpectation): PointInput {
  const r = parsePointInput(s, expects);
  if (!r.ok) throw new Error(`${s}: ${r.message}`);
  return r.input;
}
function refusal(s: string, expects?: EntryExpectation): string {
  const r = parsePointInput(s, expects);
  if (r.ok) throw new Error(`${s} was accepted as ${JSON.stringify(r.input)}`);
  return r.message;
}

describe('evaluateExpression', () => {
  it('follows the usual precedence', () => {
    expect(value('2*12.5+3')).toBe(28); // 2·12.5 = 25, + 3 (products before sums, ISO 80000-2)
    expect(value('(1+2)*3')).toBe(9);
    expect(value('10/4')).toBe(2.5);
    expect(value('1 - 2 - 3')).toBe(-4); // left-associative subtraction
    expect(value('2^3^2')).toBe(512); // right-associative power: 2^(3^2) (ISO 80000-2)
    expect(value('-2^2')).toBe(-4); // the power binds tighter than the sign (ISO 80000-2)
    expect(value('3e2 + .5')).toBe(300.5);
  });
  it('knows pi, sqrt and degree trigonometry, exact at the quarter turns', () => {
    expect(value('pi')).toBe(Math.PI);
    expect(value('sqrt(16)')).toBe(4);
    expect(value('cos(60)')).toBeCloseTo(0.5, 15); // cos 60° = 1/2 exactly
    expect(value('sin(30)*2')).toBeCloseTo(1, 15); // sin 30° = 1/2 exactly
    expect(value('2*pi*10')).toBeCloseTo(62.83185307179586, 12);
    // cos 90° = sin 180° = 0 and cos 180° = −1 exactly (the unit circle), not round-off.
    expect(value('cos(90)')).toBe(0);
    expect(value('sin(180)')).toBe(0);
    expect(value('cos(-180)')).toBe(-1);
    expect(value('sin(450)')).toBe(1);
    expect(evaluateExpression('tan(90)').ok).toBe(false); // tan 90° is undefined
  });
  it('reads typographic minus, times and division signs', () => {
    expect(value('−5')).toBe(-5); // U+2212, as a report prints it
    expect(value('2×3')).toBe(6);
    expect(value('9÷3')).toBe(3);
  });
  it('refuses bad input with a message naming the position, never evaluating code', () => {
    for (const bad of ['2*', '1/0', 'abc', '2)', '(1+2', 'alert(1)', 'constructor', '1,5', '', '2 3', 'sqrt 4']) {
      const r = evaluateExpression(bad);
      expect(r.ok, bad).toBe(false);
      if (!r.ok) expect(r.message.length).toBeGreaterThan(5);
    }
    const r = evaluateExpression('2*+*3');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/position 4/);
  });
  it('answers a decimal comma with the corrected number', () => {
    const r = evaluateExpression('1,5');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe(MESSAGE.numberComma('1.5'));
    const s = evaluateExpression('2*7,25');
    if (!s.ok) expect(s.message).toContain('“2*7.25”');
  });
  it('refuses results that are not finite numbers', () => {
    expect(evaluateExpression('10^400').ok).toBe(false);
    expect(evaluateExpression('sqrt(-1)').ok).toBe(false);
  });
});

describe('cosSinDegrees', () => {
  it('is exact at multiples of 90° and accurate between', () => {
    expect(cosSinDegrees(0)).toEqual([1, 0]);
    expect(cosSinDegrees(90)).toEqual([0, 1]);
    expect(cosSinDegrees(180)).toEqual([-1, 0]);
    expect(cosSinDegrees(-90)).toEqual([0, -1]);
    expect(cosSinDegrees(720)).toEqual([1, 0]);
    expect(cosSinDegrees(45)).toEqual([Math.SQRT1_2, Math.SQRT1_2]);
    expect(cosSinDegrees(-135)).toEqual([-Math.SQRT1_2, -Math.SQRT1_2]);
    for (const d of [1, 30, 45, 60, 135, 200, -33.3, 1e4 + 0.5]) {
      const [c, s] = cosSinDegrees(d);
      expect(c).toBeCloseTo(Math.cos((d * Math.PI) / 180), 12);
      expect(s).toBeCloseTo(Math.sin((d * Math.PI) / 180), 12);
    }
  });
});

describe('typed coordinates: the forms', () => {
  it('absolute points, with or without parentheses', () => {
    expect(input('10, 20')).toEqual({ kind: 'abs', x: 10, y: 20 });
    expect(input('10,20')).toEqual({ kind: 'abs', x: 10, y: 20 });
    expect(input('(10, 20)')).toEqual({ kind: 'abs', x: 10, y: 20 });
    expect(input('-5, (1+2)*3')).toEqual({ kind: 'abs', x: -5, y: 9 });
    expect(input('(1+2)*3, 4')).toEqual({ kind: 'abs', x: 9, y: 4 });
    expect(input('−7.5, 0')).toEqual({ kind: 'abs', x: -7.5, y: 0 });
  });
  it('relative points: Δ (either code point) and the alias d, any case, with arithmetic', () => {
    const want = { kind: 'rel', dx: 20, dy: -6 };
    for (const s of ['Δ 20, -6', 'Δ20,-6', '∆ 20, -6', 'd 20, -6', 'D 20, -6', 'd20,-6', 'd(20, -6)', 'Δ (20, -2*3)', 'd 2*10, -2*3'])
      expect(input(s), s).toEqual(want);
    expect(input('d -5, 3')).toEqual({ kind: 'rel', dx: -5, dy: 3 });
    expect(input('d pi, 0')).toEqual({ kind: 'rel', dx: Math.PI, dy: 0 });
  });
  it('polar entries: L ∠ θ and the alias a, with an optional degree sign', () => {
    const want = { kind: 'polar', length: 50, angleDeg: 30 };
    for (const s of ['50 ∠ 30', '50∠30', '50∠30°', '50 a 30', '50a30', '50 A 30', '50 a 30°', '100/2 a 60/2', 'Δ 50 ∠ 30', 'd 50 a 30'])
      expect(input(s), s).toEqual(want);
    expect(input('sqrt(2)*10 a -45')).toEqual({ kind: 'polar', length: Math.sqrt(2) * 10, angleDeg: -45 });
    // Names of the arithmetic that contain the letter a are not the angle mark.
    expect(input('abs(-3) a 90')).toEqual({ kind: 'polar', length: 3, angleDeg: 90 });
    expect(input('tan(45), 2')).toEqual({ kind: 'abs', x: 1, y: 2 });
  });
  it('single numbers and diameters (Ø, ø, ⌀ and the alias dia)', () => {
    expect(input('2*12.5')).toEqual({ kind: 'scalar', value: 25 });
    for (const s of ['Ø14', 'Ø 14', 'ø14', '⌀14', 'dia 14', 'DIA14', 'Ø 2*7'])
      expect(input(s), s).toEqual({ kind: 'diameter', value: 14 });
  });
  it('arcs by radius and sweep: R ⌒ φ and the alias arc, sweep signed for the direction', () => {
    for (const s of ['20 ⌒ 90', '20⌒90°', '20 arc 90', '20arc90', '20 ARC 90°'])
      expect(input(s), s).toEqual({ kind: 'arc', radius: 20, sweepDeg: 90 });
    expect(input('20 arc -45')).toEqual({ kind: 'arc', radius: 20, sweepDeg: -45 });
    expect(input('5*4 arc 180/2')).toEqual({ kind: 'arc', radius: 20, sweepDeg: 90 });
  });
});

describe('typed coordinates: the decimal comma and the separators', () => {
  it('a comma separates the two numbers of a point', () => {
    expect(input('7,5', 'point')).toEqual({ kind: 'abs', x: 7, y: 5 });
  });
  it('where one number is asked, "7,5" is refused with the hint 7.5', () => {
    expect(refusal('7,5', 'number')).toBe(MESSAGE.decimalComma('7.5'));
    expect(input('7.5', 'number')).toEqual({ kind: 'scalar', value: 7.5 });
  });
  it('where a number or a point may be typed, "7,5" is refused as ambiguous, "7, 5" is a point', () => {
    const m = refusal('7,5', 'number-or-point');
    expect(m).toBe(MESSAGE.ambiguousComma('7,5', '7.5', '7, 5'));
    expect(m).toContain('“7.5”');
    expect(m).toContain('“7, 5”');
    expect(refusal('-12,25', 'number-or-point')).toContain('-12.25');
    expect(input('7, 5', 'number-or-point')).toEqual({ kind: 'abs', x: 7, y: 5 });
    expect(input('d 7,5', 'number-or-point')).toEqual({ kind: 'rel', dx: 7, dy: 5 }); // Δ makes it a point
  });
  it('in a length, angle, radius, sweep or diameter a comma is a decimal comma, refused and corrected', () => {
    expect(refusal('7,5 a 30')).toBe(MESSAGE.decimalComma('7.5 a 30'));
    expect(refusal('50 ∠ 22,5')).toBe(MESSAGE.decimalComma('50 ∠ 22.5'));
    expect(refusal('dia 7,5')).toBe(MESSAGE.decimalComma('dia 7.5'));
    expect(refusal('Ø14,5')).toBe(MESSAGE.decimalComma('Ø14.5'));
    expect(refusal('12,5 arc 90')).toBe(MESSAGE.decimalComma('12.5 arc 90'));
    // A comma with spaces is no decimal comma: the entry is simply malformed.
    expect(refusal('50, 3 a 30')).toBe(MESSAGE.polarParts);
    expect(refusal('dia 1, 2')).toBe(MESSAGE.diameterOnly);
    expect(refusal('20, 1 arc 90')).toBe(MESSAGE.arcParts);
  });
  it('refuses a semicolon and more than one comma, showing the point form', () => {
    expect(refusal('10;20')).toBe(MESSAGE.semicolon('10', '20'));
    expect(refusal('10;20')).toContain('“10, 20”');
    expect(refusal('1,5, 2')).toBe(MESSAGE.tooManyParts);
    expect(refusal('1,2,3')).toBe(MESSAGE.tooManyParts);
  });
});

describe('typed coordinates: refusals name the part and show the form', () => {
  it('names the part that is wrong', () => {
    expect(refusal('10, 2*')).toMatch(/^y:/);
    expect(refusal('2*, 10')).toMatch(/^x:/);
    expect(refusal('d 1, foo')).toMatch(/^dy: Unknown name "foo"/);
    expect(refusal('50 a')).toMatch(/^angle:/);
    expect(refusal('a 30')).toMatch(/^length:/);
    expect(refusal('20 arc x')).toMatch(/^sweep:/);
    expect(refusal('Ø')).toMatch(/^diameter:/);
  });
  it('explains forms that do not fit together', () => {
    expect(refusal('')).toBe(MESSAGE.empty);
    expect(refusal('d 20')).toBe(MESSAGE.relativeNeedsTwo);
    expect(refusal('50 a 30 a 2')).toBe(MESSAGE.oneOperator);
    expect(refusal('50 ∠ 30 arc 2')).toBe(MESSAGE.oneOperator);
    expect(refusal('d 20 arc 90')).toBe(MESSAGE.arcNotRelative);
    expect(refusal('dia 20 a 90')).toBe(MESSAGE.diameterOnly);
    expect(refusal('x, y')).toMatch(/^x: Unknown name "x"/);
  });
  it('an entry in the older style gets a short hint with the same numbers in the new form', () => {
    expect(refusal('@20,0')).toBe(MESSAGE.oldRelative('20', '0'));
    expect(refusal('@20,0')).toContain('“d 20, 0”');
    expect(refusal('@ 2*10, -5')).toContain('“d 2*10, -5”');
    expect(refusal('100<30')).toBe(MESSAGE.oldPolar('100', '30'));
    expect(refusal('100<30')).toContain('“100 a 30”');
    expect(refusal('@100<30')).toContain('“100 a 30”');
    expect(refusal('<30')).toBe(MESSAGE.oldGeneric);
    for (const old of ['@20,0', '100<30', '@1<2', '<30']) {
      const m = refusal(old);
      expect(m).not.toMatch(/@|</); // it shows only the new form
      expect(m.length).toBeLessThan(120); // short
    }
  });
  it('never throws and never yields a non-finite number on arbitrary text', () => {
    const alphabet = ['1', '0', '.', ',', ';', ' ', '-', '+', '(', ')', '*', '/', '^', 'a', 'd', 'i', 'r', 'c', 'Δ', '∠', 'Ø', '⌒', '°', '@', '<', 'e', 'p'];
    let seed = 12345;
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    for (let n = 0; n < 3000; n++) {
      const s = Array.from({ length: 1 + Math.floor(rnd() * 12) }, () => alphabet[Math.floor(rnd() * alphabet.length)]).join('');
      for (const ex of ['point', 'number', 'number-or-point'] as const) {
        const r = parsePointInput(s, ex);
        if (r.ok) {
          for (const v of Object.values(r.input)) if (typeof v === 'number') expect(Number.isFinite(v), s).toBe(true);
        } else expect(r.message.length, s).toBeGreaterThan(5);
      }
    }
  });
});

describe('resolving typed entries', () => {
  const last: Point = [10, 20];
  it('absolute, relative and polar points; polar exact at the quarter turns', () => {
    expect(resolveTyped(input('1, 2'), last)).toEqual({ p: [1, 2] });
    expect(resolveTyped(input('d 0.1, 0.2'), [0.2, 0.1])).toEqual({ p: [0.3, 0.3] }); // 0.1 + 0.2 = 0.3 after clean
    expect(resolveTyped(input('50 a 90'), last)).toEqual({ p: [10, 70] }); // cos 90° = 0 exactly
    expect(resolveTyped(input('50 a 180'), last)).toEqual({ p: [-40, 20] });
    const r = resolveTyped(input('20 ∠ 30'), [0, 0]) as { p: Point };
    expect(r.p[0]).toBeCloseTo(10 * Math.sqrt(3), 13); // 20 cos 30° = 10√3
    expect(r.p[1]).toBeCloseTo(10, 13); // 20 sin 30° = 10
    expect(r.p[1]).toBe(10); // clean() removes the round-off of sin 30°
  });
  it('refuses what is not a point, with the form to type', () => {
    expect(resolveTyped(input('d 1, 2'), null)).toEqual({ error: MESSAGE.noPrevious });
    expect(resolveTyped(input('5 a 5'), null)).toEqual({ error: MESSAGE.noPrevious });
    expect(resolveTyped(input('5'), last)).toEqual({ error: MESSAGE.pointNeedsTwo });
    expect(resolveTyped(input('Ø5'), last)).toEqual({ error: MESSAGE.diameterNotHere });
    expect(resolveTyped(input('5 arc 5'), last)).toEqual({ error: MESSAGE.arcNotHere });
  });
  it('a radius from a number or a diameter', () => {
    expect(resolveRadius(input('7.5'))).toEqual({ r: 7.5 });
    expect(resolveRadius(input('Ø14'))).toEqual({ r: 7 });
    expect(resolveRadius(input('dia 0.3'))).toEqual({ r: 0.15 });
    expect(resolveRadius(input('-3'))).toEqual({ error: MESSAGE.radiusPositive });
    expect(resolveRadius(input('Ø0'))).toEqual({ error: MESSAGE.diameterPositive });
    expect(resolveRadius(input('3, 4'))).toBeNull(); // a point on the circle: the caller's case
  });
  it('a move from a displacement or a length at an angle', () => {
    expect(resolveMove(input('d 5, -2'))).toEqual({ dx: 5, dy: -2 });
    expect(resolveMove(input('10 a 90'))).toEqual({ dx: 0, dy: 10 });
    expect(resolveMove(input('5, 5'))).toEqual({ error: MESSAGE.moveForm });
  });
  it('an arc by radius and sweep continues the last segment tangentially', () => {
    const path = { start: [0, 0] as Point, segments: [{ to: [10, 0] as Point }] };
    // Heading +x from (10, 0), a left quarter turn of radius 20 ends at (30, 20): centre (10, 20).
    const left = resolveArc(input('20 arc 90'), path) as { segment: { to: Point; via: Point } };
    expect(left.segment.to).toEqual([30, 20]);
    expect(left.segment.via[0]).toBeCloseTo(10 + 20 * Math.SQRT1_2, 12);
    expect(left.segment.via[1]).toBeCloseTo(20 - 20 * Math.SQRT1_2, 12);
    const right = resolveArc(input('20 arc -90'), path) as { segment: { to: Point } };
    expect(right.segment.to).toEqual([30, -20]);
    // A second quarter turn after the first continues along +y: a half circle back to (10, 40).
    const more = resolveArc(input('20 ⌒ 90'), { start: [0, 0], segments: [{ to: [10, 0] }, left.segment] }) as { segment: { to: Point } };
    expect(more.segment.to).toEqual([10, 40]);
    expect(resolveArc(input('20 arc 90'), { start: [0, 0], segments: [] })).toEqual({ error: MESSAGE.arcNeedsDirection });
    expect(resolveArc(input('20 arc 360'), path)).toEqual({ error: MESSAGE.arcSweep });
    expect(resolveArc(input('20 arc 0'), path)).toEqual({ error: MESSAGE.arcSweep });
    expect(resolveArc(input('0 arc 90'), path)).toEqual({ error: MESSAGE.arcRadius });
    expect(resolveArc(input('5, 5'), path)).toEqual({ error: MESSAGE.arcNotHere });
  });
  it('clean keeps real digits and drops binary round-off', () => {
    expect(clean(0.1 + 0.2)).toBe(0.3);
    expect(clean(Math.cos(Math.PI / 6))).toBe(Math.cos(Math.PI / 6));
  });
});

describe('typed entry in the editor', () => {
  const EMPTY: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [] };
  const points = (e: ReturnType<typeof createEditor>) => (e.store.getState().doc.shapes[0] as Extract<Shape, { type: 'polygon' }>).points;

  it('draws a polygon with absolute, relative and polar entries in both spellings', () => {
    const e = createEditor(EMPTY);
    e.run('tool.polygon');
    expect(e.type('(0, 0)')).toBeNull();
    expect(e.type('Δ 40, 0')).toBeNull();
    expect(e.type('40 ∠ 90')).toBeNull();
    expect(e.type('d -20, 0')).toBeNull();
    expect(e.type('20 a 180')).toBeNull();
    e.tool().key(e.env, 'enter');
    // A 40 × 40 square with one more point on its top side: every corner exact.
    expect(points(e)).toEqual([[0, 0], [40, 0], [40, 40], [20, 40], [0, 40]]);
    // A = a² for the square (Gere & Goodno, App. E, rectangle).
    expect(e.results.evaluate(e.store.getState().doc).props!.area).toBeCloseTo(1600, 10);
  });
  it('refuses an old-style entry with the hint and keeps the shape in progress', () => {
    const e = createEditor(EMPTY);
    e.run('tool.polygon');
    e.type('0, 0');
    expect(e.type('@30, 0')).toBe(MESSAGE.oldRelative('30', '0'));
    expect(e.transient.getState().inputError).toBe(MESSAGE.oldRelative('30', '0'));
    expect(e.type('30<90')).toBe(MESSAGE.oldPolar('30', '90'));
    expect(e.type('10;20')).toBe(MESSAGE.semicolon('10', '20'));
    expect(e.type('d 30, 0')).toBeNull();
    expect(e.transient.getState().inputError).toBeNull();
  });
  it('moves a selection by a displacement or a length at an angle, one undo step each', () => {
    const rect: Shape = { id: 'r', type: 'rectangle', at: [0, 0], width: 10, height: 10 };
    const e = createEditor({ ...EMPTY, shapes: [rect] });
    e.store.setState({ selected: ['r'] });
    expect(e.type('d 5, -2')).toBeNull();
    expect((e.store.getState().doc.shapes[0] as Extract<Shape, { type: 'rectangle' }>).at).toEqual([5, -2]);
    expect(e.type('10 a 90')).toBeNull();
    const at = (e.store.getState().doc.shapes[0] as Extract<Shape, { type: 'rectangle' }>).at;
    expect(at[0]).toBeCloseTo(5, 12);
    expect(at[1]).toBeCloseTo(8, 12);
    expect(e.type('@1, 1')).toBe(MESSAGE.oldRelative('1', '1'));
  });
});

describe('the syntax is stated once', () => {
  it('hints and help lines use the forms the parser reads', () => {
    // Each help line's typed form, with numbers put in, parses to the kind it names.
    const sample: Record<string, [string, PointInput['kind']]> = {
      'x, y': ['3, 4', 'abs'],
      'd dx, dy': ['d 3, 4', 'rel'],
      'L a θ': ['3 a 4', 'polar'],
      'dia D': ['dia 3', 'diameter'],
      'R arc φ': ['3 arc 4', 'arc'],
    };
    for (const line of HELP_LINES) {
      const typed = line.typed ?? line.form;
      if (!(typed in sample)) continue;
      const [text, kind] = sample[typed];
      expect(input(text).kind).toBe(kind);
      // The symbol form parses to the same kind.
      const symbolic = text.replace(/^d /, 'Δ ').replace(' a ', ' ∠ ').replace('dia ', 'Ø').replace(' arc ', ' ⌒ ');
      expect(input(symbolic).kind).toBe(kind);
    }
    expect(PLACEHOLDER).not.toMatch(/[@<]/);
    for (const h of Object.values(HINT)) expect(h).not.toMatch(/[@<]/);
    for (const l of HELP_LINES) expect(l.form + (l.typed ?? '') + l.meaning).not.toMatch(/[@<]/);
  });
  it('the keys that start an entry include the plain-keyboard relative mark', () => {
    for (const k of ['1', '.', '-', '+', '(', 'd', 'Δ', 'Ø']) expect(ENTRY_START.test(k), k).toBe(true);
    for (const k of ['a', 'r', '@', '<', 'Enter']) expect(ENTRY_START.test(k), k).toBe(false);
  });
  it('no command is bound to a key that starts an entry', () => {
    for (const k of ['0', '5', '9', '.', '+', '-', '(', 'd', 'shift+d', 'Δ', '∆', 'Ø', 'ø', '⌀']) expect(registry.forKey(k)?.name, k).toBeUndefined();
  });
});
