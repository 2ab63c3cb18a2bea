/**
 * The comparison of two sections, a baseline and a proposal (the section as the fabricator
 * proposes to cut it): every catalogue property with the critical-fibre moduli, each with both
 * values, the change and the change in per cent; the centroid shift; and the rotation of the
 * principal axes. Plain data in (two SectionProperties), plain records out, so the panel, the
 * report and the CLI show the same rows.
 */
import type { PropertyInfo } from '../properties/catalog';
import type { SectionProperties } from '../properties/section';
import { centroidShift, principalAxesRotation, type AxesRotation, type CentroidShift } from './axes-change';
import { comparisonCatalog } from './critical-fibre';
import { propertyChange, type PropertyChange } from './property-change';

export interface SectionComparison {
  rows: PropertyChange[];
  centroidShift: CentroidShift;
  rotation: AxesRotation;
  /** The baseline's size (largest side of its extent): the scale of round-off in lengths. */
  extent: number;
}

export function compareSections(base: SectionProperties, proposal: SectionProperties, catalog: readonly PropertyInfo[] = comparisonCatalog()): SectionComparison {
  return {
    rows: catalog.map((info) => propertyChange(info, base, proposal)),
    centroidShift: centroidShift(base, proposal),
    rotation: principalAxesRotation(base, proposal),
    extent: Math.max(base.bounds.xmax - base.bounds.xmin, base.bounds.ymax - base.bounds.ymin),
  };
}

/** The row of one property by its key, or undefined. */
export function comparisonRow(c: SectionComparison, key: string): PropertyChange | undefined {
  return c.rows.find((r) => r.key === key);
}
