/**
 * Composition by document order: ordered layers (region, operation, material) become one exact
 * region per material.
 *
 * The rule, applied layer by layer to a set of material regions that starts empty:
 *   add m        the layer's area becomes material m: R_m = R_m ∪ S, and every other R_k = R_k − S
 *                (a later shape replaces the material of the earlier ones where they overlap);
 *   subtract     removes all material: every R_k = R_k − S;
 *   intersect    keeps the common part with the material already there: every R_k = R_k ∩ S.
 *
 * Computed without the layer-by-layer chain: a point ends up in material m exactly when the last
 * add layer covering it has material m, no later subtract covers it and every later intersect
 * does. So each add layer j of material m contributes its piece
 *     P_j = (S_j ∩ every later intersect) − (every later subtract ∪ every later add of another material)
 * and R_m is the union of the pieces of m. The union of all materials is the evaluator's region
 * (src/evaluate.ts) for the same layers; layers with an empty region are left out, as there.
 *
 * Why pieces: a chain would make every later boolean depend on every earlier one, so dragging an
 * early shape would redo the whole document per material. Pieces depend only on the later layers
 * whose boxes meet them. `createMaterialComposer` caches each piece by the identities of its inputs,
 * and each material's union by its pieces: when the same few pieces keep changing (a drag), the
 * union of the unchanged ones is kept and only the changed ones are added to it. A drag frame then
 * costs one small difference per piece the dragged shape meets, plus one union per material whose
 * pieces changed.
 *
 * With one material, pass the evaluator's region as `union`: it is returned as that material's
 * region (the same object), so a single-material section gives exactly the evaluator's numbers.
 */
import { booleanRegions } from '../boolean';
import type { Op } from '../shapes/base';
import { regionBounds, type Bounds, type Region } from '../geometry/contour';

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

const EMPTY: Region = [];

function sameList(a: readonly Region[], b: readonly Region[]): boolean {
  return a.length === b.length && a.every((v, k) => v === b[k]);
}

/** Boxes that touch count as meeting (the boolean module treats touching the same way). */
function meet(a: Bounds | null, b: Bounds | null): boolean {
  if (!a || !b) return false;
  const tol = 1e-9 * Math.max(a.xmax - a.xmin, a.ymax - a.ymin, b.xmax - b.xmin, b.ymax - b.ymin);
  return !(b.xmin > a.xmax + tol || b.xmax < a.xmin - tol || b.ymin > a.ymax + tol || b.ymax < a.ymin - tol);
}

/** Union of regions (empty ones skipped). */
function unionOf(regions: readonly Region[]): Region {
  const live = regions.filter((r) => r.length > 0);
  if (live.length === 0) return EMPTY;
  if (live.length === 1) return live[0];
  return booleanRegions(live[0], live.slice(1), 'union');
}

/** (S ∩ each keep) − ∪ clips. */
function pieceOf(S: Region, clips: readonly Region[], keeps: readonly Region[]): Region {
  let v = S;
  for (const k of keeps) v = v.length ? booleanRegions(v, [k], 'intersection') : EMPTY;
  if (v.length && clips.length) v = booleanRegions(v, [...clips], 'difference');
  return v;
}

interface PieceCache {
  S: Region;
  clips: Region[];
  keeps: Region[];
  value: Region;
}

interface UnionCache {
  pieces: Region[];
  value: Region;
  /** The union of every piece outside `changed`, for frames where only those pieces change. */
  partial: { changed: Set<number>; pieces: Region[]; value: Region } | null;
}

/** The union of a material's pieces, reusing the union of the unchanged ones when it can. */
function cachedUnion(prev: UnionCache | undefined, pieces: Region[]): UnionCache {
  if (!prev || prev.pieces.length !== pieces.length) return { pieces, value: unionOf(pieces), partial: null };
  if (sameList(prev.pieces, pieces)) return prev;
  const changed = new Set<number>();
  pieces.forEach((p, i) => p !== prev.pieces[i] && changed.add(i));
  let partial = prev.partial;
  const covers = partial && [...changed].every((i) => partial!.changed.has(i)) && pieces.every((p, i) => partial!.changed.has(i) || p === partial!.pieces[i]);
  if (!covers) {
    // Worth keeping only when few pieces change; otherwise unite them all.
    if (2 * changed.size > pieces.length) return { pieces, value: unionOf(pieces), partial: null };
    partial = { changed, pieces, value: unionOf(pieces.filter((_, i) => !changed.has(i))) };
  }
  const moving = pieces.filter((_, i) => partial!.changed.has(i));
  return { pieces, value: unionOf([partial!.value, ...moving]), partial };
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
  const boxes = new WeakMap<Region, Bounds | null>();
  const box = (r: Region) => {
    let b = boxes.get(r);
    if (b === undefined) {
      b = regionBounds(r);
      boxes.set(r, b);
    }
    return b;
  };
  let pieceCache: (PieceCache | undefined)[] = [];
  let unionCache = new Map<string, UnionCache>();
  return {
    compose(input, options) {
      const layers = input.filter((l) => l.region.length > 0);
      const order: string[] = [];
      for (const l of layers) if (l.op === 'add' && !order.includes(l.material)) order.push(l.material);
      if (order.length === 1 && options?.union) return options.union.length ? [{ material: order[0], region: options.union }] : [];
      const nextPieces: (PieceCache | undefined)[] = [];
      const byMaterial = new Map<string, Region[]>(order.map((m) => [m, []]));
      layers.forEach((l, j) => {
        if (l.op !== 'add') return;
        const bj = box(l.region);
        const clips: Region[] = [], keeps: Region[] = [];
        for (let k = j + 1; k < layers.length; k++) {
          const o = layers[k];
          if (o.op === 'intersect') keeps.push(o.region);
          else if ((o.op === 'subtract' || o.material !== l.material) && meet(bj, box(o.region))) clips.push(o.region);
        }
        const prev = pieceCache[j];
        const hit = prev && prev.S === l.region && sameList(prev.clips, clips) && sameList(prev.keeps, keeps);
        const c = hit ? prev : { S: l.region, clips, keeps, value: pieceOf(l.region, clips, keeps) };
        nextPieces[j] = c;
        byMaterial.get(l.material)!.push(c.value);
      });
      pieceCache = nextPieces;
      const nextUnions = new Map<string, UnionCache>();
      const out: MaterialRegion[] = [];
      for (const m of order) {
        const u = cachedUnion(unionCache.get(m), byMaterial.get(m)!);
        nextUnions.set(m, u);
        if (u.value.length) out.push({ material: m, region: u.value });
      }
      unionCache = nextUnions;
      return out;
    },
  };
}

/** One-shot composition (no caching across calls). */
export function composeMaterials(layers: readonly MaterialLayer[], options?: { union?: Region }): MaterialRegion[] {
  return createMaterialComposer().compose(layers, options);
}
