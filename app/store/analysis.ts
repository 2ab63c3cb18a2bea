/**
 * The cutout analysis beside the live results: the structural cautions of the shown section and,
 * with a proposal shown, the baseline's own cautions and the exact material removed and added.
 * These take far longer than an evaluation on a large section (tenths of a second for fifty
 * shapes), so they run in a worker of their own, once the pointer rests and the results belong to
 * the document shown; the newest request wins. Without workers (tests, old browsers) they run on
 * the main thread. The results go to a small store that the panel, the legend and the canvas read;
 * each answer records the evaluations it belongs to, so a reader can tell when it is stale.
 *
 * One analysis per editor, made on first use (the hooks ask for it).
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { materialChange, type Caution, type Evaluation, type HoleRuleSetId, type MaterialChange } from '../../src';
import type { AnalysisRequest, AnalysisResponse } from './analysisProtocol';
import { plainJob, proposalJob, runCautionJob, type CutoutCautions } from './cutout';
import type { ResultsHandle } from './evaluation';
import type { EditorStore } from './store';

export interface AnalysisState {
  /** The shown section's evaluation, and the baseline's, that the answer belongs to. */
  forEvaluation: Evaluation | null;
  forBaseline: Evaluation | null;
  /** The rule set and units it used. */
  forRules: string;
  cautions: CutoutCautions | null;
  change: MaterialChange | null;
  /** Milliseconds the last analysis took. */
  ms: number;
}

export type AnalysisStore = StoreApi<AnalysisState>;

const analyses = new WeakMap<ResultsHandle, AnalysisStore>();

/** The analysis of this editor (made and started on first use). */
export function cutoutAnalysis(store: EditorStore, results: ResultsHandle): AnalysisStore {
  let a = analyses.get(results);
  if (!a) {
    a = startAnalysis(store, results);
    analyses.set(results, a);
  }
  return a;
}

function makeWorker(): Worker | null {
  if (typeof Worker !== 'function' || typeof window === 'undefined') return null;
  try {
    return new Worker(new URL('./analysisWorker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
}

interface Job {
  req: AnalysisRequest;
  ev: Evaluation;
  base: Evaluation | null;
  rules: string;
  ruleSet: HoleRuleSetId;
}

function startAnalysis(store: EditorStore, results: ResultsHandle): AnalysisStore {
  const state = createStore<AnalysisState>()(() => ({ forEvaluation: null, forBaseline: null, forRules: '', cautions: null, change: null, ms: 0 }));
  let worker = makeWorker();
  let seq = 0;
  let inFlight: Job | null = null;
  /** The baseline's own cautions, kept while the baseline and the rules stay the same. */
  let baseOwn: { base: Evaluation; rules: string; cautions: Caution[] } | null = null;

  const finish = (job: Job, cautions: Caution[], baselineCautions: Caution[] | undefined, change: MaterialChange | undefined, ms: number) => {
    if (job.base && baselineCautions) baseOwn = { base: job.base, rules: job.rules, cautions: baselineCautions };
    const own = job.base && baseOwn && baseOwn.base === job.base && baseOwn.rules === job.rules ? baseOwn.cautions : null;
    state.setState({
      forEvaluation: job.ev,
      forBaseline: job.base,
      forRules: job.rules,
      cautions: { cautions, baseline: job.base ? own ?? [] : null, rules: job.ruleSet },
      change: change ?? null,
      ms,
    });
  };

  /** The request for what is shown now, or null when nothing needs doing (or it must wait). */
  const nextJob = (): Job | null => {
    const s = store.getState();
    if (s.gestureBase || !results.idle()) return null; // wait for the pointer to rest and the results to catch up
    const r = results.results.getState();
    const ev = r.evaluation;
    const base = r.baseline?.evaluation ?? null;
    const ruleSet = s.doc.holeRules ?? 'en1993';
    const rules = `${ruleSet}/${s.doc.units}`;
    const a = state.getState();
    if (a.forEvaluation === ev && a.forBaseline === base && a.forRules === rules) return null;
    if (!ev.props) {
      state.setState({ forEvaluation: ev, forBaseline: base, forRules: rules, cautions: null, change: null });
      return null;
    }
    const section = { ...r.doc, holeRules: s.doc.holeRules };
    const req: AnalysisRequest = { id: ++seq, cautions: base ? proposalJob(section, ev, base.region) : plainJob(section, ev) };
    if (base && r.baseline) {
      if (!(baseOwn && baseOwn.base === base && baseOwn.rules === rules)) req.baselineCautions = plainJob(r.baseline.doc, r.baseline.evaluation, section);
      req.change = { baseline: base.region, proposal: ev.region };
    }
    return { req, ev, base, rules, ruleSet };
  };

  const runHere = (job: Job) => {
    const t = performance.now();
    const cautions = runCautionJob(job.req.cautions);
    const baselineCautions = job.req.baselineCautions ? runCautionJob(job.req.baselineCautions) : undefined;
    const change = job.req.change ? materialChange(job.req.change.baseline, job.req.change.proposal) : undefined;
    finish(job, cautions, baselineCautions, change, performance.now() - t);
  };

  const tick = () => {
    if (inFlight) return; // the answer asks again
    const job = nextJob();
    if (!job) return;
    if (!worker) return runHere(job);
    inFlight = job;
    worker.postMessage(job.req);
  };

  if (worker) {
    const w = worker;
    w.onmessage = (e: MessageEvent<AnalysisResponse>) => {
      const job = inFlight;
      inFlight = null;
      if (!job || e.data.id !== job.req.id) return tick();
      const res = e.data;
      if (res.ok) finish(job, res.cautions, res.baselineCautions, res.change, res.ms);
      else runHere(job); // the worker failed on this input: do it here, once
      tick();
    };
    w.onerror = () => {
      // A worker that cannot start: analyse on the main thread from now on.
      w.terminate();
      worker = null;
      const job = inFlight;
      inFlight = null;
      if (job) runHere(job);
      tick();
    };
  }

  results.results.subscribe(tick);
  store.subscribe((s, prev) => {
    if (s.gestureBase !== prev.gestureBase || s.doc.holeRules !== prev.doc.holeRules || s.doc.units !== prev.doc.units) tick();
  });
  // Run once the store has settled (not inside a React render).
  queueMicrotask(tick);
  return state;
}
