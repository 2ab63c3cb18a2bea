/**
 * React hooks for the cutout check, shared by the panels and the canvas layers: the comparison of
 * the baseline with the shown proposal (live, like the main panel), the limits and the verdict,
 * the exact material removed and added, the cautions, and the net sections. The computations
 * are in app/store/cutout.ts (memoised by identity).
 *
 * The comparison follows every evaluation. The exact material change (two booleans) and the
 * cautions wait for the pointer to rest: while a drag runs they keep their last value, marked
 * stale, so a drag frame never waits for them.
 */
import { useRef } from 'react';
import { cautionsInOrder, type Caution, type CutoutFindings, type MaterialChange, type SectionComparison } from '../src';
import { useEditorState, useResults } from './context';
import { activeSection } from './store/section';
import { cautionsOf, comparisonOf, limitCheckOf, limitsInForce, materialChangeOf, type CutoutCautions, type LimitCheck, type LimitsInForce } from './store/cutout';

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

/** A value that waits for the pointer to rest: while a gesture runs, the last one (stale: true). */
function useRested<T>(compute: () => T, deps: readonly unknown[]): { value: T; stale: boolean } {
  const moving = useEditorState((s) => s.gestureBase !== null);
  const last = useRef<{ deps: readonly unknown[]; value: T } | null>(null);
  const same = last.current && last.current.deps.length === deps.length && last.current.deps.every((d, k) => d === deps[k]);
  if (same) return { value: last.current!.value, stale: false };
  if (moving && last.current) return { value: last.current.value, stale: true };
  const value = compute();
  last.current = { deps, value };
  return { value, stale: false };
}

/** The exact material removed and added by the shown proposal (null: the baseline is shown). */
export function useMaterialChange(): { change: MaterialChange | null; stale: boolean } {
  const base = useResults((r) => r.baseline?.evaluation.region ?? null);
  const prop = useResults((r) => (r.baseline ? r.evaluation.region : null));
  const r = useRested(() => (base && prop ? materialChangeOf(base, prop) : null), [base, prop]);
  return { change: r.value, stale: r.stale };
}

/** The cautions of the shown section (against the baseline when a proposal is shown). */
export function useCautions(): { cautions: CutoutCautions | null; stale: boolean } {
  const section = useResults((r) => r.doc);
  const ev = useResults((r) => r.evaluation);
  const base = useResults((r) => r.baseline);
  const rules = useEditorState((s) => s.doc.holeRules);
  const r = useRested(() => (ev.props ? cautionsOf({ ...section, holeRules: rules }, ev, base) : null), [section, ev, base, rules]);
  return { cautions: r.value, stale: r.stale };
}

/** Every caution shown, numbered as on the canvas: the proposal's (or the section's) first, then the baseline's own. */
export function numberedCautions(c: CutoutCautions | null): { findings: CutoutFindings | null; own: number; all: Caution[] } {
  if (!c) return { findings: null, own: 0, all: [] };
  let r = numbered.get(c);
  if (!r) {
    const own = cautionsInOrder(c.findings.cautions);
    r = { findings: c.findings, own: own.length, all: [...own, ...cautionsInOrder(c.baseline?.cautions ?? [])] };
    numbered.set(c, r);
  }
  return r;
}

const numbered = new WeakMap<CutoutCautions, { findings: CutoutFindings; own: number; all: Caution[] }>();


/** True when the shown section is the one the results belong to. */
export function useSectionShown(): boolean {
  const now = useEditorState((s) => activeSection(s.doc));
  const shown = useResults((r) => r.doc);
  return now === shown;
}
