/**
 * The select tool is a small state machine: each state is one class in this folder with the
 * pointer handlers it needs, and returns the next state (or itself).
 */
import type { PointerInfo, ToolEnv } from '../tools/types';

export interface SelectState {
  readonly name: string;
  down?(env: ToolEnv, e: PointerInfo): SelectState;
  move?(env: ToolEnv, e: PointerInfo): SelectState;
  up?(env: ToolEnv, e: PointerInfo): SelectState;
  /** Leave the state early (Escape, tool change): undo whatever it previewed. */
  cancel?(env: ToolEnv): void;
}

/** Pointer travel (px) below which a press is a click, not a drag. */
export const DRAG_PX = 3;
/** Pick radius of a handle (px). */
export const HANDLE_PX = 7;
