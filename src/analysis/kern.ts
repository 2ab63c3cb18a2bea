/**
 * The kern of a section of one or several materials: the region of load points where a
 * compressive axial force causes no tension anywhere. It is built on the convex hull of every
 * material together, with the transformed section's centroid and moments (src/kern/kern.ts), since
 * σ/n is one linear function over the whole section.
 */
import { sectionKern, type KernPoint } from '../kern/kern';
import type { MixedSection } from '../materials/mixed';
import { SectionError } from '../properties/section';
import { sectionContours } from './stress-section';

export type KernResult = { points: KernPoint[]; message: null } | { points: null; message: string };

export function kernOfSection(section: MixedSection): KernResult {
  try {
    return { points: sectionKern(sectionContours(section), section.transformed), message: null };
  } catch (e) {
    if (!(e instanceof SectionError)) throw e;
    return { points: null, message: e.message };
  }
}
