/**
 * Live results: the evaluation is derived from the document, never stored in the editor state.
 * `createLiveResults` keeps one incremental evaluator per editor and re-evaluates at most once
 * per animation frame, so pointer handlers only move numbers and never wait for booleans.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { createEvaluator, type Evaluation, type SectionDocument } from '../../src';
import type { EditorStore } from './store';

export interface LiveResults {
  doc: SectionDocument;
  evaluation: Evaluation;
  /** Milliseconds the last evaluation took (shown in the status bar). */
  lastMs: number;
}

export interface ResultsHandle {
  results: StoreApi<LiveResults>;
  /** Evaluate a document now (cached: the current document costs nothing). */
  evaluate(doc: SectionDocument): Evaluation;
  /** Force the pending evaluation to run now. */
  flush(): void;
  dispose(): void;
}

type Schedule = (cb: () => void) => void;

const defaultSchedule: Schedule =
  typeof requestAnimationFrame === 'function' ? (cb) => requestAnimationFrame(() => cb()) : (cb) => cb();

export function createLiveResults(store: EditorStore, schedule: Schedule = defaultSchedule): ResultsHandle {
  const evaluator = createEvaluator();
  let lastDoc: SectionDocument | null = null;
  let lastEval: Evaluation | null = null;
  const evaluate = (doc: SectionDocument): Evaluation => {
    if (doc !== lastDoc || !lastEval) {
      lastEval = evaluator.evaluate(doc);
      lastDoc = doc;
    }
    return lastEval;
  };
  const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());
  const first = store.getState().doc;
  const t0 = now();
  const results = createStore<LiveResults>()(() => ({ doc: first, evaluation: evaluate(first), lastMs: now() - t0 }));
  let pending = false;
  const run = () => {
    pending = false;
    const doc = store.getState().doc;
    if (doc === results.getState().doc) return;
    const t = now();
    const evaluation = evaluate(doc);
    results.setState({ doc, evaluation, lastMs: now() - t });
  };
  const unsub = store.subscribe((s, prev) => {
    if (s.doc === prev.doc || pending) return;
    pending = true;
    schedule(run);
  });
  return { results, evaluate, flush: run, dispose: unsub };
}
