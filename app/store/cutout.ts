/**
 * The cutout check derived from the live results (no React): the comparison of the baseline and
 * the active proposal, the limits in force and their verdict, the net sections along the
 * document's lines (memoised by the identity of what they read, so a panel and a canvas layer
 * share one computation), and the structural cautions as plain jobs, which the analysis worker
 * runs (analysis.ts; the material removed and added is computed there too).
 */
import {
  analyseCutouts,
  compareSections,
  evaluateLimits,
  exampleLimits,
  netSection,
  overallVerdict,
  namedInputShapes,
  UNIT_IN_METRES,
  type Caution,
  type Evaluation,
  type HoleRuleSetId,
  type InputShape,
  type Limit,
  type LimitResult,
  type NetLine,
  type NetSection,
  type Region,
  type SectionComparison,
  type SectionDocument,
  type SectionProperties,
  type Verdict,
} from '../../src';

/** A cache of values computed from two objects (by identity). */
function memo2<A extends object, B extends object, V>(f: (a: A, b: B) => V): (a: A, b: B) => V {
  const outer = new WeakMap<A, WeakMap<B, V>>();
  return (a, b) => {
    let inner = outer.get(a);
    if (!inner) outer.set(a, (inner = new WeakMap()));
    if (!inner.has(b)) inner.set(b, f(a, b));
    return inner.get(b)!;
  };
}

/** The comparison of the baseline's properties with the proposal's. */
export const comparisonOf: (base: SectionProperties, proposal: SectionProperties) => SectionComparison = memo2((b, p) => compareSections(b, p));

export interface LimitsInForce {
  limits: Limit[];
  /** True when the document sets none and the example limits stand in. */
  examples: boolean;
}

const examplesByUnits = new Map<string, Limit[]>();

/** The document's limits, or the example limits for its units when it sets none. */
export function limitsInForce(doc: Pick<SectionDocument, 'limits' | 'units'>): LimitsInForce {
  if (doc.limits) return { limits: doc.limits, examples: false };
  let ex = examplesByUnits.get(doc.units);
  if (!ex) examplesByUnits.set(doc.units, (ex = exampleLimits(UNIT_IN_METRES[doc.units])));
  return { limits: ex, examples: true };
}

export interface LimitCheck {
  results: LimitResult[];
  verdict: Verdict;
}

const limitCache = new WeakMap<SectionComparison, WeakMap<Limit[], Map<string, LimitCheck>>>();

/** Each limit against the comparison, and the verdict. */
export function limitCheckOf(c: SectionComparison, limits: Limit[], units: string): LimitCheck {
  let byLimits = limitCache.get(c);
  if (!byLimits) limitCache.set(c, (byLimits = new WeakMap()));
  let byUnits = byLimits.get(limits);
  if (!byUnits) byLimits.set(limits, (byUnits = new Map()));
  let r = byUnits.get(units);
  if (!r) {
    const results = evaluateLimits(c, limits, units);
    byUnits.set(units, (r = { results, verdict: overallVerdict(results) }));
  }
  return r;
}

/** The status a comparison row shows: beyond if any of its limits is beyond, within if any applies, else none. */
export function rowStatus(results: readonly LimitResult[], key: string): 'within' | 'beyond' | null {
  const hits = results.filter((r) => r.property === key && r.status !== 'not-applicable');
  if (!hits.length) return null;
  return hits.some((h) => h.status === 'beyond') ? 'beyond' : 'within';
}

/** The input shapes of an evaluated section, for the cautions to name. */
export function inputShapesOf(section: SectionDocument, ev: Evaluation): InputShape[] {
  return namedInputShapes(section.shapes, ev.shapes);
}

export interface CutoutCautions {
  /** With a proposal: what the proposal raises that the baseline does not. Without: the section on its own. */
  cautions: Caution[];
  /** With a proposal: the baseline's own cautions (already there before the cut); null otherwise. */
  baseline: Caution[] | null;
  rules: HoleRuleSetId;
}

/** Everything one caution analysis reads, as plain data (it can go to a worker). */
export interface CautionJob {
  result: Region;
  /** The baseline's region: only what is new is flagged. Absent: the section on its own. */
  baseline?: Region;
  shapes: InputShape[];
  options: { rules: HoleRuleSetId; unitInMetres: number; units: string };
}

/** The cautions of one job. */
export function runCautionJob(job: CautionJob): Caution[] {
  const input = job.baseline ? { result: job.result, baseline: job.baseline, shapes: job.shapes } : { result: job.result, shapes: job.shapes };
  return analyseCutouts(input, job.options).cautions;
}

function options(doc: Pick<SectionDocument, 'holeRules' | 'units'>): CautionJob['options'] {
  return { rules: doc.holeRules ?? 'en1993', unitInMetres: UNIT_IN_METRES[doc.units], units: doc.units };
}

/** The job for a section's own cautions (plain mode). */
export function plainJob(section: SectionDocument, ev: Evaluation, rules: Pick<SectionDocument, 'holeRules' | 'units'> = section): CautionJob {
  return { result: ev.region, shapes: inputShapesOf(section, ev), options: options(rules) };
}

/** The job for what a proposal raises against its baseline. */
export function proposalJob(section: SectionDocument, ev: Evaluation, baseline: Region): CautionJob {
  return { result: ev.region, baseline, shapes: inputShapesOf(section, ev), options: options(section) };
}

/**
 * The cautions for the active section, computed here and now: against the baseline when a proposal
 * is active (only what is new, with the baseline's own listed apart), else the section on its own.
 * The editor runs the same jobs off the main thread (analysis.ts).
 */
export function cautionsOf(section: SectionDocument, ev: Evaluation, base: { doc: SectionDocument; evaluation: Evaluation } | null): CutoutCautions {
  const rules = section.holeRules ?? 'en1993';
  if (!base) return { cautions: runCautionJob(plainJob(section, ev)), baseline: null, rules };
  return {
    cautions: runCautionJob(proposalJob(section, ev, base.evaluation.region)),
    baseline: runCautionJob(plainJob(base.doc, base.evaluation, section)),
    rules,
  };
}

const netCache = new WeakMap<Region, WeakMap<NetLine, NetSection | string>>();

/** The net section of a region along one stored line (or why there is none), cached by both. */
export function netSectionOf(region: Region, line: NetLine): NetSection | string {
  let m = netCache.get(region);
  if (!m) netCache.set(region, (m = new WeakMap()));
  let r = m.get(line);
  if (r === undefined) {
    try {
      r = netSection(region, { x: line.from[0], y: line.from[1] }, { x: line.to[0], y: line.to[1] });
    } catch (e) {
      r = e instanceof Error ? e.message : String(e);
    }
    m.set(line, r);
  }
  return r;
}
