/**
 * The order cautions are listed and numbered in, everywhere (canvas markers, panel, report):
 * warnings before notes, otherwise in the order the analysis found them.
 */
import type { Caution } from './types';

export function cautionsInOrder(list: readonly Caution[]): Caution[] {
  return [...list.filter((c) => c.severity === 'warning'), ...list.filter((c) => c.severity !== 'warning')];
}
