/** React adapter: the editor instance through context, state through selectors. */
import { createContext, useContext } from 'react';
import { useStore } from 'zustand';
import { useShallow } from 'zustand/react/shallow';
import type { Editor } from '../editor';
import type { EditorState } from './store';
import type { LiveResults } from './evaluation';
import type { Transient } from '../tools/types';

export const EditorContext = createContext<Editor | null>(null);

export function useEditor(): Editor {
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
