/**
 * Document evaluation: shapes → exact regions → one combined region → properties.
 *
 * Shapes apply in list order to a region that starts empty (add = union, subtract = difference,
 * intersect = keep the common part). Consecutive shapes with the same add or subtract operation
 * form one run and go to the boolean module in one call.
 *
 * The evaluator is incremental, for live dragging: each shape's region is cached by the shape
 * record's identity (the store keeps unchanged records identical), each run's result by its
 * inputs, and when exactly one shape of a run changes, the run is rebuilt from a cached combination
 * of the others plus the changed one, so a drag frame costs a couple of boolean calls.
 */
import { booleanRegions, resolveOutline } from './boolean';
import type { Region } from './geometry/contour';
import { mayCrossItself, shapeContours } from './document/shapes';
import type { Issue } from './document/validate';
import type { Op, SectionDocument, Shape } from './document/types';
import { SectionError, sectionProperties, type SectionProperties } from './properties/section';

export interface ShapeResult {
  id: string;
  region: Region;
  error?: string;
}

export interface Evaluation {
  region: Region;
  shapes: ShapeResult[];
  props: SectionProperties | null;
  message: string | null;
  warnings: Issue[];
}

interface CachedShape {
  region: Region;
  warning: string | null;
  error: string | null;
  /** The last ShapeResult handed out for this record (reused while its id is the same). */
  result?: ShapeResult;
}

interface Run {
  op: Op;
  inputs: Region[];
}

interface CachedRun {
  op: Op;
  before: Region;
  inputs: Region[];
  result: Region;
  /** For one changed input k: the run applied to `before` with every input but k. */
  partial: { index: number; others: Region[]; value: Region } | null;
}

function buildShape(shape: Shape): CachedShape {
  try {
    const raw = shapeContours(shape);
    if (!mayCrossItself(shape)) return { region: raw, warning: null, error: null };
    const { region, selfIntersecting } = resolveOutline(raw);
    return {
      region,
      warning: selfIntersecting ? 'the outline crosses or touches itself; it was resolved by the even-odd rule (overlaps alternate between filled and empty)' : null,
      error: null,
    };
  } catch (e) {
    return { region: [], warning: null, error: e instanceof Error ? e.message : String(e) };
  }
}

const EMPTY: Region = [];

function applyRun(before: Region, op: Op, inputs: Region[]): Region {
  if (inputs.length === 0) return before;
  if (op === 'add') {
    if (before.length === 0) return inputs.length === 1 ? inputs[0] : booleanRegions(inputs[0], inputs.slice(1), 'union');
    return booleanRegions(before, inputs, 'union');
  }
  if (before.length === 0) return EMPTY;
  if (op === 'subtract') return booleanRegions(before, inputs, 'difference');
  let r = before;
  for (const s of inputs) r = r.length ? booleanRegions(r, [s], 'intersection') : EMPTY;
  return r;
}

function sameList(a: readonly Region[], b: readonly Region[]): boolean {
  return a.length === b.length && a.every((v, k) => v === b[k]);
}

export interface Evaluator {
  evaluate(doc: SectionDocument): Evaluation;
}

export function createEvaluator(): Evaluator {
  const shapeCache = new WeakMap<Shape, CachedShape>();
  const runCache: CachedRun[] = [];
  let lastRegion: Region | null = null;
  let lastProps: { region: Region; props: SectionProperties | null; message: string | null } | null = null;

  function evalRun(k: number, before: Region, run: Run): Region {
    const prev = runCache[k];
    if (prev && prev.op === run.op && prev.before === before) {
      if (sameList(prev.inputs, run.inputs)) return prev.result;
      // Exactly one input changed (a drag): combine the others once, then add the changed one.
      // Intersect runs are sequential and gain nothing from this.
      if (run.op !== 'intersect' && prev.inputs.length === run.inputs.length) {
        const changed: number[] = [];
        run.inputs.forEach((r, i) => r !== prev.inputs[i] && changed.push(i));
        if (changed.length === 1) {
          const i = changed[0];
          const others = run.inputs.filter((_, j) => j !== i);
          let partial = prev.partial;
          if (!partial || partial.index !== i || !sameList(partial.others, others)) {
            partial = { index: i, others, value: applyRun(before, run.op, others) };
          }
          const result = applyRun(partial.value, run.op, [run.inputs[i]]);
          runCache[k] = { op: run.op, before, inputs: run.inputs, result, partial };
          return result;
        }
      }
    }
    const result = applyRun(before, run.op, run.inputs);
    runCache[k] = { op: run.op, before, inputs: run.inputs, result, partial: null };
    return result;
  }

  return {
    evaluate(doc: SectionDocument): Evaluation {
      const shapes: ShapeResult[] = [];
      const warnings: Issue[] = [];
      const runs: Run[] = [];
      doc.shapes.forEach((s, idx) => {
        let c = shapeCache.get(s);
        if (!c) {
          c = buildShape(s);
          shapeCache.set(s, c);
        }
        if (!c.result || c.result.id !== s.id) c.result = c.error ? { id: s.id, region: c.region, error: c.error } : { id: s.id, region: c.region };
        shapes.push(c.result);
        if (c.error) warnings.push({ path: `shapes[${idx}]`, message: `left out of the section: ${c.error}` });
        if (c.warning) warnings.push({ path: `shapes[${idx}]`, message: c.warning });
        if (c.error || c.region.length === 0) return;
        const op = s.op ?? 'add';
        const last = runs[runs.length - 1];
        if (last && last.op === op && op !== 'intersect') last.inputs.push(c.region);
        else runs.push({ op, inputs: [c.region] });
      });
      let region: Region = EMPTY;
      runs.forEach((run, k) => {
        region = evalRun(k, region, run);
      });
      runCache.length = runs.length;
      if (region !== lastRegion || !lastProps) {
        lastRegion = region;
        let props: SectionProperties | null = null;
        let message: string | null = null;
        if (doc.shapes.length === 0) message = 'The section is empty: add a shape to see its properties.';
        else {
          try {
            props = sectionProperties(region);
          } catch (e) {
            if (!(e instanceof SectionError)) throw e;
            message = e.message;
          }
        }
        lastProps = { region, props, message };
      }
      return { region, shapes, props: lastProps.props, message: lastProps.message, warnings };
    },
  };
}

/** One-shot evaluation (no caching across calls). */
export function evaluateDocument(doc: SectionDocument): Evaluation {
  return createEvaluator().evaluate(doc);
}
