/**
 * Running a stepwise computation with progress reports and cancellation, in two ways:
 * synchronously (the caller blocks; suits a Web Worker that is terminated to cancel, the CLI and
 * tests) or asynchronously, handing control back to the event loop every few milliseconds so that
 * a worker can receive a cancel message while it computes.
 *
 * The computation is a generator that yields `Step`s. Sub-steps yield plain fractions 0–1 and are
 * mapped into their share of the whole with `stage`.
 */
import { TorsionCancelled } from './errors';

export type TorsionStage = 'mesh' | 'solve-coarse' | 'refine' | 'solve-fine' | 'results';

export interface Step {
  fraction: number;
  stage: TorsionStage;
}

export interface RunHooks {
  /** Called with the fraction done (0–1, never decreasing) and the current stage. */
  onProgress?: (fraction: number, stage: TorsionStage) => void;
  /** Polled between steps; returning true stops the run with TorsionCancelled. */
  shouldCancel?: () => boolean;
}

/** Run a sub-computation that yields fractions as the part [from, to] of the whole, in one stage. */
export function* stage<T>(gen: Generator<number, T>, name: TorsionStage, from: number, to: number): Generator<Step, T> {
  yield { fraction: from, stage: name };
  for (;;) {
    const r = gen.next();
    if (r.done) {
      yield { fraction: to, stage: name };
      return r.value;
    }
    yield { fraction: from + (to - from) * Math.min(1, Math.max(0, r.value)), stage: name };
  }
}

function report(step: Step, hooks: RunHooks, last: { f: number }): void {
  if (hooks.shouldCancel?.()) throw new TorsionCancelled();
  const f = Math.max(last.f, step.fraction);
  last.f = f;
  hooks.onProgress?.(f, step.stage);
}

export function runSync<T>(gen: Generator<Step, T>, hooks: RunHooks): T {
  const last = { f: 0 };
  try {
    for (;;) {
      const r = gen.next();
      if (r.done) return r.value;
      report(r.value, hooks, last);
    }
  } finally {
    gen.return(undefined as T);
  }
}

/** Work for about this long before giving the event loop a turn. */
const SLICE_MS = 30;

export async function runAsync<T>(gen: Generator<Step, T>, hooks: RunHooks): Promise<T> {
  const last = { f: 0 };
  try {
    let sliceStart = Date.now();
    for (;;) {
      const r = gen.next();
      if (r.done) return r.value;
      if (Date.now() - sliceStart > SLICE_MS) {
        await new Promise<void>((resolve) => setTimeout(resolve, 0));
        sliceStart = Date.now();
      }
      report(r.value, hooks, last);
    }
  } finally {
    gen.return(undefined as T);
  }
}
