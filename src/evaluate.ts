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
 *
 * Two more results come with the section when the document has them: line elements, which stay
 * out of the booleans and form line groups (src/lines/), and materials, where the same layers are
 * composed per material by document order (src/materials/) for the centre of gravity and the
 * transformed section. Both reuse their work across calls in the same way. The document's weld
 * loads are then evaluated on the line groups (src/weld-results.ts).
 */
import { booleanRegions, resolveOutline } from './boolean';
import type { Region } from './geometry/contour';
import type { LineChain } from './lines/chain';
import { LineError } from './lines/chain';
import { lineProperties, type LineProperties } from './lines/line-properties';
import { createMaterialComposer, type MaterialRegion } from './materials/compose';
import { MaterialError } from './materials/material';
import { mixedSection, partsFromRegions, type MixedSection } from './materials/mixed';
import { kindOf } from './shapes/registry';
import { mayCrossItself, shapeContours } from './shapes/ops';
import type { Issue } from './document/validate';
import type { Op, SectionDocument, Shape } from './document/types';
import { createWeldStage, type WeldResult } from './weld-results';
import { SectionError, sectionProperties, type SectionProperties } from './properties/section';

/** The message of a section that holds line elements only: its area results are absent, not in error. */
export const LINES_ONLY_MESSAGE = 'Line elements only: there is no area, so the area properties are absent. The line groups have their own properties.';

export interface ShapeResult {
  id: string;
  region: Region;
  /** A line element's exact chains (its region is empty). */
  chains?: LineChain[];
  error?: string;
}

/** One line group: its name, the line elements in it, and its properties per unit thickness. */
export interface LineGroupResult {
  group: string;
  ids: string[];
  /** The group's exact chains, in the order of its elements. */
  chains: LineChain[];
  props: LineProperties | null;
  message: string | null;
}

/** The section by material: one region per material and the mixed-section results. */
export interface MaterialsResult {
  regions: MaterialRegion[];
  section: MixedSection | null;
  message: string | null;
}

export interface Evaluation {
  region: Region;
  shapes: ShapeResult[];
  props: SectionProperties | null;
  message: string | null;
  warnings: Issue[];
  /** Line groups, in the order their first element appears; empty without line elements. */
  lines: LineGroupResult[];
  /** Present when the document has materials. */
  materials: MaterialsResult | null;
  /** The document's weld loads on its line groups (src/weld-results.ts); empty without them. */
  welds: WeldResult[];
}

interface CachedShape {
  region: Region;
  warning: string | null;
  error: string | null;
  /** The shape's entry in `Evaluation.shapes` (one object per record, so lists share it). */
  result: ShapeResult;
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
    const line = kindOf(shape).line;
    if (line) return { region: [], warning: null, error: null, result: { id: shape.id, region: [], chains: line.chains(shape) } };
    const raw = shapeContours(shape);
    if (!mayCrossItself(shape)) return { region: raw, warning: null, error: null, result: { id: shape.id, region: raw } };
    const { region, selfIntersecting } = resolveOutline(raw);
    return {
      region,
      warning: selfIntersecting ? 'the outline crosses or touches itself; it was resolved by the even-odd rule (overlaps alternate between filled and empty)' : null,
      error: null,
      result: { id: shape.id, region },
    };
  } catch (e) {
    const error = e instanceof Error ? e.message : String(e);
    return { region: [], warning: null, error, result: { id: shape.id, region: [], error } };
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
  /**
   * Each shape's own outline (no booleans), from the same per-shape cache `evaluate` uses: the
   * editor draws, picks and snaps with these while the section is combined elsewhere. The same
   * array comes back for the same document.
   */
  shapes(doc: SectionDocument): ShapeResult[];
}

/** Line groups from the line elements, each group's properties reused while its elements are unchanged. */
function createLineStage() {
  let cache = new Map<string, { chains: LineChain[]; result: LineGroupResult }>();
  return (elements: readonly { group: string; id: string; chains: LineChain[] }[]): LineGroupResult[] => {
    const groups = new Map<string, { ids: string[]; chains: LineChain[] }>();
    for (const e of elements) {
      const g = groups.get(e.group) ?? { ids: [], chains: [] };
      g.ids.push(e.id);
      g.chains.push(...e.chains);
      groups.set(e.group, g);
    }
    const next = new Map<string, { chains: LineChain[]; result: LineGroupResult }>();
    const out: LineGroupResult[] = [];
    for (const [group, g] of groups) {
      const prev = cache.get(group);
      let result: LineGroupResult;
      if (prev && prev.chains.length === g.chains.length && prev.chains.every((c, k) => c === g.chains[k]) && prev.result.ids.join() === g.ids.join()) result = prev.result;
      else {
        try {
          result = { group, ids: g.ids, chains: g.chains, props: lineProperties(g.chains), message: null };
        } catch (e) {
          if (!(e instanceof LineError)) throw e;
          result = { group, ids: g.ids, chains: g.chains, props: null, message: e.message };
        }
      }
      next.set(group, { chains: g.chains, result });
      out.push(result);
    }
    cache = next;
    return out;
  };
}

/** The layers composed per material, and the mixed-section results, reused while nothing they use changed. */
function createMaterialStage() {
  const composer = createMaterialComposer();
  let last: { regions: MaterialRegion[]; doc: Pick<SectionDocument, 'materials' | 'reference' | 'units'>; result: MaterialsResult } | null = null;
  return (doc: SectionDocument, layers: { region: Region; op: Op; material: string }[], union: Region): MaterialsResult | null => {
    const materials = doc.materials;
    if (!materials?.length) return null;
    const reference = materials.find((m) => m.id === doc.reference);
    if (!reference) return { regions: [], section: null, message: `The reference material "${doc.reference ?? ''}" is not one of the document's materials.` };
    const regions = composer.compose(layers, { union });
    const same = last && last.doc.materials === materials && last.doc.reference === doc.reference && last.doc.units === doc.units && last.regions.length === regions.length && last.regions.every((r, k) => r.material === regions[k].material && r.region === regions[k].region);
    if (same) return last!.result;
    let result: MaterialsResult;
    try {
      result = { regions, section: mixedSection(partsFromRegions(regions, materials), reference, doc.units), message: null };
    } catch (e) {
      if (!(e instanceof SectionError) && !(e instanceof MaterialError)) throw e;
      result = { regions, section: null, message: e.message };
    }
    last = { regions, doc: { materials, reference: doc.reference, units: doc.units }, result };
    return result;
  };
}

export function createEvaluator(): Evaluator {
  const shapeCache = new WeakMap<Shape, CachedShape>();
  const runCache: CachedRun[] = [];
  let shapesDoc: SectionDocument | null = null;
  let shapesList: ShapeResult[] = [];
  let lastRegion: Region | null = null;
  let lastProps: { region: Region; areaShapes: boolean; empty: boolean; props: SectionProperties | null; message: string | null } | null = null;
  const lineStage = createLineStage();
  const materialStage = createMaterialStage();
  const weldStage = createWeldStage();

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

  function cached(s: Shape): CachedShape {
    let c = shapeCache.get(s);
    if (!c) {
      c = buildShape(s);
      shapeCache.set(s, c);
    }
    return c;
  }

  function shapes(doc: SectionDocument): ShapeResult[] {
    if (doc === shapesDoc) return shapesList;
    shapesList = doc.shapes.map((s) => cached(s).result);
    shapesDoc = doc;
    return shapesList;
  }

  return {
    shapes,
    evaluate(doc: SectionDocument): Evaluation {
      const warnings: Issue[] = [];
      const runs: Run[] = [];
      const elements: { group: string; id: string; chains: LineChain[] }[] = [];
      const layers: { region: Region; op: Op; material: string }[] = [];
      // Only a document with materials composes them (one record per shape otherwise wasted).
      const withMaterials = !!doc.materials?.length;
      let areaShapes = 0;
      doc.shapes.forEach((s, idx) => {
        const c = cached(s);
        if (c.error) warnings.push({ path: `shapes[${idx}]`, message: `left out of the section: ${c.error}` });
        if (c.warning) warnings.push({ path: `shapes[${idx}]`, message: c.warning });
        const line = kindOf(s).line;
        if (line) {
          if (c.result.chains) elements.push({ group: line.group(s), id: s.id, chains: c.result.chains });
          return;
        }
        areaShapes++;
        if (c.error || c.region.length === 0) return;
        const op = s.op ?? 'add';
        if (withMaterials) layers.push({ region: c.region, op, material: s.material ?? doc.reference ?? '' });
        const last = runs[runs.length - 1];
        if (last && last.op === op && op !== 'intersect') last.inputs.push(c.region);
        else runs.push({ op, inputs: [c.region] });
      });
      let region: Region = EMPTY;
      runs.forEach((run, k) => {
        region = evalRun(k, region, run);
      });
      runCache.length = runs.length;
      if (region !== lastRegion || !lastProps || lastProps.areaShapes !== areaShapes > 0 || lastProps.empty !== (doc.shapes.length === 0)) {
        lastRegion = region;
        let props: SectionProperties | null = null;
        let message: string | null = null;
        if (doc.shapes.length === 0) message = 'The section is empty: add a shape to see its properties.';
        else if (areaShapes === 0) message = LINES_ONLY_MESSAGE;
        else {
          try {
            props = sectionProperties(region);
          } catch (e) {
            if (!(e instanceof SectionError)) throw e;
            message = e.message;
          }
        }
        lastProps = { region, areaShapes: areaShapes > 0, empty: doc.shapes.length === 0, props, message };
      }
      const lines = lineStage(elements);
      return {
        region,
        shapes: shapes(doc),
        props: lastProps.props,
        message: lastProps.message,
        warnings,
        lines,
        materials: lastProps.props ? materialStage(doc, layers, region) : null,
        welds: weldStage(doc, lines),
      };
    },
  };
}

/** One-shot evaluation (no caching across calls). */
export function evaluateDocument(doc: SectionDocument): Evaluation {
  return createEvaluator().evaluate(doc);
}
