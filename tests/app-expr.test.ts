/**
 * The number-field expression parser (app/expr.ts). Expected values follow the usual order of
 * operations of ISO 80000-2 (powers before products before sums) and IEEE 754 double arithmetic;
 * trigonometric values are the exact ones of the named angles.
 */
import { describe, expect, it } from 'vitest';
import { evaluateExpression, parsePointInput } from '../app/expr';

function value(s: string): number {
  const r = evaluateExpression(s);
  if (!r.ok) throw new Error(r.message);
  return r.value;
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
  it('knows pi, sqrt and degree trigonometry', () => {
    expect(value('pi')).toBe(Math.PI);
    expect(value('sqrt(16)')).toBe(4);
    expect(value('cos(60)')).toBeCloseTo(0.5, 15); // cos 60° = 1/2 exactly
    expect(value('sin(30)*2')).toBeCloseTo(1, 15); // sin 30° = 1/2 exactly
    expect(value('2*pi*10')).toBeCloseTo(62.83185307179586, 12);
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
  it('refuses results that are not finite numbers', () => {
    expect(evaluateExpression('10^400').ok).toBe(false);
    expect(evaluateExpression('sqrt(-1)').ok).toBe(false);
  });
});

describe('parsePointInput', () => {
  it('reads absolute, relative, polar and single values', () => {
    expect(parsePointInput('10, 20')).toEqual({ ok: true, input: { kind: 'abs', x: 10, y: 20 } });
    expect(parsePointInput('@5,-2*3')).toEqual({ ok: true, input: { kind: 'rel', dx: 5, dy: -6 } });
    expect(parsePointInput('100<30')).toEqual({ ok: true, input: { kind: 'polar', length: 100, angleDeg: 30 } });
    expect(parsePointInput('2*12.5')).toEqual({ ok: true, input: { kind: 'scalar', value: 25 } });
  });
  it('names the part that is wrong', () => {
    const r = parsePointInput('10, 2*');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^y:/);
    expect(parsePointInput('1,2,3').ok).toBe(false);
  });
});
