/**
 * Where torsion runs: in its own worker in the browser (started on the first run, so a section
 * without torsion costs nothing), or in the page when there are no workers (tests, a page that
 * refuses them), through the same engine call with the same replies.
 */
import type { TorsionReply, TorsionRequest } from './protocol';
import { runTorsionRequest } from './run';

export interface TorsionRunner {
  send(req: TorsionRequest): void;
  dispose(): void;
}

/** Runs in the page: the engine yields to the event loop between slices, so the page stays responsive. */
export function createPageRunner(reply: (r: TorsionReply) => void): TorsionRunner {
  const cancelled = new Set<number>();
  let live = true;
  return {
    send(req) {
      if (req.type === 'cancel') {
        cancelled.add(req.id);
        return;
      }
      // Start after the caller returns, as a worker would.
      setTimeout(() => {
        void runTorsionRequest(req, () => !live || cancelled.has(req.id), (r) => live && reply(r)).finally(() => cancelled.delete(req.id));
      }, 0);
    },
    dispose() {
      live = false;
    },
  };
}

/** A worker when the page has them; falls back to the page when the worker cannot start. */
export function createTorsionRunner(reply: (r: TorsionReply) => void, opts: { worker?: boolean } = {}): TorsionRunner {
  const canWork = opts.worker !== false && typeof Worker === 'function' && typeof window !== 'undefined';
  if (!canWork) return createPageRunner(reply);
  let worker: Worker | null = null;
  let page: TorsionRunner | null = null;
  let running: Extract<TorsionRequest, { type: 'run' }> | null = null;
  const fallBack = () => {
    worker?.terminate();
    worker = null;
    page = createPageRunner(reply);
    // The run the worker could not take goes to the page.
    if (running) page.send(running);
  };
  const start = (): Worker | null => {
    if (worker || page) return worker;
    try {
      worker = new Worker(new URL('./worker.ts', import.meta.url), { type: 'module' });
    } catch {
      fallBack();
      return null;
    }
    worker.onmessage = (e: MessageEvent<TorsionReply>) => {
      if (e.data.type !== 'progress' && running?.id === e.data.id) running = null;
      reply(e.data);
    };
    worker.onerror = () => fallBack();
    return worker;
  };
  return {
    send(req) {
      if (req.type === 'run') running = req;
      if (page) return page.send(req);
      const w = start();
      if (w) w.postMessage(req);
      // else the worker could not start: the page took over, and with it the run just set.
      else if (req.type === 'cancel') page!.send(req);
    },
    dispose() {
      worker?.terminate();
      page?.dispose();
    },
  };
}
