/**
 * The select tool is a small state machine: each state is one class in this folder with the
 * pointer handlers it needs, and returns the next state, itself, or `IDLE` to go back to rest.
 * States lead forward only (rest → press → drag); the way back is the `IDLE` value, so no
 * state file imports the one it came from.
 */
import type { PointerInfo, ToolEnv } from '../tools/types';

/** Back to the idle state (the tool makes a fresh one). */
export const IDLE = null;
export type Next = SelectState | typeof IDLE;

export interface SelectState {
  readonly name: string;
  down?(env: ToolEnv, e: PointerInfo): Next;
  move?(env: ToolEnv, e: PointerInfo): Next;
  up?(env: ToolEnv, e: PointerInfo): Next;
  /** Leave the state early (Escape, tool change): undo whatever it previewed. */
  cancel?(env: ToolEnv): void;
}

/** Pointer travel (px) below which a press is a click, not a drag. */
export const DRAG_PX = 3;
/** Pick radius of a handle (px). */
export const HANDLE_PX = 7;
