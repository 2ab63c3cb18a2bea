/**
 * The evaluation worker: keeps its own shape records (replaced only when the editor sends a
 * changed one), so the engine's incremental evaluator sees unchanged shapes as identical objects
 * and repeats no work for them. Runs off the main thread so the pointer never waits.
 */
import { createEvaluator, stressSection, type SectionDocument, type Shape, type StressSection } from '../../src';
import type { WorkerRequest, WorkerResponse } from './workerProtocol';
import { SectionReplica } from './baseline';

const evaluator = createEvaluator();
const shapes = new Map<string, Shape>();
/** The baseline beside an active proposal: evaluated only when the editor sends a new one. */
const baseline = new SectionReplica();

self.onmessage = (e: MessageEvent<WorkerRequest>) => {
  const req = e.data;
  for (const [id, s] of Object.entries(req.changed)) shapes.set(id, s);
  const keep = new Set(req.order);
  for (const id of [...shapes.keys()]) if (!keep.has(id)) shapes.delete(id);
  const doc: SectionDocument = { ...req.meta, shapes: req.order.map((id) => shapes.get(id)!) };
  const t = performance.now();
  let res: WorkerResponse;
  try {
    const ev = evaluator.evaluate(doc);
    let stress: StressSection | undefined;
    try {
      stress = stressSection(doc, ev);
    } catch {
      stress = undefined; // the main thread works it out again and shows the reason
    }
    res = { seq: req.seq, ok: true, region: ev.region, props: ev.props, message: ev.message, warnings: ev.warnings, lines: ev.lines, materials: ev.materials, welds: ev.welds, stress, ms: performance.now() - t };
    if (req.baseline) {
      const tb = performance.now();
      baseline.apply(req.baseline);
      const b = baseline.evaluate()!;
      res.baseline = { region: b.region, props: b.props, message: b.message, warnings: b.warnings, lines: b.lines, materials: b.materials, welds: b.welds, ms: performance.now() - tb };
    }
  } catch (err) {
    res = { seq: req.seq, ok: false, error: err instanceof Error ? err.message : String(err), ms: performance.now() - t };
  }
  (self as unknown as Worker).postMessage(res);
};
