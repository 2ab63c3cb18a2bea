/** React access to the materials UI store of the current editor. */
import { useStore } from 'zustand';
import { useEditor } from '../context';
import { materialsUi, type MaterialsUiState } from './state';

export function useMaterialsUi<T>(selector: (s: MaterialsUiState) => T): T {
  return useStore(materialsUi(useEditor().store), selector);
}
