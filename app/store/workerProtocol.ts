/** Messages between the editor and the evaluation worker. */
import type { Issue, LineGroupResult, MaterialsResult, Region, SectionDocument, SectionProperties, Shape, WeldResult } from '../../src';

export interface WorkerRequest {
  seq: number;
  meta: Omit<SectionDocument, 'shapes'>;
  order: string[];
  /** Shapes that differ (by identity) from what the worker holds. */
  changed: Record<string, Shape>;
}

export type WorkerResponse =
  | {
      seq: number;
      ok: true;
      region: Region;
      props: SectionProperties | null;
      message: string | null;
      warnings: Issue[];
      lines: LineGroupResult[];
      materials: MaterialsResult | null;
      welds: WeldResult[];
      ms: number;
    }
  | { seq: number; ok: false; error: string; ms: number };
