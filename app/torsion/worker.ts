/**
 * The torsion worker: its own thread for the finite-element run, so neither the pointer nor the
 * section-property worker waits for it. It takes one run at a time and a cancel message for it;
 * the stress map's typed arrays go back transferred, not copied.
 */
import type { TorsionReply, TorsionRequest } from './protocol';
import { runTorsionRequest } from './run';

const cancelled = new Set<number>();

function post(r: TorsionReply): void {
  const w = self as unknown as Worker;
  if (r.type === 'done') w.postMessage(r, [r.result.stress.xy.buffer, r.result.stress.triangles.buffer, r.result.stress.magnitude.buffer]);
  else w.postMessage(r);
}

self.onmessage = (e: MessageEvent<TorsionRequest>) => {
  const req = e.data;
  if (req.type === 'cancel') {
    cancelled.add(req.id);
    return;
  }
  void runTorsionRequest(req, () => cancelled.has(req.id), post).finally(() => cancelled.delete(req.id));
};
