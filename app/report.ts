/**
 * Hook for the printable report. The engine's report module (src/report/, written separately)
 * exports `renderReportHtml(doc, evaluation, options)`; when it is present in the build, the
 * editor shows its HTML in an overlay and prints it for "Save as PDF". Until then
 * `loadReportRenderer()` resolves to null and the overlay says so.
 */
import type { Evaluation, SectionDocument } from '../src';

export type ReportRenderer = (doc: SectionDocument, evaluation: Evaluation, options?: Record<string, unknown>) => string;

// Vite resolves this at build time; an empty folder gives an empty record (no build error).
const modules = import.meta.glob('../src/report/*.ts');

export async function loadReportRenderer(): Promise<ReportRenderer | null> {
  const keys = Object.keys(modules).sort((a, b) => (a.endsWith('/index.ts') ? -1 : b.endsWith('/index.ts') ? 1 : a.localeCompare(b)));
  for (const k of keys) {
    if (k.endsWith('.test.ts')) continue;
    const m = (await modules[k]()) as { renderReportHtml?: ReportRenderer };
    if (typeof m.renderReportHtml === 'function') return m.renderReportHtml;
  }
  return null;
}
