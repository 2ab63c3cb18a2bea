/** Messages between the editor and the cutout analysis worker (analysis.ts). */
import type { Caution, MaterialChange, Region } from '../../src';
import type { CautionJob } from './cutout';

export interface AnalysisRequest {
  id: number;
  /** The shown section's cautions (against the baseline when one is given in the job). */
  cautions: CautionJob;
  /** The baseline's own cautions, when a proposal is shown and they are not known yet. */
  baselineCautions?: CautionJob;
  /** The material removed and added, when a proposal is shown. */
  change?: { baseline: Region; proposal: Region };
}

export type AnalysisResponse =
  | { id: number; ok: true; cautions: Caution[]; baselineCautions?: Caution[]; change?: MaterialChange; ms: number }
  | { id: number; ok: false; error: string };
