/**
 * Live results: the evaluation is derived from the document, never stored in the editor state.
 *
 * - Each shape's own outline (for drawing, picking and snapping) comes from the engine
 *   evaluator's per-shape cache on the main thread (keyed by record identity), so a dragged
 *   shape follows the pointer at once and nothing is cached twice.
 * - The combined section and its properties come from the engine's incremental evaluator. In the
 *   browser it runs in a worker, latest-document-wins: while one evaluation runs, newer edits
 *   only replace the next request, so the pointer never waits for booleans. Without workers
 *   (tests, old browsers) it runs on the main thread once per animation frame.
 * - While a proposal is active, the baseline's evaluation is held beside it (`baseline`), from a
 *   second evaluator, evaluated once per baseline change (baseline.ts), never per drag frame.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { createEvaluator, type Evaluation, type SectionDocument, type Shape, type ShapeResult, type StressSection } from '../../src';
import { activeSection } from './section';
import { baselineNeeded, baselineSection, sectionPart } from './baseline';
import type { EditorStore } from './store';
import type { WorkerRequest, WorkerResponse } from './workerProtocol';

const WORKER_STRESS = new WeakMap<Evaluation, StressSection>();

/** The stress section the worker sent with this evaluation, if it did. */
export function workerStressSection(ev: Evaluation): StressSection | undefined {
  return WORKER_STRESS.get(ev);
}

export interface LiveResults {
  /** The section the evaluation belongs to: the store's active section (it may trail a drag). */
  doc: SectionDocument;
  evaluation: Evaluation;
  /** Milliseconds the last evaluation took. */
  lastMs: number;
  /** Evaluations finished since start (the drag benchmark reads it). */
  count: number;
  /** The baseline's section and evaluation while a proposal is active (it may trail a baseline change); null otherwise. */
  baseline: { doc: SectionDocument; evaluation: Evaluation } | null;
}

export interface ResultsHandle {
  results: StoreApi<LiveResults>;
  /** Full evaluation of a document's active section now (the current one costs nothing once evaluated). */
  evaluate(doc: SectionDocument): Evaluation;
  /** Each shape's own outline in a document's active section, cached by shape identity; the same array for the same document. */
  shapesOf(doc: SectionDocument): ShapeResult[];
  /** Full evaluation of a document's baseline now (the shown one costs nothing once evaluated). */
  evaluateBaseline(doc: SectionDocument): Evaluation;
  /** True when the shown results belong to the store's current document. */
  idle(): boolean;
  dispose(): void;
}

type Schedule = (cb: () => void) => void;

/** Pause after each worker evaluation, as a multiple of its duration. */
const DUTY_GAP = 2;

const defaultSchedule: Schedule =
  typeof requestAnimationFrame === 'function' ? (cb) => requestAnimationFrame(() => cb()) : (cb) => cb();

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export function createLiveResults(store: EditorStore, opts: { schedule?: Schedule; worker?: boolean } = {}): ResultsHandle {
  const schedule = opts.schedule ?? defaultSchedule;
  const evaluator = createEvaluator();
  const shapesOf = (doc: SectionDocument): ShapeResult[] => evaluator.shapes(activeSection(doc));
  /** The section the store shows now. */
  const current = () => activeSection(store.getState().doc);

  let syncDoc: SectionDocument | null = null;
  let syncEval: Evaluation | null = null;
  const evaluateSync = (doc: SectionDocument): Evaluation => {
    if (doc !== syncDoc || !syncEval) {
      syncEval = evaluator.evaluate(doc);
      syncDoc = doc;
    }
    return syncEval;
  };

  // The baseline beside an active proposal: its own evaluator, so neither evicts the other's caches.
  const baseEvaluator = createEvaluator();
  let baseDoc: SectionDocument | null = null;
  let baseEval: Evaluation | null = null;
  const evaluateBaseSync = (doc: SectionDocument): Evaluation => {
    if (doc !== baseDoc || !baseEval) {
      baseEval = baseEvaluator.evaluate(doc);
      baseDoc = doc;
    }
    return baseEval;
  };
  /** The baseline the store needs evaluated now (null: no proposal is active). */
  const baseNow = () => baselineNeeded(store.getState().doc);
  const baselineResult = (doc: SectionDocument | null) => (doc ? { doc, evaluation: evaluateBaseSync(doc) } : null);

  const first = current();
  const t0 = now();
  const results = createStore<LiveResults>()(() => ({ doc: first, evaluation: evaluateSync(first), lastMs: now() - t0, count: 1, baseline: baselineResult(baseNow()) }));
  const evaluate = (doc: SectionDocument): Evaluation => {
    const r = results.getState();
    const section = activeSection(doc);
    return r.doc === section ? r.evaluation : evaluateSync(section);
  };
  const evaluateBaseline = (doc: SectionDocument): Evaluation => {
    const shown = results.getState().baseline;
    const base = baselineSection(doc);
    return shown && shown.doc === base ? shown.evaluation : evaluateBaseSync(base);
  };

  const useWorker = opts.worker !== false && typeof Worker === 'function' && typeof window !== 'undefined';
  let worker: Worker | null = null;
  if (useWorker) {
    try {
      worker = new Worker(new URL('./evalWorker.ts', import.meta.url), { type: 'module' });
    } catch {
      worker = null;
    }
  }

  let pending = false;
  const syncRun = () => {
    pending = false;
    const doc = current();
    const base = baseNow();
    const shownBase = results.getState().baseline?.doc ?? null;
    if (doc === results.getState().doc && base === shownBase) return;
    const t = now();
    const evaluation = evaluateSync(doc);
    results.setState({ doc, evaluation, lastMs: now() - t, count: results.getState().count + 1, baseline: base === shownBase ? results.getState().baseline : baselineResult(base) });
  };
  const scheduleSync = () => {
    if (pending) return;
    pending = true;
    schedule(syncRun);
  };

  let dispose: () => void;
  if (worker) {
    const w = worker;
    let dead = false;
    const sent = new Map<string, Shape>();
    let seq = 0;
    let inFlight: { seq: number; doc: SectionDocument; base?: SectionDocument | null } | null = null;
    /** The baseline the worker holds (null: none), and its shape records. */
    let sentBase: SectionDocument | null = null;
    const sentBaseShapes = new Map<string, Shape>();
    /** Holds the worker's slot during the pause between evaluations. */
    const PAUSE = { seq: -1, doc: first };
    const send = (doc: SectionDocument) => {
      const changed: Record<string, Shape> = {};
      const ids = new Set<string>();
      for (const s of doc.shapes) {
        ids.add(s.id);
        if (sent.get(s.id) !== s) {
          changed[s.id] = s;
          sent.set(s.id, s);
        }
      }
      for (const id of [...sent.keys()]) if (!ids.has(id)) sent.delete(id);
      // Proposals stay on this side: the worker evaluates one section.
      const { shapes: _shapes, variants: _variants, activeVariant: _active, ...meta } = doc;
      void [_shapes, _variants, _active];
      const req: WorkerRequest = { seq: ++seq, meta, order: doc.shapes.map((s) => s.id), changed };
      inFlight = { seq: req.seq, doc };
      const base = baseNow();
      if (base !== sentBase) {
        req.baseline = base ? sectionPart(base, sentBaseShapes) : null;
        if (!base) sentBaseShapes.clear();
        sentBase = base;
        inFlight.base = base;
      }
      w.postMessage(req);
    };
    // The worker starts with what the main thread evaluated first (and the baseline with it).
    send(first);
    inFlight = null;
    w.onmessage = (e: MessageEvent<WorkerResponse>) => {
      const res = e.data;
      const job = inFlight;
      // Only the answer to the request in flight counts (the start-up answer has none).
      if (!job || res.seq !== job.seq) return;
      let evaluation: Evaluation;
      if (res.ok) {
        evaluation = { region: res.region, props: res.props, message: res.message, warnings: res.warnings, lines: res.lines, materials: res.materials, welds: res.welds, shapes: shapesOf(job.doc) };
        if (res.stress) WORKER_STRESS.set(evaluation, res.stress);
      }
      else evaluation = evaluateSync(job.doc); // the worker failed: fall back on the main thread
      let baseline = results.getState().baseline;
      if (job.base === null) baseline = null;
      else if (job.base) {
        const b = res.ok ? res.baseline : undefined;
        baseline = { doc: job.base, evaluation: b ? { ...b, shapes: baseEvaluator.shapes(job.base) } : evaluateBaseSync(job.base) };
        if (!res.ok) sentBase = null; // the worker may not hold it: send it again next time
      }
      results.setState({ doc: job.doc, evaluation, lastMs: res.ms, count: results.getState().count + 1, baseline });
      inFlight = null;
      if (current() === job.doc && baseNow() === sentBase) return;
      // The document moved on meanwhile (a drag). Leave the processor to the pointer for
      // DUTY_GAP times as long as the engine just took, then evaluate the latest document:
      // on a small machine a worker that never rests would starve the frames.
      inFlight = PAUSE;
      setTimeout(() => {
        inFlight = null;
        if (!dead && (current() !== results.getState().doc || baseNow() !== sentBase)) send(current());
      }, Math.min(res.ms, 100) * DUTY_GAP);
    };
    w.onerror = () => {
      // A worker that cannot start (blocked by the page's policy): evaluate on the main thread.
      dead = true;
      inFlight = null;
      w.terminate();
      scheduleSync();
    };
    const unsub = store.subscribe((s, prev) => {
      if (activeSection(s.doc) === activeSection(prev.doc) && baselineNeeded(s.doc) === baselineNeeded(prev.doc)) return;
      if (dead) scheduleSync();
      else if (!inFlight) send(activeSection(s.doc));
      // else: the answer (or the end of the pause) sends the latest document.
    });
    dispose = () => {
      unsub();
      w.terminate();
    };
  } else {
    dispose = store.subscribe((s, prev) => {
      if (activeSection(s.doc) !== activeSection(prev.doc) || baselineNeeded(s.doc) !== baselineNeeded(prev.doc)) scheduleSync();
    });
  }

  return {
    results,
    evaluate,
    shapesOf,
    evaluateBaseline,
    idle: () => results.getState().doc === current() && (results.getState().baseline?.doc ?? null) === baseNow(),
    dispose,
  };
}
