/**
 * The cutout analysis worker: the structural cautions and the exact material removed and added
 * (two booleans) for the shown section, off the main thread, so a large section's analysis never
 * holds up the pointer or the panel. Plain data in, plain data out (analysisProtocol.ts).
 */
import { materialChange } from '../../src';
import type { AnalysisRequest, AnalysisResponse } from './analysisProtocol';
import { runCautionJob } from './cutout';

self.onmessage = (e: MessageEvent<AnalysisRequest>) => {
  const req = e.data;
  const t = performance.now();
  let res: AnalysisResponse;
  try {
    res = {
      id: req.id,
      ok: true,
      cautions: runCautionJob(req.cautions),
      baselineCautions: req.baselineCautions ? runCautionJob(req.baselineCautions) : undefined,
      change: req.change ? materialChange(req.change.baseline, req.change.proposal) : undefined,
      ms: 0,
    };
    res.ms = performance.now() - t;
  } catch (err) {
    res = { id: req.id, ok: false, error: err instanceof Error ? err.message : String(err) };
  }
  (self as unknown as Worker).postMessage(res);
};
