/**
 * A tiny safe arithmetic parser for number fields (never eval), and the reader of typed
 * coordinates built on it. The entry syntax itself, with every hint and message about it, is
 * stated in input-syntax.ts.
 *
 * Grammar (usual precedence, ^ binds tighter than unary minus and is right-associative):
 *   sum     = product (('+' | '-') product)*
 *   product = unary (('*' | '/') unary)*
 *   unary   = ('+' | '-') unary | power
 *   power   = atom ('^' unary)?
 *   atom    = number | 'pi' | name '(' sum ')' | '(' sum ')'
 * Functions: sqrt, sin, cos, tan (degrees), abs. The decimal sign is the point: a comma between
 * digits is refused with the corrected number. The typographic minus (−), times (×) and
 * division (÷) signs read as -, * and /, so numbers copied from a report can be pasted back.
 */
import { ALIAS, MESSAGE, SYMBOL_VARIANTS } from './input-syntax';

export type ExprResult = { ok: true; value: number } | { ok: false; message: string };

/**
 * cos and sin of an angle in degrees: exact for multiples of 90° (cos 90° is 0, not 6e-17),
 * equal in size at odd multiples of 45°, and otherwise reduced to within ±45° of the nearest
 * quarter turn before converting to radians.
 */
export function cosSinDegrees(deg: number): [number, number] {
  let d = deg % 360;
  if (d < 0) d += 360;
  const quarter = Math.round(d / 90);
  const rest = d - 90 * quarter;
  const t = (rest * Math.PI) / 180;
  // ±45° exactly gives equal cos and sin, so tan 45° is 1.
  const c = Math.abs(rest) === 45 ? Math.SQRT1_2 : Math.cos(t);
  const s = Math.abs(rest) === 45 ? Math.sign(rest) * Math.SQRT1_2 : Math.sin(t);
  // (+ 0 turns a negative zero into zero.)
  switch (quarter % 4) {
    case 0: return [c + 0, s + 0];
    case 1: return [-s + 0, c + 0];
    case 2: return [-c + 0, -s + 0];
    default: return [s + 0, -c + 0];
  }
}

const FUNCS: Record<string, (v: number) => number> = {
  sqrt: Math.sqrt,
  abs: Math.abs,
  sin: (d) => cosSinDegrees(d)[1],
  cos: (d) => cosSinDegrees(d)[0],
  tan: (d) => {
    const [c, s] = cosSinDegrees(d);
    return s / c;
  },
};

/** Typographic signs read as their keyboard equivalents. */
function plainSigns(text: string): string {
  return text.replace(/\u2212/g, '-').replace(/×/g, '*').replace(/÷/g, '/');
}

/** "7,5" -> "7.5" (each comma between digits), for the decimal-comma hints. */
function withDecimalPoints(text: string): string {
  return text.replace(/(\d),(\d)/g, '$1.$2');
}

class ExprError extends Error {}

export function evaluateExpression(text: string): ExprResult {
  const src = plainSigns(text).trim();
  if (src === '') return { ok: false, message: 'Enter a number.' };
  if (/\d,\d/.test(src)) return { ok: false, message: MESSAGE.numberComma(withDecimalPoints(src)) };
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

// ---------------------------------------------------------------------------------------------
// Typed coordinates (the syntax and its messages: input-syntax.ts)

/**
 * One typed entry. Lengths and angles are as typed (angles in degrees, CCW from +x); `abs` is a
 * point, `rel` a displacement from the last point, `polar` a length at an angle from the last
 * point, `scalar` a single number, `diameter` a diameter given where a radius is asked, and `arc`
 * a path arc of a radius turning through a signed sweep (positive to the left) from the last
 * segment's direction.
 */
export type PointInput =
  | { kind: 'abs'; x: number; y: number }
  | { kind: 'rel'; dx: number; dy: number }
  | { kind: 'polar'; length: number; angleDeg: number }
  | { kind: 'scalar'; value: number }
  | { kind: 'diameter'; value: number }
  | { kind: 'arc'; radius: number; sweepDeg: number };

/**
 * What the step being typed for accepts, which decides how "7,5" reads: `point` (a point; the
 * comma separates), `number` (one number; refused with the hint 7.5), `number-or-point` (either,
 * such as a circle's radius or a point on it; refused as ambiguous).
 */
export type EntryExpectation = 'point' | 'number' | 'number-or-point';

export type PointParse = { ok: true; input: PointInput } | { ok: false; message: string };

class EntryError extends Error {}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const anyOf = (xs: readonly string[]) => xs.map(escape).join('|');
/** A prefix word or symbol, followed by anything but another letter. */
const DELTA_PREFIX = new RegExp(`^(?:${anyOf(SYMBOL_VARIANTS.delta)}|${ALIAS.delta}(?![a-z]))\\s*`, 'i');
const DIAMETER_PREFIX = new RegExp(`^(?:${anyOf(SYMBOL_VARIANTS.diameter)}|${ALIAS.diameter}(?![a-z]))\\s*`, 'i');
const DEGREE_SUFFIX = new RegExp(`(?:${anyOf(SYMBOL_VARIANTS.degree)})\\s*$`);

/** The top-level (outside parentheses) commas, and the infix ∠ / a and ⌒ / arc marks. */
function scan(s: string): { commas: number[]; ops: { kind: 'polar' | 'arc'; at: number; len: number }[] } {
  const commas: number[] = [];
  const ops: { kind: 'polar' | 'arc'; at: number; len: number }[] = [];
  let depth = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s[i];
    if (c === '(') depth++;
    else if (c === ')') depth--;
    else if (depth !== 0) continue;
    else if (c === ',') commas.push(i);
    else if ((SYMBOL_VARIANTS.angle as readonly string[]).includes(c)) ops.push({ kind: 'polar', at: i, len: 1 });
    else if ((SYMBOL_VARIANTS.arc as readonly string[]).includes(c)) ops.push({ kind: 'arc', at: i, len: 1 });
    else if (/[a-z]/i.test(c)) {
      // A whole word: the marks count only when they stand alone, never inside "abs" or "pi".
      let j = i;
      while (j < s.length && /[a-z]/i.test(s[j])) j++;
      const w = s.slice(i, j).toLowerCase();
      if (w === ALIAS.angle) ops.push({ kind: 'polar', at: i, len: j - i });
      else if (w === ALIAS.arc) ops.push({ kind: 'arc', at: i, len: j - i });
      i = j - 1;
    }
  }
  return { commas, ops };
}

/** "(x, y)" -> "x, y" when one pair of parentheses wraps the whole entry and holds a comma. */
function unwrap(s: string): string {
  if (!s.startsWith('(') || !s.endsWith(')')) return s;
  let depth = 0;
  for (let i = 0; i < s.length; i++) {
    if (s[i] === '(') depth++;
    else if (s[i] === ')') depth--;
    if (depth === 0 && i < s.length - 1) return s; // the first "(" closes before the end
  }
  const inner = s.slice(1, -1).trim();
  return scan(inner).commas.length > 0 ? inner : s;
}

/** A comma where only single numbers belong: a decimal comma (shown corrected) or a stray one. */
function commaInOneNumber(s: string, otherwise: string): string {
  const corrected = withDecimalPoints(s);
  return corrected !== s ? MESSAGE.decimalComma(corrected) : otherwise;
}

function num(part: string, what: string): number {
  const r = evaluateExpression(part);
  if (!r.ok) throw new EntryError(MESSAGE.part(what, r.message));
  return r.value;
}

/** The same entry in the present syntax, for an entry written with "@" or "<". */
function oldStyle(s: string): string {
  const body = s.replace(/^\s*@\s*/, '');
  const angled = body.split('<');
  if (angled.length === 2 && angled.every((p) => p.trim() !== '' && !p.includes('@')))
    return MESSAGE.oldPolar(angled[0].trim(), angled[1].trim());
  const parts = body.split(',');
  if (s.trim().startsWith('@') && !body.includes('<') && !body.includes('@') && parts.length === 2 && parts.every((p) => p.trim() !== ''))
    return MESSAGE.oldRelative(parts[0].trim(), parts[1].trim());
  return MESSAGE.oldGeneric;
}

/**
 * Read a typed entry (the syntax of input-syntax.ts). `expects` says what the step accepts, which
 * decides only how a comma between digits with no space ("7,5") reads. Every number may be
 * arithmetic. Refusals name the part that is wrong and show the corrected entry.
 */
export function parsePointInput(text: string, expects: EntryExpectation = 'point'): PointParse {
  const s = plainSigns(text).trim();
  if (s === '') return { ok: false, message: MESSAGE.empty };
  if (/[@<]/.test(s)) return { ok: false, message: oldStyle(s) };
  if (s.includes(';')) {
    const [x, ...rest] = s.split(';');
    return { ok: false, message: MESSAGE.semicolon(x.trim(), rest.join(', ').trim()) };
  }
  try {
    return { ok: true, input: read(s, expects) };
  } catch (e) {
    if (e instanceof EntryError) return { ok: false, message: e.message };
    throw e;
  }
}

function read(s: string, expects: EntryExpectation): PointInput {
  let mode: 'plain' | 'delta' | 'diameter' = 'plain';
  let rest = s;
  const dia = DIAMETER_PREFIX.exec(s);
  const delta = dia ? null : DELTA_PREFIX.exec(s);
  if (dia) [mode, rest] = ['diameter', s.slice(dia[0].length)];
  else if (delta) [mode, rest] = ['delta', s.slice(delta[0].length)];
  rest = unwrap(rest.trim());
  const { commas, ops } = scan(rest);

  if (ops.length > 1) throw new EntryError(MESSAGE.oneOperator);
  if (ops.length === 1) {
    const op = ops[0];
    if (mode === 'diameter') throw new EntryError(MESSAGE.diameterOnly);
    if (commas.length > 0) throw new EntryError(commaInOneNumber(s, op.kind === 'polar' ? MESSAGE.polarParts : MESSAGE.arcParts));
    const left = rest.slice(0, op.at);
    const right = rest.slice(op.at + op.len).replace(DEGREE_SUFFIX, '');
    if (op.kind === 'polar') return { kind: 'polar', length: num(left, 'length'), angleDeg: num(right, 'angle') };
    if (mode === 'delta') throw new EntryError(MESSAGE.arcNotRelative);
    return { kind: 'arc', radius: num(left, 'radius'), sweepDeg: num(right, 'sweep') };
  }
  if (mode === 'diameter') {
    if (commas.length > 0) throw new EntryError(commaInOneNumber(s, MESSAGE.diameterOnly));
    return { kind: 'diameter', value: num(rest, 'diameter') };
  }
  if (commas.length === 0) {
    if (mode === 'delta') throw new EntryError(MESSAGE.relativeNeedsTwo);
    return { kind: 'scalar', value: num(rest, 'value') };
  }
  if (commas.length > 1) throw new EntryError(MESSAGE.tooManyParts);
  // One comma. Between two digits with no space it may be a decimal comma.
  if (mode === 'plain' && /^[+-]?\d+,\d+$/.test(rest)) {
    const asNumber = rest.replace(',', '.');
    if (expects === 'number') throw new EntryError(MESSAGE.decimalComma(asNumber));
    if (expects === 'number-or-point') throw new EntryError(MESSAGE.ambiguousComma(rest, asNumber, rest.replace(',', ', ')));
  }
  const a = rest.slice(0, commas[0]), b = rest.slice(commas[0] + 1);
  if (mode === 'delta') return { kind: 'rel', dx: num(a, 'dx'), dy: num(b, 'dy') };
  return { kind: 'abs', x: num(a, 'x'), y: num(b, 'y') };
}
