/**
 * React adapter: the editor instance through context, state through selectors. The `EditorHandle`
 * type is the part of an editor that views use; `editor.ts` builds one.
 */
import { createContext, useContext } from 'react';
import { useStore } from 'zustand';
import { useShallow } from 'zustand/react/shallow';
import type { CommandContext, CommandRegistry } from './commands/registry';
import type { ResultsHandle, LiveResults } from './store/evaluation';
import type { EditorState, EditorStore } from './store/store';
import type { Transient, TransientStore } from './store/transient';
import type { Tool, ToolEnv } from './tools/types';
import type { TorsionHandle, TorsionView } from './torsion/live';

export interface EditorHandle {
  store: EditorStore;
  results: ResultsHandle;
  /** Live torsion by finite elements (its own worker). */
  torsion: TorsionHandle;
  transient: TransientStore;
  env: ToolEnv;
  ctx: CommandContext;
  /** The one command table (toolbar, keyboard, keys sheet and tests all read it). */
  commands: CommandRegistry;
  tool(): Tool;
  /** Run a command by name (the single entry point for toolbar, keyboard and tests). */
  run(name: string, arg?: unknown): boolean;
  /** Submit typed drawing input; returns an error message or null. */
  type(text: string): string | null;
  dispose(): void;
}

export const EditorContext = createContext<EditorHandle | null>(null);

export function useEditor(): EditorHandle {
  const e = useContext(EditorContext);
  if (!e) throw new Error('useEditor outside EditorContext');
  return e;
}

export function useEditorState<T>(selector: (s: EditorState) => T): T {
  return useStore(useEditor().store, selector);
}

export function useEditorShallow<T extends object>(selector: (s: EditorState) => T): T {
  return useStore(useEditor().store, useShallow(selector));
}

export function useResults<T>(selector: (r: LiveResults) => T): T {
  return useStore(useEditor().results.results, selector);
}

export function useTransient<T>(selector: (t: Transient) => T): T {
  return useStore(useEditor().transient, selector);
}

export function useTorsion<T>(selector: (v: TorsionView) => T): T {
  return useStore(useEditor().torsion.view, selector);
}
