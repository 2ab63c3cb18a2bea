/**
 * Which allowed change applies to which property: the one table that limit evaluation and limit
 * validation share. Per-cent limits for magnitudes, shifts for the centroid and coordinates,
 * rotation for θ (see property-change.ts for the kinds).
 */
import type { PropertyInfo } from '../properties/catalog';
import { changeKind, type ChangeKind } from './property-change';

export type LimitField = 'maxLossPercent' | 'maxGainPercent' | 'maxShift' | 'maxRotation';

export const LIMIT_FIELDS: readonly LimitField[] = ['maxLossPercent', 'maxGainPercent', 'maxShift', 'maxRotation'];

/** The pseudo-property for the centroid as a point: its shift is the length of the move. */
export const CENTROID_KEY = 'centroid';

/** The limit fields that apply to a property (by key), given the properties the comparison lists. */
export function fieldsFor(key: string, catalog: readonly PropertyInfo[]): LimitField[] {
  if (key === CENTROID_KEY) return ['maxShift'];
  const info = catalog.find((i) => i.key === key);
  return info ? fieldsForKind(changeKind(info)) : [];
}

/** The limit fields that apply to a kind of property. */
export function fieldsForKind(kind: ChangeKind): LimitField[] {
  switch (kind) {
    case 'magnitude':
      return ['maxLossPercent', 'maxGainPercent'];
    case 'position':
      return ['maxShift'];
    case 'angle':
      return ['maxRotation'];
    default:
      return [];
  }
}
