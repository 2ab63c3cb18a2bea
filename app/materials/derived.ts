/**
 * Results derived from the live evaluation for the materials, loads and kern views, each cached
 * by the evaluation it comes from, so the panel and the canvas layers share one computation.
 *
 * - The section stresses work on and the load case are cheap (one pass over the boundary): they
 *   follow every evaluation, during a drag too.
 * - The kern and the plastic moments cost more (a convex hull walk; a Newton search over exact
 *   cuts of every material): they are computed only when the editor rests (no gesture running and
 *   the results belong to the document shown), once per evaluation, off the drag path. While a
 *   drag runs, the last ones stay on show, marked as waiting.
 */
import { useEffect, useRef } from 'react';
import {
  analyseLoadCase,
  documentLoadUnits,
  kernOfSection,
  plasticInLoadUnits,
  rawPlastic,
  stressSection,
  type Evaluation,
  type KernResult,
  type LoadCase,
  type MixedSection,
  type PlasticOutcome,
  type SectionDocument,
  type StressSection,
} from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { workerStressSection } from '../store/evaluation';
import { activeSection } from '../store/section';
import type { EditorState } from '../store/store';
import { useMaterialsUi } from './hooks';
import { materialsUi } from './state';

const sections = new WeakMap<Evaluation, StressSection>();

/** The section stresses work on, for an evaluated section (cached by the evaluation). */
export function stressSectionOf(doc: SectionDocument, ev: Evaluation): StressSection {
  let s = sections.get(ev);
  if (!s) {
    s = workerStressSection(ev) ?? stressSection(doc, ev);
    sections.set(ev, s);
  }
  return s;
}

export function useStressSection(): StressSection {
  const doc = useResults((r) => r.doc);
  const ev = useResults((r) => r.evaluation);
  return stressSectionOf(doc, ev);
}

/** The cut line the loads panel takes τ at: the cut overlay's line when it is shown. */
export function cutLineOf(s: Pick<EditorState, 'overlays' | 'cutAt' | 'cutAxis'>): { axis: 'x' | 'y'; at: number } | null {
  return s.overlays.cut && s.cutAt !== null ? { axis: s.cutAxis, at: s.cutAt } : null;
}

const cases = new WeakMap<MixedSection, { key: string; value: LoadCase | { error: string } }>();

/** The load case of the evaluated document's loads on its section (cached by section, loads, units and cut). */
export function loadCaseOf(doc: SectionDocument, section: MixedSection, cut: { axis: 'x' | 'y'; at: number } | null): LoadCase | { error: string } {
  const units = documentLoadUnits(doc);
  const key = JSON.stringify([doc.loads ?? null, units, cut]);
  const hit = cases.get(section);
  if (hit && hit.key === key) return hit.value;
  let value: LoadCase | { error: string };
  try {
    value = analyseLoadCase(section, doc.loads, units, cut);
  } catch (e) {
    value = { error: e instanceof Error ? e.message : String(e) };
  }
  cases.set(section, { key, value });
  return value;
}

/** The current load case, or null without a section; `{ error }` when it cannot be worked out. */
export function useLoadCase(): LoadCase | { error: string } | null {
  const doc = useResults((r) => r.doc);
  const { section } = useStressSection();
  const on = useEditorState((s) => s.overlays.cut);
  const at = useEditorState((s) => s.cutAt);
  const axis = useEditorState((s) => s.cutAxis);
  if (!section) return null;
  return loadCaseOf(doc, section, on && at !== null ? { axis, at } : null);
}

/** True when no gesture is running and the results belong to the document shown. */
export function useSettled(): boolean {
  const docNow = useEditorState((s) => activeSection(s.doc));
  const gesture = useEditorState((s) => s.gestureBase !== null);
  const shown = useResults((r) => r.doc);
  return !gesture && docNow === shown;
}

export interface Idle<T> {
  value: T | null;
  /** True while the value shown belongs to an earlier section (the new one waits for a rest). */
  stale: boolean;
}

/**
 * A costly result of the current section, computed once per section when the editor rests (in a
 * timer, so the frame that ends a drag paints first). `enabled` false computes nothing.
 */
function useIdle<T>(cache: WeakMap<MixedSection, T>, compute: (s: MixedSection) => T, enabled: boolean): Idle<T> {
  const editor = useEditor();
  const { section } = useStressSection();
  const settled = useSettled();
  useMaterialsUi((s) => s.idleTick);
  const last = useRef<T | null>(null);
  const have = section ? cache.get(section) : undefined;
  useEffect(() => {
    if (!enabled || !section || have !== undefined || !settled) return;
    const t = setTimeout(() => {
      if (cache.has(section)) return;
      cache.set(section, compute(section));
      const ui = materialsUi(editor.store);
      ui.setState({ idleTick: ui.getState().idleTick + 1 });
    }, 0);
    return () => clearTimeout(t);
  }, [enabled, section, have, settled, cache, compute, editor]);
  if (have !== undefined) last.current = have;
  if (!section) return { value: null, stale: false };
  return { value: have ?? last.current, stale: have === undefined && last.current !== null };
}

const kerns = new WeakMap<MixedSection, KernResult>();

/** The kern of the current (transformed) section, computed at rest. */
export function useIdleKern(enabled: boolean): Idle<KernResult> {
  return useIdle(kerns, kernOfSection, enabled);
}

const plastics = new WeakMap<MixedSection, ReturnType<typeof rawPlastic>>();

/** The plastic moments of the current section (each material at its fy), computed at rest, in the loads' moment unit. */
export function usePlastic(enabled: boolean): Idle<PlasticOutcome> {
  const doc = useResults((r) => r.doc);
  const idle = useIdle(plastics, rawPlastic, enabled);
  return { value: idle.value && plasticInLoadUnits(idle.value, documentLoadUnits(doc)), stale: idle.stale };
}
