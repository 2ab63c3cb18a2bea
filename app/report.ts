/**
 * The printable report: the engine's report module (src/report/) renders HTML from the document
 * and its evaluation; the editor shows it in an overlay iframe and prints it for "Save as PDF".
 * Loaded on demand so the editor starts without it.
 */
import type { Evaluation, SectionDocument, SectionTorsion } from '../src';

export interface ReportRequest {
  doc: SectionDocument;
  evaluation: Evaluation;
  cut?: { axis: 'x' | 'y'; at: number } | null;
  generated?: string;
  torsion?: SectionTorsion | null;
}

export type ReportRenderer = (input: ReportRequest) => string;

export async function loadReportRenderer(): Promise<ReportRenderer | null> {
  const m = await import('../src/report');
  return typeof m.renderReportHtml === 'function' ? m.renderReportHtml : null;
}
