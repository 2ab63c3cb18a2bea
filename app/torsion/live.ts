/**
 * Live torsion: J, the shear centre and Cw of the section on screen, by finite elements, beside
 * the editor and never in its way.
 *
 * - On only when the document asks for it (its `torsion` settings; the panel's button adds them).
 * - A run starts once the section has been still for QUIET_MS and the section properties belong to
 *   it (the torsion run takes the evaluated region and its materials); it runs in its own worker.
 * - When the section changes under a run, the run is cancelled at once (its answer would be for a
 *   section that no longer exists) and a new one waits for the next still moment. A drag therefore
 *   never waits for torsion, and at most one run is alive.
 * - The last result stays shown, marked stale, until a run for the current section replaces it.
 * - Cancel stops the run and pauses automatic runs until Compute is pressed (the user said stop).
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import {
  basisOf,
  resolveTorsionSettings,
  sectionPieces,
  sectionSize,
  sectionTorsion,
  TorsionError,
  type ResolvedTorsionSettings,
  type SectionDocument,
  type SectionTorsion,
  type Shape,
  type TorsionBasis,
  type TorsionStage,
  type Units,
} from '../../src';
import type { ResultsHandle } from '../store/evaluation';
import { activeSection } from '../store/section';
import type { EditorStore } from '../store/store';
import type { TorsionReply } from './protocol';
import { createTorsionRunner, type TorsionRunner } from './runner';

/** Stillness (ms) before a run starts. */
export const QUIET_MS = 400;

/** What a run depends on: the section's shapes (by identity) and the settings. */
export interface RunKey {
  shapes: readonly Shape[];
  units: Units;
  materials: SectionDocument['materials'];
  reference: SectionDocument['reference'];
  density: ResolvedTorsionSettings['density'];
  poisson: number;
}

export function sameKey(a: RunKey, b: RunKey): boolean {
  return (
    a.units === b.units &&
    a.materials === b.materials &&
    a.reference === b.reference &&
    a.density === b.density &&
    a.poisson === b.poisson &&
    a.shapes.length === b.shapes.length &&
    a.shapes.every((s, k) => s === b.shapes[k])
  );
}

/** A result with what it belongs to and what the views need to print it. */
export interface ShownTorsion {
  torsion: SectionTorsion;
  key: RunKey;
  units: Units;
  /** The section's larger side (round-off zero) and centroid, when it ran. */
  size: number;
  centroid: { x: number; y: number };
}

export type TorsionStatus = 'off' | 'waiting' | 'running' | 'done' | 'paused';

export interface TorsionView {
  /** The settings the document asks for; null when torsion is not part of its results. */
  settings: ResolvedTorsionSettings | null;
  shown: ShownTorsion | null;
  /** True when `shown` belongs to an earlier section or other settings. */
  stale: boolean;
  status: TorsionStatus;
  progress: number;
  stage: TorsionStage | null;
  /** Runs finished (with a result or a refusal) since start. */
  finished: number;
}

export interface TorsionHandle {
  view: StoreApi<TorsionView>;
  /** Run now for the current section (and resume automatic runs after a cancel). */
  compute(): void;
  /** Stop the run and pause automatic runs until compute(). */
  cancel(): void;
  /** The torsion of the document's section for its report: the shown result when current, else a run now; null when the document has no torsion. */
  forReport(doc: SectionDocument): Promise<SectionTorsion | null>;
  dispose(): void;
}

function keyOf(section: SectionDocument, s: ResolvedTorsionSettings): RunKey {
  return { shapes: section.shapes, units: section.units, materials: section.materials, reference: section.reference, density: s.density, poisson: s.poisson };
}

interface InFlight {
  id: number;
  key: RunKey;
  settings: ResolvedTorsionSettings;
  basis: TorsionBasis;
  units: Units;
  size: number;
  centroid: { x: number; y: number };
  cancelled: boolean;
}

export function createLiveTorsion(store: EditorStore, results: ResultsHandle, opts: { worker?: boolean; quietMs?: number } = {}): TorsionHandle {
  const quietMs = opts.quietMs ?? QUIET_MS;
  const view = createStore<TorsionView>()(() => ({ settings: null, shown: null, stale: false, status: 'off', progress: 0, stage: null, finished: 0 }));
  let seq = 0;
  let inFlight: InFlight | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let paused = false;
  /** Start as soon as the section properties catch up (set when the quiet time is over, or asked for). */
  let due = false;
  let disposed = false;

  const runner: TorsionRunner = createTorsionRunner((r) => onReply(r), { worker: opts.worker });

  /** The section on screen and its key; null when the document has no torsion. */
  const wanted = () => {
    const doc = store.getState().doc;
    if (!doc.torsion) return null;
    const section = activeSection(doc);
    const settings = resolveTorsionSettings(doc);
    return { section, settings, key: keyOf(section, settings) };
  };

  const patch = (p: Partial<TorsionView>) => {
    const v = view.getState();
    if (Object.entries(p).some(([k, x]) => v[k as keyof TorsionView] !== x)) view.setState(p);
  };

  const clearTimer = () => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
  };

  const cancelRun = () => {
    if (inFlight && !inFlight.cancelled) {
      inFlight.cancelled = true;
      runner.send({ type: 'cancel', id: inFlight.id });
    }
  };

  function start(w: NonNullable<ReturnType<typeof wanted>>): void {
    const ev = results.results.getState().evaluation;
    due = false;
    let pieces;
    try {
      pieces = sectionPieces(ev, w.section);
    } catch (e) {
      if (!(e instanceof TorsionError)) throw e;
      // Nothing to run: the refusal is the result for this section.
      view.setState({ shown: { torsion: { ok: false, message: e.message, settings: w.settings }, key: w.key, units: w.section.units, size: 0, centroid: { x: 0, y: 0 } }, finished: view.getState().finished + 1 });
      return update();
    }
    const p = ev.props;
    inFlight = {
      id: ++seq,
      key: w.key,
      settings: w.settings,
      basis: basisOf(pieces),
      units: w.section.units,
      size: sectionSize(p?.bounds ?? null),
      centroid: p ? { x: p.centroid.x, y: p.centroid.y } : { x: 0, y: 0 },
      cancelled: false,
    };
    patch({ status: 'running', progress: 0, stage: 'mesh' });
    runner.send({ type: 'run', id: inFlight.id, pieces: pieces.pieces, options: { density: w.settings.density, poisson: w.settings.poisson, referenceG: pieces.referenceG } });
  }

  /** Start now if nothing runs and the section properties belong to the section on screen. */
  function tryStart(): void {
    if (disposed || !due || inFlight) return;
    const w = wanted();
    if (!w) return;
    const shown = view.getState().shown;
    if (shown && sameKey(shown.key, w.key)) {
      due = false;
      return;
    }
    if (!results.idle()) return; // the results subscription calls again
    start(w);
  }

  function onReply(r: TorsionReply): void {
    if (!inFlight || r.id !== inFlight.id) return;
    const f = inFlight;
    if (r.type === 'progress') {
      if (!f.cancelled) patch({ progress: r.fraction, stage: r.stage });
      return;
    }
    inFlight = null;
    if (r.type === 'done') {
      const torsion = sectionTorsion(r.result, f.settings, f.basis, r.ms);
      view.setState({ shown: { torsion, key: f.key, units: f.units, size: f.size, centroid: f.centroid }, finished: view.getState().finished + 1 });
    } else if (r.type === 'failed') {
      const message = r.input ? r.message : `the torsion run failed: ${r.message}`;
      view.setState({ shown: { torsion: { ok: false, message, settings: f.settings }, key: f.key, units: f.units, size: f.size, centroid: f.centroid }, finished: view.getState().finished + 1 });
    }
    update();
  }

  /** Bring the view and the run in line with the document. */
  function update(): void {
    if (disposed) return;
    const w = wanted();
    if (!w) {
      cancelRun();
      clearTimer();
      due = false;
      paused = false;
      patch({ settings: null, shown: null, stale: false, status: 'off', progress: 0, stage: null });
      return;
    }
    const shown = view.getState().shown;
    const fresh = !!shown && sameKey(shown.key, w.key);
    if (inFlight && !sameKey(inFlight.key, w.key)) cancelRun(); // the document left this run behind
    const running = !!inFlight && !inFlight.cancelled;
    patch({ settings: w.settings, stale: !!shown && !fresh, status: fresh ? 'done' : running ? 'running' : paused ? 'paused' : 'waiting' });
    if (fresh || running || paused) {
      clearTimer();
      if (fresh) due = false;
      return;
    }
    if (due) return tryStart();
    clearTimer();
    timer = setTimeout(() => {
      timer = null;
      due = true;
      tryStart();
    }, quietMs);
  }

  const unsubDoc = store.subscribe((s, prev) => {
    if (s.doc === prev.doc) return;
    // A change of the section restarts the quiet time (a run already due waits for it again).
    if (activeSection(s.doc) !== activeSection(prev.doc)) due = false;
    // Torsion included, or new settings: a request to run with them now.
    else if (s.doc.torsion !== prev.doc.torsion) due = true;
    if (s.doc.torsion !== prev.doc.torsion) paused = false;
    update();
  });
  const unsubResults = results.results.subscribe(() => tryStart());
  update();

  return {
    view,
    compute() {
      paused = false;
      due = true;
      update();
    },
    cancel() {
      cancelRun();
      clearTimer();
      due = false;
      paused = true;
      patch({ progress: 0, stage: null });
      update();
    },
    forReport(doc) {
      if (!doc.torsion) return Promise.resolve(null);
      return new Promise((resolve) => {
        const check = (): boolean => {
          const w = wanted();
          if (!w) {
            resolve(null);
            return true;
          }
          const shown = view.getState().shown;
          if (shown && sameKey(shown.key, w.key)) {
            resolve(shown.torsion);
            return true;
          }
          return false;
        };
        if (check()) return;
        const unsub = view.subscribe(() => check() && unsub());
        paused = false;
        due = true;
        update();
      });
    },
    dispose() {
      disposed = true;
      clearTimer();
      cancelRun();
      unsubDoc();
      unsubResults();
      runner.dispose();
    },
  };
}
