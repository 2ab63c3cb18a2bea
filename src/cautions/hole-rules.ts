/**
 * Published minimum edge distances and spacings of bolt holes, in terms of the hole diameter d0,
 * as selectable rule sets. These are geometry checks only: the rules also depend on the load
 * direction, the plate thickness, the bolt and the edge preparation, which a cross-section does not
 * carry, so the maxima and the bearing reductions are not checked.
 *
 * The clause is given beside every number. All numbers were written down from memory of the
 * cited tables (the editions named), not copied from the books: confirm them before relying on
 * them.
 *
 * EN 1993-1-8:2005, Table 3.3 (from memory): end distance e1 ≥ 1.2 d0 and edge distance
 * e2 ≥ 1.2 d0, both from the hole centre to the edge; spacing p1 ≥ 2.2 d0 along the load and
 * p2 ≥ 2.4 d0 across it, centre to centre. Without a load direction the spacing is checked
 * against p1 and reported against p2 as well.
 *
 * AISC 360-16 (from memory): Section J3.3, centre-to-centre spacing ≥ 2⅔ d, 3 d preferred, with
 * d the bolt diameter; Section J3.4, Table J3.4 (inches) and J3.4M (mm), minimum distance from
 * the centre of a standard hole to an edge, by bolt diameter, 1.25 d above the table. The bolt
 * diameter is taken back from the hole as a standard hole (Table J3.3: d + 1/16 in up to 7/8 in,
 * d + 1/8 in from 1 in; Table J3.3M: d + 2 mm up to M22, d + 3 mm from M24). A bolt between
 * tabulated sizes takes the next larger row; below the first row, the first row's ratio.
 */

export type HoleRuleSetId = 'en1993' | 'aisc360';

export interface RuleValue {
  /** The minimum, in document units. */
  value: number;
  /** How it is formed, e.g. "1.2 d0" or "Table J3.4M, M20: 26 mm". */
  basis: string;
  /** Where it comes from, with "from memory" where the number was recalled. */
  clause: string;
}

export interface HoleRuleSet {
  id: HoleRuleSetId;
  name: string;
  /** Minimum distance from a hole centre to a free edge. */
  minEdge(d0: number, unitInMetres: number): RuleValue;
  /** Minimum centre-to-centre spacing of two holes of diameter d0. */
  minSpacing(d0: number, unitInMetres: number): RuleValue;
  /** A second, stricter spacing the rules give in some direction (EN: p2 across the load), or null. */
  otherSpacing(d0: number, unitInMetres: number): RuleValue | null;
  /** What these geometry checks leave out. */
  notChecked: string;
}

const EN_TABLE = 'EN 1993-1-8:2005, Table 3.3 (from memory)';

export const EN1993_RULES: HoleRuleSet = {
  id: 'en1993',
  name: 'EN 1993-1-8, Table 3.3',
  minEdge: (d0) => ({ value: 1.2 * d0, basis: 'e1, e2 ≥ 1.2 d0', clause: EN_TABLE }),
  minSpacing: (d0) => ({ value: 2.2 * d0, basis: 'p1 ≥ 2.2 d0 (along the load)', clause: EN_TABLE }),
  otherSpacing: (d0) => ({ value: 2.4 * d0, basis: 'p2 ≥ 2.4 d0 (across the load)', clause: EN_TABLE }),
  notChecked:
    'Not checked: the maximum distances of Table 3.3 (they depend on the plate thickness and exposure), the direction of the load, staggered rows, and the bearing reductions of Table 3.4.',
};

/** Table J3.4 (in): bolt diameter → minimum edge distance, AISC 360-16 (from memory). */
const J34_IN: readonly [number, number][] = [[0.5, 0.75], [0.625, 0.875], [0.75, 1], [0.875, 1.125], [1, 1.25], [1.125, 1.5], [1.25, 1.625]];
/** Table J3.4M (mm): bolt diameter → minimum edge distance, AISC 360-16 (from memory). */
const J34_MM: readonly [number, number][] = [[16, 22], [20, 26], [22, 28], [24, 30], [27, 34], [30, 38], [36, 46]];

interface BoltSize {
  /** Bolt diameter in the table's unit (in or mm). */
  d: number;
  inch: boolean;
  unit: string;
  /** Table unit → document units. */
  toDoc: number;
}

/** The bolt that a standard hole of diameter d0 (document units) takes, AISC 360-16, Table J3.3/J3.3M (from memory). */
function boltFromHole(d0: number, unitInMetres: number): BoltSize {
  // Inch tables for inch and foot documents, metric tables otherwise.
  const inch = Math.abs(unitInMetres - 0.0254) < 1e-12 || Math.abs(unitInMetres - 0.3048) < 1e-12;
  const tableUnitMetres = inch ? 0.0254 : 0.001;
  const h = (d0 * unitInMetres) / tableUnitMetres;
  const d = inch ? (h < 1.125 ? h - 1 / 16 : h - 1 / 8) : h < 27 ? h - 2 : h - 3;
  return { d: Math.max(d, h / 2), inch, unit: inch ? 'in' : 'mm', toDoc: tableUnitMetres / unitInMetres };
}

function tableEdge(b: BoltSize): { value: number; basis: string } {
  const table = b.inch ? J34_IN : J34_MM;
  const name = b.inch ? 'Table J3.4' : 'Table J3.4M';
  const fmt = (v: number) => (b.inch ? `${+v.toFixed(4)} in` : `${+v.toFixed(2)} mm`);
  const last = table[table.length - 1];
  if (b.d > last[0] * (1 + 1e-9)) return { value: 1.25 * b.d, basis: `${name}, bolt over ${fmt(last[0])}: 1.25 d = ${fmt(1.25 * b.d)}` };
  const first = table[0];
  if (b.d < first[0] * (1 - 1e-9)) {
    const ratio = first[1] / first[0];
    return { value: ratio * b.d, basis: `${name}, bolt below ${fmt(first[0])}: the first row's ratio ${+ratio.toFixed(4)} d = ${fmt(ratio * b.d)}` };
  }
  const row = table.find((r) => r[0] >= b.d * (1 - 1e-9)) ?? last;
  const exact = Math.abs(row[0] - b.d) <= 1e-9 * row[0];
  return { value: row[1], basis: `${name}, ${exact ? '' : 'next larger '}bolt ${fmt(row[0])}: ${fmt(row[1])}` };
}

const AISC = 'AISC 360-16';

export const AISC360_RULES: HoleRuleSet = {
  id: 'aisc360',
  name: 'AISC 360, Sections J3.3–J3.5',
  minEdge(d0, unitInMetres) {
    const b = boltFromHole(d0, unitInMetres);
    const e = tableEdge(b);
    return { value: e.value * b.toDoc, basis: `${e.basis} (bolt d = ${+b.d.toFixed(4)} ${b.unit} for a standard hole, Table J3.3${b.inch ? '' : 'M'})`, clause: `${AISC}, Section J3.4 (from memory)` };
  },
  minSpacing(d0, unitInMetres) {
    const b = boltFromHole(d0, unitInMetres);
    return { value: ((8 / 3) * b.d) * b.toDoc, basis: `s ≥ 2⅔ d, d = ${+b.d.toFixed(4)} ${b.unit}`, clause: `${AISC}, Section J3.3 (from memory)` };
  },
  otherSpacing(d0, unitInMetres) {
    const b = boltFromHole(d0, unitInMetres);
    return { value: 3 * b.d * b.toDoc, basis: `3 d preferred, d = ${+b.d.toFixed(4)} ${b.unit}`, clause: `${AISC}, Section J3.3 (from memory)` };
  },
  notChecked:
    'Not checked: the maximum spacing and edge distance of Section J3.5 (they depend on the plate thickness), oversized and slotted holes (Table J3.5), the load direction, and bearing and tearout (Section J3.10).',
};

export const HOLE_RULE_SETS: Record<HoleRuleSetId, HoleRuleSet> = { en1993: EN1993_RULES, aisc360: AISC360_RULES };
