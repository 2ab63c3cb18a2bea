/** Messages between the editor and the evaluation worker. */
import type { Issue, LineGroupResult, MaterialsResult, Region, SectionDocument, SectionProperties, Shape, StressSection, WeldResult } from '../../src';
import type { SectionPart } from './baseline';

export interface WorkerRequest {
  seq: number;
  meta: Omit<SectionDocument, 'shapes'>;
  order: string[];
  /** Shapes that differ (by identity) from what the worker holds. */
  changed: Record<string, Shape>;
  /** The baseline beside an active proposal (baseline.ts): absent when unchanged, null when none is needed. */
  baseline?: SectionPart | null;
}

/** The baseline's evaluation, sent back only when a new baseline came with the request. */
export interface BaselineAnswer {
  region: Region;
  props: SectionProperties | null;
  message: string | null;
  warnings: Issue[];
  lines: LineGroupResult[];
  materials: MaterialsResult | null;
  welds: WeldResult[];
  ms: number;
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
      /**
       * The section stresses and the centre of gravity work on, worked out beside the evaluation
       * (its parts share the region above, which one message carries once): the main thread would
       * otherwise integrate the whole region again every drag frame.
       */
      stress?: StressSection;
      ms: number;
      baseline?: BaselineAnswer;
    }
  | { seq: number; ok: false; error: string; ms: number };
