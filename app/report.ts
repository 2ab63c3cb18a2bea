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
  /** Draw the kern in the report even without materials or loads (the kern view is on). */
  kern?: boolean;
  /** The proposal to check against the baseline (default: the one shown, else the first; null: none). */
  variant?: string | null;
  torsion?: SectionTorsion | null;
}

export type ReportRenderer = (input: ReportRequest) => string;

export async function loadReportRenderer(): Promise<ReportRenderer | null> {
  const m = await import('../src/report');
  return typeof m.renderReportHtml === 'function' ? m.renderReportHtml : null;
}
