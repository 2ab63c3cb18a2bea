/**
 * Composition by document order: ordered layers (region, operation, material) become one exact
 * region per material.
 *
 * The rule, applied layer by layer to a set of material regions that starts empty:
 *   add m        the layer's area becomes material m: R_m = R_m ∪ S, and every other R_k = R_k − S
 *                (a later shape replaces the material of the earlier ones where they overlap);
 *   subtract     removes all material: every R_k = R_k − S;
 *   intersect    keeps the common part with the material already there: every R_k = R_k ∩ S.
 * The union of the material regions is therefore exactly the region the evaluator builds from the
 * same layers (src/evaluate.ts), and each point of it carries the material of the last `add` layer
 * that covers it.
 *
 * Like the evaluator, consecutive layers with the same operation (and, for add, the same material)
 * form one run and go to the boolean module in one call, and layers with an empty region are left
 * out. For live dragging, `createMaterialComposer` caches every (run, material) result by the
 * identity of its inputs; when exactly one input of a run changed, the run is rebuilt from a cached
 * combination of the others plus the changed one. A drag frame with k materials then costs about
 * k + 1 boolean calls per run from the dragged layer on, and none before it.
 *
 * With one material only, pass the evaluator's region as `union`: it is returned as that material's
 * region (the same object), so a single-material section gives exactly the evaluator's numbers.
 */
import { booleanRegions } from '../boolean';
import type { Op } from '../document/types';
import type { Region } from '../geometry/contour';

export interface MaterialLayer {
  region: Region;
  op: Op;
  /** The material id of an `add` layer (resolved by the caller: a shape with none uses the reference). Ignored for subtract and intersect. */
  material: string;
}

export interface MaterialRegion {
  material: string;
  region: Region;
}

type Kind = 'union' | 'difference' | 'intersection';

interface Run {
  op: Op;
  material: string;
  inputs: Region[];
}

interface OpCache {
  kind: Kind;
  before: Region;
  inputs: Region[];
  result: Region;
  /** For one changed input: the operation applied to `before` with every input but `index`. */
  partial: { index: number; others: Region[]; value: Region } | null;
}

const EMPTY: Region = [];

function sameList(a: readonly Region[], b: readonly Region[]): boolean {
  return a.length === b.length && a.every((v, k) => v === b[k]);
}

/** `before` itself when the result holds the same contours (no clip reached it): keeps identities stable for the caches. */
function keepIdentity(before: Region, result: Region): Region {
  if (result === before || result.length !== before.length) return result;
  const set = new Set(before);
  return result.every((c) => set.has(c)) ? before : result;
}

/** One operation of a run on one material's region (the evaluator's run rules). */
function apply(kind: Kind, before: Region, inputs: Region[]): Region {
  if (inputs.length === 0) return before;
  if (kind === 'union') {
    if (before.length === 0) return inputs.length === 1 ? inputs[0] : booleanRegions(inputs[0], inputs.slice(1), 'union');
    return booleanRegions(before, inputs, 'union');
  }
  if (before.length === 0) return EMPTY;
  if (kind === 'difference') return keepIdentity(before, booleanRegions(before, inputs, 'difference'));
  let r = before;
  for (const s of inputs) r = r.length ? booleanRegions(r, [s], 'intersection') : EMPTY;
  return r;
}

/** The operation with its cache: reuse, rebuild from the others plus one changed input, or compute. */
function cachedApply(prev: OpCache | undefined, kind: Kind, before: Region, inputs: Region[]): OpCache {
  if (prev && prev.kind === kind && prev.before === before) {
    if (sameList(prev.inputs, inputs)) return prev;
    if (kind !== 'intersection' && prev.inputs.length === inputs.length) {
      const changed: number[] = [];
      inputs.forEach((r, i) => r !== prev.inputs[i] && changed.push(i));
      if (changed.length === 1) {
        const i = changed[0];
        const others = inputs.filter((_, j) => j !== i);
        let partial = prev.partial;
        if (!partial || partial.index !== i || !sameList(partial.others, others)) partial = { index: i, others, value: apply(kind, before, others) };
        const result = apply(kind, partial.value, [inputs[i]]);
        return { kind, before, inputs, result, partial };
      }
    }
  }
  return { kind, before, inputs, result: apply(kind, before, inputs), partial: null };
}

/** Consecutive layers with the same operation (and material, for add) form one run; intersect layers stay single. */
function buildRuns(layers: readonly MaterialLayer[]): Run[] {
  const runs: Run[] = [];
  for (const l of layers) {
    if (l.region.length === 0) continue;
    const last = runs[runs.length - 1];
    if (last && last.op === l.op && l.op !== 'intersect' && (l.op !== 'add' || last.material === l.material)) last.inputs.push(l.region);
    else runs.push({ op: l.op, material: l.op === 'add' ? l.material : '', inputs: [l.region] });
  }
  return runs;
}

export interface MaterialComposer {
  /**
   * One region per material, in the order the materials first appear in an add layer; materials
   * left with no area are omitted. `union`: the evaluator's combined region for the same layers,
   * used as is when only one material is present.
   */
  compose(layers: readonly MaterialLayer[], options?: { union?: Region }): MaterialRegion[];
}

export function createMaterialComposer(): MaterialComposer {
  let caches: Map<string, OpCache>[] = [];
  return {
    compose(layers, options) {
      const runs = buildRuns(layers);
      const order: string[] = [];
      for (const r of runs) if (r.op === 'add' && !order.includes(r.material)) order.push(r.material);
      if (order.length === 1 && options?.union) return options.union.length ? [{ material: order[0], region: options.union }] : [];
      let state = new Map<string, Region>();
      const next: Map<string, OpCache>[] = [];
      runs.forEach((run, k) => {
        const prev = caches[k];
        const here = new Map<string, OpCache>();
        const after = new Map<string, Region>();
        if (run.op === 'add' && !state.has(run.material)) state.set(run.material, EMPTY);
        for (const [id, before] of state) {
          const kind: Kind = run.op === 'add' ? (id === run.material ? 'union' : 'difference') : run.op === 'subtract' ? 'difference' : 'intersection';
          const c = cachedApply(prev?.get(id), kind, before, run.inputs);
          here.set(id, c);
          after.set(id, c.result);
        }
        next.push(here);
        state = after;
      });
      caches = next;
      const out: MaterialRegion[] = [];
      for (const id of order) {
        const region = state.get(id) ?? EMPTY;
        if (region.length) out.push({ material: id, region });
      }
      return out;
    },
  };
}

/** One-shot composition (no caching across calls). */
export function composeMaterials(layers: readonly MaterialLayer[], options?: { union?: Region }): MaterialRegion[] {
  return createMaterialComposer().compose(layers, options);
}
