/** React adapter for the exchange UI state. */
import { useStore } from 'zustand';
import { useEditor } from '../context';
import { exchangeStore, type ExchangeState } from './state';

export function useExchange<T>(selector: (s: ExchangeState) => T): T {
  return useStore(exchangeStore(useEditor().store), selector);
}
