/**
 * A tiny safe arithmetic parser for number fields (never eval).
 *
 * Grammar (usual precedence, ^ binds tighter than unary minus and is right-associative):
 *   sum     = product (('+' | '-') product)*
 *   product = unary (('*' | '/') unary)*
 *   unary   = ('+' | '-') unary | power
 *   power   = atom ('^' unary)?
 *   atom    = number | 'pi' | name '(' sum ')' | '(' sum ')'
 * Functions: sqrt, sin, cos, tan (degrees), abs. A comma as decimal separator is not accepted.
 */

export type ExprResult = { ok: true; value: number } | { ok: false; message: string };

const FUNCS: Record<string, (v: number) => number> = {
  sqrt: Math.sqrt,
  abs: Math.abs,
  sin: (d) => Math.sin((d * Math.PI) / 180),
  cos: (d) => Math.cos((d * Math.PI) / 180),
  tan: (d) => Math.tan((d * Math.PI) / 180),
};

class ExprError extends Error {}

export function evaluateExpression(text: string): ExprResult {
  const src = text.trim();
  if (src === '') return { ok: false, message: 'Enter a number.' };
  let i = 0;
  const fail = (msg: string): never => {
    throw new ExprError(`${msg} at position ${i + 1} of "${src}".`);
  };
  const skip = () => {
    while (i < src.length && /\s/.test(src[i])) i++;
  };
  const peek = () => {
    skip();
    return src[i];
  };

  function sum(): number {
    let v = product();
    for (;;) {
      const c = peek();
      if (c === '+') { i++; v += product(); }
      else if (c === '-') { i++; v -= product(); }
      else return v;
    }
  }
  function product(): number {
    let v = unary();
    for (;;) {
      const c = peek();
      if (c === '*') { i++; v *= unary(); }
      else if (c === '/') {
        i++;
        const d = unary();
        if (d === 0) fail('Division by zero');
        v /= d;
      } else return v;
    }
  }
  function unary(): number {
    const c = peek();
    if (c === '-') { i++; return -unary(); }
    if (c === '+') { i++; return unary(); }
    return power();
  }
  function power(): number {
    const base = atom();
    if (peek() === '^') {
      i++;
      return Math.pow(base, unary());
    }
    return base;
  }
  function atom(): number {
    const c = peek();
    if (c === undefined) fail('Expected a number');
    if (c === '(') {
      i++;
      const v = sum();
      if (peek() !== ')') fail('Missing ")"');
      i++;
      return v;
    }
    const num = /^(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/.exec(src.slice(i));
    if (num) {
      i += num[0].length;
      return Number(num[0]);
    }
    const name = /^[a-zA-Z]+/.exec(src.slice(i));
    if (name) {
      const n = name[0].toLowerCase();
      i += name[0].length;
      if (n === 'pi') return Math.PI;
      const f = FUNCS[n];
      if (!f) { i -= name[0].length; fail(`Unknown name "${name[0]}"`); }
      if (peek() !== '(') fail(`Expected "(" after ${n}`);
      i++;
      const v = sum();
      if (peek() !== ')') fail('Missing ")"');
      i++;
      return f(v);
    }
    return fail(`Unexpected "${c}"`);
  }

  try {
    const v = sum();
    if (peek() !== undefined) fail(`Unexpected "${src[i]}"`);
    if (!Number.isFinite(v)) return { ok: false, message: `"${src}" does not give a finite number.` };
    return { ok: true, value: v };
  } catch (e) {
    if (e instanceof ExprError) return { ok: false, message: e.message };
    throw e;
  }
}

/**
 * Typed drawing input: "x, y" (absolute), "@dx, dy" (relative to the last point),
 * "L<A" (length L at angle A degrees from the last point), or a single number.
 * Each part is an arithmetic expression.
 */
export type PointInput =
  | { kind: 'abs'; x: number; y: number }
  | { kind: 'rel'; dx: number; dy: number }
  | { kind: 'polar'; length: number; angleDeg: number }
  | { kind: 'scalar'; value: number };

export function parsePointInput(text: string): { ok: true; input: PointInput } | { ok: false; message: string } {
  let s = text.trim();
  if (s === '') return { ok: false, message: 'Type "x, y", "@dx, dy", "length<angle" or a number.' };
  let rel = false;
  if (s.startsWith('@')) {
    rel = true;
    s = s.slice(1);
  }
  const num = (part: string, what: string) => {
    const r = evaluateExpression(part);
    if (!r.ok) throw new Error(`${what}: ${r.message}`);
    return r.value;
  };
  try {
    if (s.includes('<')) {
      const [a, b, ...rest] = s.split('<');
      if (rest.length) return { ok: false, message: 'Use one "<" between length and angle.' };
      return { ok: true, input: { kind: 'polar', length: num(a, 'length'), angleDeg: num(b, 'angle') } };
    }
    const parts = s.split(/[,;]/);
    if (parts.length === 2) {
      const x = num(parts[0], rel ? 'dx' : 'x');
      const y = num(parts[1], rel ? 'dy' : 'y');
      return { ok: true, input: rel ? { kind: 'rel', dx: x, dy: y } : { kind: 'abs', x, y } };
    }
    if (parts.length === 1 && !rel) return { ok: true, input: { kind: 'scalar', value: num(parts[0], 'value') } };
    return { ok: false, message: `Could not read "${text}": type "x, y", "@dx, dy", "length<angle" or a number.` };
  } catch (e) {
    return { ok: false, message: (e as Error).message };
  }
}
