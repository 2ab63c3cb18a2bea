/**
 * The one interface every shape kind implements on the editing side: the drawing tools it offers,
 * the handles it shows when selected and what each handle does, and its fields in the side panel.
 * Geometry, validation and transforms come from the engine's kind module (`src/shapes/`);
 * nothing here computes an outline. The list of kinds is `index.ts`.
 */
import type { ComponentType } from 'react';
import type { Point, Shape } from '../../src';
import type { Command, CommandContext } from '../commands/registry';
import type { Tool } from '../tools/types';

export type HandleRef =
  | { kind: 'vertex'; index: number }
  | { kind: 'start' }
  | { kind: 'to'; index: number }
  | { kind: 'via'; index: number }
  | { kind: 'centre' }
  | { kind: 'radius' }
  | { kind: 'at' };

export interface Handle {
  ref: HandleRef;
  p: Point;
}

/** A drawing tool a kind offers: its command `tool.<id>` is registered from this. */
export interface ToolSpec {
  id: string;
  label: string;
  key?: string;
  hint?: string;
  /** Whether the tool rail's Draw group shows a button (the profile tool has its own control). */
  inDrawGroup: boolean;
  /** Commands shown under the tool's button while it is active (the arc mode of chain tools). */
  subCommands?: string[];
  create(): Tool;
  /** Takes the command's argument before the tool is chosen (the profile type). */
  configure?(c: CommandContext, arg: unknown): void;
}

export interface ShapeEditor<S extends Shape = Shape> {
  /** The engine kinds this module edits (one for most; the eight profiles share one). */
  readonly types: readonly S['type'][];
  handles(s: S): Handle[];
  /** The shape with one handle moved to p. */
  moveHandle(s: S, ref: HandleRef, p: Point): S;
  /** The kind's own fields in the side panel, for one selected shape. */
  Fields: ComponentType<{ shape: S }>;
  tools: readonly ToolSpec[];
  /** Commands only this kind needs (the path tool's arc mode). */
  commands?: readonly Command[];
  /** A control of its own in the tool rail (the profile chooser). */
  RailControl?: ComponentType;
}
