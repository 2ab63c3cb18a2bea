/** Shared measuring helpers for the benchmarks. */
import { createEvaluator, type SectionDocument, type Shape } from '../src';

export function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

export function p95(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(0.95 * s.length))];
}

/**
 * Engine time per drag frame: one incremental evaluator, the shape `id` moved by `move(shape, f)`
 * in each of 240 frames (the first 20 left out as warm-up). Median and 95th percentile, in ms.
 */
export function dragEvalFrames(doc: SectionDocument, id: string, move: (s: Shape, f: number) => Shape): { median: number; p95: number; sink: number } {
  const ev = createEvaluator();
  let sink = ev.evaluate(doc).props?.area ?? 0;
  const idx = doc.shapes.findIndex((s) => s.id === id);
  if (idx < 0) throw new Error(`benchmark document has no shape "${id}"`);
  const frames: number[] = [];
  for (let f = 0; f < 240; f++) {
    const moved = doc.shapes.slice();
    moved[idx] = move(moved[idx], f);
    const t = performance.now();
    sink += ev.evaluate({ ...doc, shapes: moved }).props?.area ?? 0;
    frames.push(performance.now() - t);
  }
  return { median: median(frames.slice(20)), p95: p95(frames.slice(20)), sink };
}
