/**
 * Commands are data: a name, a label, optional key bindings and `perform`. One registry and one
 * dispatcher serve the keyboard, the toolbar and the tests. Registering a key that another
 * command already uses is refused.
 */
import type { Evaluation, SectionDocument, ShapeResult } from '../../src';
import type { EditorStore } from '../store/store';
import type { TorsionHandle } from '../torsion/live';

export interface FileIO {
  /** Ask the user for a file and return its text (null when cancelled). */
  pickFile(): Promise<{ name: string; text: string } | null>;
  download(name: string, text: string): void;
}

export interface CommandContext {
  store: EditorStore;
  evaluate(doc: SectionDocument): Evaluation;
  /** Each shape's own outline (cheap; no booleans). */
  shapesOf(doc: SectionDocument): readonly ShapeResult[];
  io?: FileIO;
  /** Opens the report overlay (wired by the app). */
  openReport?(): void;
  /** Live torsion (runs, cancel, the stress map). */
  torsion?: TorsionHandle;
}

export interface Command {
  name: string;
  label: string;
  group: 'edit' | 'tool' | 'view' | 'file' | 'shape' | 'order' | 'op' | 'snap' | 'units';
  /** Key bindings like 'mod+z', 'shift+arrowleft', 'delete', 'r'. */
  keys?: string[];
  /** Short hint for the toolbar tooltip. */
  hint?: string;
  enabled?(ctx: CommandContext): boolean;
  /** True when the command is "on" (toggles), for the toolbar. */
  active?(ctx: CommandContext): boolean;
  perform(ctx: CommandContext, arg?: unknown): void | Promise<void>;
}

export class CommandRegistry {
  private byName = new Map<string, Command>();
  private byKey = new Map<string, Command>();

  register(cmd: Command): void {
    if (this.byName.has(cmd.name)) throw new Error(`command "${cmd.name}" is registered twice`);
    for (const k of cmd.keys ?? []) {
      const key = normaliseKey(k);
      const other = this.byKey.get(key);
      if (other) throw new Error(`key "${key}" of "${cmd.name}" is already bound to "${other.name}"`);
    }
    this.byName.set(cmd.name, cmd);
    for (const k of cmd.keys ?? []) this.byKey.set(normaliseKey(k), cmd);
  }

  get(name: string): Command | undefined {
    return this.byName.get(name);
  }

  all(): Command[] {
    return [...this.byName.values()];
  }

  forKey(key: string): Command | undefined {
    return this.byKey.get(normaliseKey(key));
  }

  /** Run a command by name; returns false when it is unknown or disabled. */
  dispatch(ctx: CommandContext, name: string, arg?: unknown): boolean {
    const cmd = this.byName.get(name);
    if (!cmd) throw new Error(`unknown command "${name}"`);
    if (cmd.enabled && !cmd.enabled(ctx)) return false;
    void cmd.perform(ctx, arg);
    return true;
  }
}

/** 'Shift+Mod+Z' -> 'mod+shift+z' (modifiers in a fixed order). */
export function normaliseKey(k: string): string {
  const parts = k.toLowerCase().split('+').map((p) => p.trim());
  const key = parts.pop() ?? '';
  const mods = ['mod', 'alt', 'shift'].filter((m) => parts.includes(m));
  return [...mods, key === 'space' ? ' ' : key].join('+');
}

/** The binding string for a keyboard event. */
export function eventKey(e: { key: string; ctrlKey: boolean; metaKey: boolean; altKey: boolean; shiftKey: boolean }): string {
  const mods: string[] = [];
  if (e.ctrlKey || e.metaKey) mods.push('mod');
  if (e.altKey) mods.push('alt');
  if (e.shiftKey) mods.push('shift');
  return [...mods, e.key.toLowerCase()].join('+');
}
