/**
 * Kern's typed entry, stated once. Every placeholder, prompt hint, keyboard-help line and error
 * message about typed coordinates comes from this module; the parser (expr.ts) reads its
 * symbols from here too, so the syntax cannot drift between what is shown and what is read.
 *
 * The notation is ordinary mathematics, with one plain-keyboard spelling for each symbol:
 *
 *   x, y          a point                          (10, 20) also reads as a point
 *   Δ dx, dy      a displacement from the last point    d dx, dy
 *   L ∠ θ         length L at θ degrees (CCW from +x)    L a θ       (phasor notation)
 *   Ø D           a diameter, where a radius is asked    dia D
 *   R ⌒ φ         an arc of radius R turning φ degrees   R arc φ     (+ left, − right)
 *
 * Numbers are arithmetic (2*12.5, 100/3, sqrt(2)*50). The decimal sign is the point; a comma
 * only ever separates the two numbers of a point. Where a single number is asked, "7,5" is
 * refused with the hint "7.5"; where a number or a point may be typed, "7,5" is refused as
 * ambiguous (type 7.5, or 7, 5 with a space). A semicolon is refused.
 *
 * Why it is unambiguous: each kind of entry is told by one mark that no number can contain: a
 * leading Δ (or the lone letter d), an infix ∠ (or the lone letter a), a leading Ø (or the word
 * dia), an infix ⌒ (or the word arc), otherwise one comma (a point) or none (a number). The
 * letters count only as whole words, so the names of the arithmetic (pi, sqrt, abs …) never
 * clash with them. Entries that start with a digit need no command key to be free; the letter d
 * must stay unbound as a command key so that typing "d 20, 0" on the canvas starts an entry.
 */

/** The symbols and their plain-keyboard spellings (lower case; read without regard to case). */
export const SYMBOL = {
  delta: 'Δ',
  angle: '∠',
  diameter: 'Ø',
  arc: '⌒',
  degree: '°',
} as const;

export const ALIAS = {
  delta: 'd',
  angle: 'a',
  diameter: 'dia',
  arc: 'arc',
} as const;

/** Other code points read as the same symbol (Greek capital delta vs the increment sign, …). */
export const SYMBOL_VARIANTS = {
  delta: ['Δ', '∆'],
  angle: ['∠'],
  diameter: ['Ø', 'ø', '⌀'],
  arc: ['⌒'],
  degree: ['°', 'º'],
} as const;

/** A key that begins a typed entry when pressed on the canvas (digits, signs, the symbols, d). */
export const ENTRY_START = /^[0-9.+\-(ΔØø⌀∆dD]$/;

/** The coordinate box's placeholder: the three point forms as typed on a plain keyboard. */
export const PLACEHOLDER = 'x, y · d dx, dy · L a θ';

/** The coordinate box's tooltip: every form in words, and the decimal rule. */
export const ENTRY_TITLE =
  'A point: x, y. From the last point: d dx, dy (Δ) or L a θ (L ∠ θ, θ in degrees CCW from +x). ' +
  'Where a radius is asked: a number, or dia D (Ø D). While drawing a path: R arc φ (R ⌒ φ). ' +
  'Decimals take a point (7.5); a comma only separates x and y. Enter takes the entry, Escape clears it.';

/** Short hints for the prompts, one per kind of step. */
export const HINT = {
  /** The first point of a shape. */
  firstPoint: 'x, y',
  /** Any later point. */
  nextPoint: 'x, y · d dx, dy · L a θ',
  /** The second corner of a rectangle. */
  corner: 'x, y · d width, height',
  /** A circle's size: a radius, a diameter or a point on the circle. */
  radius: 'radius · dia D (Ø D) · or a point; decimals with a point: 7.5',
  /** Moving a selection. */
  move: 'd dx, dy · L a θ',
  /** A path arc by radius and sweep, continuing the last segment. */
  arc: 'R arc φ (+ left, − right)',
  /** The decimal rule, for a field's tooltip. */
  decimals: 'decimals with a point: 7.5',
} as const;

export interface HelpLine {
  /** The notation as written in mathematics. */
  form: string;
  /** How to type it on a plain keyboard (absent when it is the same). */
  typed?: string;
  meaning: string;
}

/** The "typed entry" section of the keyboard-help sheet. */
export const HELP_LINES: readonly HelpLine[] = [
  { form: 'x, y', meaning: 'point at x, y; (x, y) works too' },
  { form: 'Δ dx, dy', typed: 'd dx, dy', meaning: 'point moved dx, dy from the last one; moves a selection' },
  { form: 'L ∠ θ', typed: 'L a θ', meaning: 'length L at θ° from the last point, CCW from +x' },
  { form: 'Ø D', typed: 'dia D', meaning: 'a diameter where a radius is asked' },
  { form: 'R ⌒ φ', typed: 'R arc φ', meaning: 'path arc of radius R turning φ° from the last segment (+ left, − right)' },
  { form: '2*12.5, 100/3', meaning: 'arithmetic in any number: + − * / ^ ( ) pi sqrt sin cos tan abs' },
  { form: '7.5', meaning: 'decimals take a point; a comma separates x and y' },
];

// ---------------------------------------------------------------------------------------------
// Messages. Quoted examples use the plain-keyboard spelling, with the symbol form after it.

const q = (s: string) => `“${s}”`;

export const MESSAGE = {
  empty: `Type a point as ${q('x, y')}, ${q('d dx, dy')} or ${q('L a θ')}, or a number.`,
  /** An entry in an older style with a leading "@": show the relative form with the same numbers. */
  oldRelative: (dx: string, dy: string) => `For a point relative to the last one, type ${q(`d ${dx}, ${dy}`)} (Δ ${dx}, ${dy}).`,
  /** An entry in an older style with "<": show the polar form with the same numbers. */
  oldPolar: (length: string, angle: string) => `For a length at an angle, type ${q(`${length} a ${angle}`)} (${length} ∠ ${angle}).`,
  oldGeneric: `Type a relative point as ${q('d dx, dy')} (Δ dx, dy) and a length at an angle as ${q('L a θ')} (L ∠ θ).`,
  semicolon: (x: string, y: string) => `Separate x and y with a comma: ${q(`${x}, ${y}`)}.`,
  decimalComma: (suggestion: string) => `Decimals take a point: ${q(suggestion)}. A comma separates the two numbers of a point.`,
  ambiguousComma: (text: string, asNumber: string, asPoint: string) =>
    `${q(text)} could be the number ${asNumber} or the point ${asPoint}: type ${q(asNumber)} for the number, or ${q(asPoint)} (with a space) for the point.`,
  tooManyParts: `A point takes two numbers with one comma between them: ${q('x, y')}. Decimals take a point (7.5).`,
  relativeNeedsTwo: `A displacement takes two numbers: ${q('d dx, dy')} (Δ dx, dy). For a diameter type ${q('dia 14')} (Ø14).`,
  oneOperator: `Use one ${q('a')} (∠) between length and angle, or one ${q('arc')} (⌒) between radius and sweep.`,
  diameterOnly: `A diameter takes one number: ${q('dia 14')} (Ø14).`,
  polarParts: `The length and the angle are one number each: ${q('L a θ')} (L ∠ θ).`,
  arcParts: `The radius and the sweep are one number each: ${q('R arc φ')} (R ⌒ φ).`,
  arcNotRelative: `An arc by radius and sweep always continues from the last point: type ${q('R arc φ')} without d.`,
  /** Prefix of a message about one part of an entry ("x", "dy", "angle", …). */
  part: (what: string, message: string) => `${what}: ${message}`,
  noPrevious: `There is no previous point yet: type the first point as ${q('x, y')}.`,
  pointNeedsTwo: `A point takes two numbers: ${q('x, y')}, ${q('d dx, dy')} or ${q('L a θ')}.`,
  diameterNotHere: `A diameter (${q('dia 14')}, Ø14) can be typed only where a radius is asked.`,
  arcNotHere: `An arc by radius and sweep (${q('20 arc 90')}) is typed while drawing a path.`,
  arcNeedsDirection: 'An arc by radius and sweep continues the last segment: draw a first line or arc, then type it.',
  arcRadius: 'The arc radius must be greater than 0.',
  arcSweep: 'The sweep must lie between −360° and 360° and not be 0 (+ turns left, − turns right).',
  radiusPositive: 'The radius must be greater than 0.',
  diameterPositive: 'The diameter must be greater than 0.',
  moveForm: `Type a move as ${q('d dx, dy')} (Δ dx, dy) or ${q('L a θ')} (L ∠ θ).`,
  /** A number field given a decimal comma (e.g. "1,5"). */
  numberComma: (suggestion: string) => `Decimals take a point: ${q(suggestion)}.`,
} as const;
