/**
 * React hooks for the cutout check, shared by the panels and the canvas layers: the comparison of
 * the baseline with the shown proposal (live, like the main panel), the limits and the verdict,
 * the exact material removed and added, the cautions, and the net sections. The computations
 * are in app/store/cutout.ts (memoised by identity).
 *
 * The comparison follows every evaluation. The exact material change (two booleans) and the
 * cautions come from the cutout analysis (store/analysis.ts: a worker, once the pointer rests);
 * until its answer belongs to the results shown they are marked stale.
 */
import { useStore } from 'zustand';
import { cautionsInOrder, type Caution, type MaterialChange, type SectionComparison } from '../src';
import { useEditor, useEditorState, useResults } from './context';
import { cutoutAnalysis, type AnalysisState } from './store/analysis';
import { activeSection } from './store/section';
import { comparisonOf, limitCheckOf, limitsInForce, type CutoutCautions, type LimitCheck, type LimitsInForce } from './store/cutout';

/** The proposal shown (null: the baseline). */
export function useActiveProposal(): string | null {
  return useEditorState((s) => s.doc.activeVariant ?? null);
}

/** The comparison of the baseline with the shown proposal, or null (baseline shown, or no area). */
export function useComparison(): SectionComparison | null {
  const base = useResults((r) => r.baseline?.evaluation.props ?? null);
  const prop = useResults((r) => (r.baseline ? r.evaluation.props : null));
  return base && prop ? comparisonOf(base, prop) : null;
}

/** The limits in force and, with a comparison, each limit's result and the verdict. */
export function useLimits(): { inForce: LimitsInForce; check: LimitCheck | null } {
  // The limits and units only: the document itself changes on every pointer move of a drag.
  const limits = useEditorState((s) => s.doc.limits);
  const units = useEditorState((s) => s.doc.units);
  const c = useComparison();
  const inForce = limitsInForce({ limits, units });
  return { inForce, check: c ? limitCheckOf(c, inForce.limits, units) : null };
}

/** The cutout analysis (analysis.ts) and whether its answer belongs to the results shown now. */
function useAnalysis<T>(pick: (a: AnalysisState) => T): { value: T; stale: boolean } {
  const editor = useEditor();
  const a = cutoutAnalysis(editor.store, editor.results);
  const value = useStore(a, pick);
  const forEv = useStore(a, (x) => x.forEvaluation);
  const forBase = useStore(a, (x) => x.forBaseline);
  const forRules = useStore(a, (x) => x.forRules);
  const ev = useResults((r) => r.evaluation);
  const base = useResults((r) => r.baseline?.evaluation ?? null);
  const rules = useEditorState((s) => `${s.doc.holeRules ?? 'en1993'}/${s.doc.units}`);
  return { value, stale: forEv !== ev || forBase !== base || forRules !== rules };
}

/** The exact material removed and added by the shown proposal (null: the baseline is shown, or not known yet). */
export function useMaterialChange(): { change: MaterialChange | null; stale: boolean } {
  const r = useAnalysis((a) => a.change);
  return { change: r.value, stale: r.stale };
}

/** The cautions of the shown section (against the baseline when a proposal is shown). */
export function useCautions(): { cautions: CutoutCautions | null; stale: boolean } {
  const r = useAnalysis((a) => a.cautions);
  return { cautions: r.value, stale: r.stale };
}

/** Every caution shown, numbered as on the canvas: the proposal's (or the section's) first, then the baseline's own; warnings first in each. */
export function numberedCautions(c: CutoutCautions | null): { own: number; all: Caution[] } {
  if (!c) return { own: 0, all: [] };
  let r = numbered.get(c);
  if (!r) {
    const own = cautionsInOrder(c.cautions);
    r = { own: own.length, all: [...own, ...cautionsInOrder(c.baseline ?? [])] };
    numbered.set(c, r);
  }
  return r;
}

const numbered = new WeakMap<CutoutCautions, { own: number; all: Caution[] }>();

/** True when the shown section is the one the results belong to. */
export function useSectionShown(): boolean {
  const now = useEditorState((s) => activeSection(s.doc));
  const shown = useResults((r) => r.doc);
  return now === shown;
}
