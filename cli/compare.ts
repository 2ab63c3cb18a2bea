/**
 * `kern compare BASE.json PROPOSED.json [--json] [--rules en1993|aisc360] [--limits FILE]`
 * `kern compare FILE --variant NAME ...` (a version-2 document with proposals)
 *
 * Compares a proposal (the section as the fabricator proposes to cut it) with its baseline: every
 * property before and after, the change and the change in per cent, the centroid shift and the
 * rotation of the principal axes, the limits with a within/beyond verdict, and the structural
 * cautions of the cutout. Limits come from --limits FILE, else from the document, else the
 * example limits (labelled as examples). Exit codes: 0 either verdict, 2 invalid input or usage.
 */
import { readFileSync } from 'node:fs';
import {
  convertDocumentUnits,
  evaluateDocument,
  formatIssue,
  formatShapeIssue,
  shapeDisplayName,
  formatNumber,
  UNIT_IN_METRES,
  type Evaluation,
  type SectionDocument,
  type SectionProperties,
  sectionOf,
  VariantError,
} from '../src';
import { analyseCutouts, CUTOUT_CAUTION_TEXT, HOLE_CHECK_NOTE, type Caution, type InputShape } from '../src/cautions';
import {
  compareSections,
  evaluateLimits,
  EXAMPLE_LIMITS_NOTE,
  exampleLimits,
  overallVerdict,
  validateLimits,
  type Limit,
  type LimitResult,
  type SectionComparison,
} from '../src/compare';
import { CAUTION_TEXT } from '../src/report/caution';
import { loadFile, parseArgs, UsageError } from './main';

/** Bad input that is not a usage mistake (a file without variants, an invalid limits file): exit 2. */
export class CompareInputError extends Error {}

/** The named proposal of a version-2 document as a plain section, or why there is none. */
export function proposalOf(doc: SectionDocument, name: string): SectionDocument {
  if (!doc.variants?.length) throw new CompareInputError(`this file has no proposals, so there is no "${name}" to compare; give two files (BASE.json PROPOSED.json) instead`);
  try {
    return sectionOf(doc, name);
  } catch (e) {
    if (e instanceof VariantError) throw new CompareInputError(e.message);
    throw e;
  }
}

export const RULE_SETS = ['en1993', 'aisc360'] as const;
export type RulesFlag = (typeof RULE_SETS)[number];

export interface Side {
  label: string;
  doc: SectionDocument;
  ev: Evaluation;
  props: SectionProperties;
  warnings: string[];
}

function out(s: string): void {
  process.stdout.write(s.endsWith('\n') ? s : s + '\n');
}
function err(s: string): void {
  process.stderr.write(s.endsWith('\n') ? s : s + '\n');
}

/** Evaluate one section document; a message instead when it has no area. */
export function evaluateSide(label: string, doc: SectionDocument, warnings: string[]): Side | string {
  const ev = evaluateDocument(doc);
  if (!ev.props) return `${label}: ${ev.message ?? 'the section has no area'}${ev.warnings.map((w) => `\n  warning: ${formatShapeIssue(w, doc.shapes)}`).join('')}`;
  return { label, doc, ev, props: ev.props, warnings: [...warnings, ...ev.warnings.map((w) => formatShapeIssue(w, doc.shapes))] };
}

/** The input shapes of an evaluated document, for the cautions to name. */
export function inputShapes(doc: SectionDocument, ev: Evaluation): InputShape[] {
  return doc.shapes.map((s, k) => {
    // The cautions name a shape by its display name, as the panel, the canvas and the report do.
    return { id: s.id, op: s.op ?? 'add', region: ev.shapes[k]?.region ?? [], name: shapeDisplayName(s, k) } satisfies InputShape;
  });
}

/** The two documents to compare, with the proposal in the baseline's units. */
async function loadPair(positional: string[], variant: string | undefined, units: string | undefined): Promise<{ base: Side; proposal: Side } | string[]> {
  const read = async (file: string) => {
    const r = await loadFile(file, units);
    if (!r.ok) return [`${file}: the section cannot be read:`, ...r.messages.map((m) => `  ${m}`)];
    return r;
  };
  let baseDoc: SectionDocument, propDoc: SectionDocument, baseWarn: string[], propWarn: string[], baseLabel: string, propLabel: string;
  if (variant !== undefined) {
    if (positional.length !== 1) throw new UsageError('with --variant NAME give exactly one FILE');
    const r = await read(positional[0]);
    if (Array.isArray(r)) return r;
    try {
      baseDoc = r.doc;
      propDoc = proposalOf(r.doc, variant);
    } catch (e) {
      if (e instanceof CompareInputError) return [`${positional[0]}: ${e.message}`];
      throw e;
    }
    baseWarn = propWarn = r.warnings;
    baseLabel = `${positional[0]} (baseline)`;
    propLabel = `${positional[0]} (${variant})`;
  } else {
    if (positional.length !== 2) throw new UsageError(positional.length < 2 ? 'compare needs BASE.json and PROPOSED.json (or FILE --variant NAME)' : 'compare takes two files');
    const a = await read(positional[0]);
    const b = await read(positional[1]);
    const msgs = [...(Array.isArray(a) ? a : []), ...(Array.isArray(b) ? b : [])];
    if (Array.isArray(a) || Array.isArray(b)) return msgs;
    baseDoc = a.doc;
    propDoc = b.doc;
    baseWarn = a.warnings;
    propWarn = b.warnings;
    baseLabel = positional[0];
    propLabel = positional[1];
  }
  if (propDoc.units !== baseDoc.units) {
    propWarn = [...propWarn, `the proposal is in ${propDoc.units} and was converted to the baseline's ${baseDoc.units}`];
    propDoc = convertDocumentUnits(propDoc, baseDoc.units);
  }
  const base = evaluateSide(baseLabel, baseDoc, baseWarn);
  const proposal = evaluateSide(propLabel, propDoc, propWarn);
  const msgs = [typeof base === 'string' ? base : null, typeof proposal === 'string' ? proposal : null].filter((m): m is string => m !== null);
  if (typeof base === 'string' || typeof proposal === 'string') return msgs;
  return { base, proposal };
}

/** The limits to use and where they came from. */
function chooseLimits(file: string | undefined, base: SectionDocument, proposal: SectionDocument): { limits: Limit[]; source: 'file' | 'document' | 'examples' } | string[] {
  if (file !== undefined) {
    let value: unknown;
    try {
      value = JSON.parse(readFileSync(file, 'utf8'));
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      return [`${file}: ${code ? `cannot read the limits file: ${code}` : `the limits file is not valid JSON (${e instanceof Error ? e.message : String(e)})`}`];
    }
    const list = value !== null && typeof value === 'object' && !Array.isArray(value) && 'limits' in value ? (value as { limits: unknown }).limits : value;
    const issues = validateLimits(list, 'limits');
    if (issues.length) return [`${file}: the limits cannot be used:`, ...issues.map((i) => `  ${formatIssue(i)}`)];
    return { limits: list as Limit[], source: 'file' };
  }
  for (const doc of [base, proposal]) {
    const list = (doc as { limits?: unknown }).limits;
    if (list === undefined) continue;
    const issues = validateLimits(list, 'limits');
    if (issues.length) return ['the document\'s limits cannot be used:', ...issues.map((i) => `  ${formatIssue(i)}`)];
    return { limits: list as Limit[], source: 'document' };
  }
  return { limits: exampleLimits(UNIT_IN_METRES[base.units]), source: 'examples' };
}

type Nested = { [k: string]: number | null | Nested };

/** A flat key list ('centroid.x', 'Ix', ...) as the nested object of `props --json`. */
function nest(entries: [string, number | null][]): Nested {
  const o: Nested = {};
  for (const [key, v] of entries) {
    const parts = key.split('.');
    let at = o;
    for (const p of parts.slice(0, -1)) at = (at[p] ??= {}) as Nested;
    at[parts[parts.length - 1]] = v;
  }
  return o;
}

const finite = (v: number | null) => (v !== null && Number.isFinite(v) ? v : null);

export interface CompareReport {
  units: string;
  baseline: Nested;
  proposal: Nested;
  change: Nested;
  change_percent: Nested;
  centroid_shift: { x: number; y: number; length: number };
  principal_axes: { rotation: number | null; note: string | null };
  notes: Record<string, string>;
  limits: LimitResult[];
  limits_source: 'file' | 'document' | 'examples';
  limits_note: string | null;
  verdict: 'within' | 'beyond';
  rules: RulesFlag;
  cautions: Caution[];
  caution: string;
  warnings: string[];
}

export function buildReport(base: Side, proposal: Side, c: SectionComparison, limits: LimitResult[], source: CompareReport['limits_source'], rules: RulesFlag, cautions: Caution[]): CompareReport {
  const notes: Record<string, string> = {};
  for (const r of c.rows) if (r.note) notes[r.key] = r.note;
  return {
    units: base.doc.units,
    baseline: nest(c.rows.map((r) => [r.key, finite(r.baseline)])),
    proposal: nest(c.rows.map((r) => [r.key, finite(r.proposal)])),
    change: nest(c.rows.map((r) => [r.key, finite(r.change)])),
    change_percent: nest(c.rows.map((r) => [r.key, finite(r.changePercent)])),
    centroid_shift: { x: c.centroidShift.dx, y: c.centroidShift.dy, length: c.centroidShift.length },
    principal_axes: { rotation: c.rotation.degrees, note: c.rotation.note },
    notes,
    limits,
    limits_source: source,
    limits_note: source === 'examples' ? EXAMPLE_LIMITS_NOTE : null,
    verdict: overallVerdict(limits),
    rules,
    cautions,
    caution: `${CUTOUT_CAUTION_TEXT} ${HOLE_CHECK_NOTE} ${CAUTION_TEXT}`,
    warnings: [...base.warnings.map((w) => `baseline: ${w}`), ...proposal.warnings.map((w) => `proposal: ${w}`)],
  };
}

function tableText(rows: string[][]): string {
  const widths = rows[0].map((_, k) => Math.max(...rows.map((r) => r[k].length)));
  return rows.map((r) => r.map((cell, k) => (k === 0 ? cell.padEnd(widths[k]) : cell.padStart(widths[k]))).join('  ').trimEnd()).join('\n');
}

function printTable(base: Side, proposal: Side, c: SectionComparison, report: CompareReport): void {
  const units = base.doc.units;
  const L = c.extent;
  const statusOf = (key: string) => {
    const hits = report.limits.filter((l) => l.property === key && l.status !== 'not-applicable');
    if (!hits.length) return '';
    return hits.some((h) => h.status === 'beyond') ? 'BEYOND' : 'within';
  };
  const rows: string[][] = [['Property', 'Baseline', 'Proposal', 'Change', 'Change %', 'Unit', 'Limit']];
  for (const r of c.rows) {
    const unit = r.power === 0 ? r.unit ?? '' : `${units}${['', '', '²', '³', '⁴'][r.power] ?? `^${r.power}`}`;
    const scale = r.power === 0 ? 90 : Math.pow(L, r.power);
    rows.push([
      r.label,
      formatNumber(r.baseline, 6, scale),
      formatNumber(r.proposal, 6, scale),
      r.change === null ? '—' : formatNumber(r.change, 6, scale),
      r.changePercent === null ? '—' : `${formatNumber(r.changePercent, 4)} %`,
      unit,
      statusOf(r.key),
    ]);
  }
  out(`Comparison: ${base.label} → ${proposal.label} (${units})`);
  out(tableText(rows));
  const s = c.centroidShift;
  out(`Centroid shift: (${formatNumber(s.dx, 6, L)}, ${formatNumber(s.dy, 6, L)}) ${units}, length ${formatNumber(s.length, 6, L)} ${units}  ${statusOf('centroid')}`.trimEnd());
  out(`Rotation of the principal axes: ${c.rotation.degrees === null ? '—' : `${formatNumber(c.rotation.degrees, 6, 90)}°`}${c.rotation.note ? ` (${c.rotation.note})` : ''}`);
  out('');
  out(`Limits (${report.limits_source === 'examples' ? `examples: ${EXAMPLE_LIMITS_NOTE}` : `from the ${report.limits_source}`}):`);
  for (const l of report.limits) out(`  [${l.status === 'beyond' ? 'BEYOND' : l.status}] ${l.message}`);
  out(`Verdict: ${report.verdict.toUpperCase()}`);
  out('');
  out(report.cautions.length ? `Cautions (${report.rules === 'en1993' ? 'hole rules EN 1993-1-8' : 'hole rules AISC 360'}):` : 'Cautions: none raised by the geometry.');
  for (const k of report.cautions) out(`  [${k.severity}] ${k.message}${k.source ? ` [${k.source}]` : ''}`);
  const pct = c.rows.filter((r) => r.changePercent === null && r.note && (r.kind === 'signed' || r.kind === 'magnitude'));
  for (const r of pct) out(`note: ${r.symbol}: ${r.note}`);
  for (const w of report.warnings) out(`warning: ${w}`);
  out(report.caution);
}

export async function compareCommand(args: string[]): Promise<number> {
  const a = parseArgs(args, ['rules', 'limits', 'variant', 'units']);
  const rulesRaw = a.flags.get('rules') ?? 'en1993';
  if (rulesRaw === true || !(RULE_SETS as readonly string[]).includes(rulesRaw)) throw new UsageError(`--rules takes ${RULE_SETS.join(' or ')}`);
  const rules = rulesRaw as RulesFlag;
  const variant = a.flags.get('variant');
  if (variant === true) throw new UsageError('--variant needs a name');
  const limitsFile = a.flags.get('limits');
  if (limitsFile === true) throw new UsageError('--limits needs a file');
  const pair = await loadPair(a.positional, variant, a.flags.get('units') as string | undefined);
  if (Array.isArray(pair)) {
    for (const m of pair) err(m);
    return 2;
  }
  const { base, proposal } = pair;
  const chosen = chooseLimits(limitsFile, base.doc, proposal.doc);
  if (Array.isArray(chosen)) {
    for (const m of chosen) err(m);
    return 2;
  }
  const comparison = compareSections(base.props, proposal.props);
  const limits = evaluateLimits(comparison, chosen.limits, base.doc.units);
  const findings = analyseCutouts(
    { result: proposal.ev.region, baseline: base.ev.region, shapes: inputShapes(proposal.doc, proposal.ev) },
    { rules, unitInMetres: UNIT_IN_METRES[base.doc.units], units: base.doc.units },
  );
  const report = buildReport(base, proposal, comparison, limits, chosen.source, rules, findings.cautions);
  if (a.flags.has('json')) out(JSON.stringify(report, null, 2));
  else printTable(base, proposal, comparison, report);
  return 0;
}
