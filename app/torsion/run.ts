/**
 * One torsion run with its replies, shared by the worker and the in-page fallback: the engine's
 * asynchronous run (it hands the event loop a turn every ~30 ms, so a cancel message gets in), its
 * progress thinned out, and the end as one reply: done, cancelled or failed.
 */
import { computeTorsionAsync, isTorsionCancelled, type TorsionStage } from '../../src';
import { PROGRESS_EVERY_MS, type TorsionReply, type TorsionRequest } from './protocol';

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export async function runTorsionRequest(req: Extract<TorsionRequest, { type: 'run' }>, cancelled: () => boolean, reply: (r: TorsionReply) => void): Promise<void> {
  const t0 = now();
  let lastAt = -Infinity, lastStage: TorsionStage | null = null;
  try {
    const result = await computeTorsionAsync(req.pieces, {
      ...req.options,
      shouldCancel: cancelled,
      onProgress: (fraction, stage) => {
        const t = now();
        if (stage === lastStage && t - lastAt < PROGRESS_EVERY_MS) return;
        lastAt = t;
        lastStage = stage;
        reply({ type: 'progress', id: req.id, fraction, stage });
      },
    });
    reply({ type: 'done', id: req.id, result, ms: now() - t0 });
  } catch (e) {
    if (isTorsionCancelled(e)) reply({ type: 'cancelled', id: req.id });
    else reply({ type: 'failed', id: req.id, message: e instanceof Error ? e.message : String(e), input: e instanceof Error && e.name === 'TorsionError' });
  }
}
