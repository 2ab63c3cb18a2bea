/** Messages between the editor and the torsion worker (one run at a time; the editor numbers them). */
import type { TorsionDensity, TorsionPiece, TorsionResult, TorsionStage } from '../../src';

export interface TorsionRunOptions {
  density: TorsionDensity;
  poisson: number;
  referenceG: number;
}

export type TorsionRequest = { type: 'run'; id: number; pieces: TorsionPiece[]; options: TorsionRunOptions } | { type: 'cancel'; id: number };

export type TorsionReply =
  | { type: 'progress'; id: number; fraction: number; stage: TorsionStage }
  | { type: 'done'; id: number; result: TorsionResult; ms: number }
  | { type: 'cancelled'; id: number }
  /** `input`: the engine refused the section (TorsionError); otherwise an internal failure. */
  | { type: 'failed'; id: number; message: string; input: boolean };

/** Send progress at most this often (ms), or when the stage changes. */
export const PROGRESS_EVERY_MS = 80;
