/**
 * What a proposal changes in the material itself: the material removed (in the baseline, not in
 * the proposal: baseline − proposal) and the material added (proposal − baseline), as exact
 * regions from the boolean module, so their moments add up exactly:
 *   proposal = baseline − removed + added   (every moment: area, first and second moments).
 * The canvas shades them, the report draws them, and their areas are listed beside the comparison.
 */
import { booleanRegions } from '../boolean';
import type { Region } from '../geometry/contour';
import { regionMoments } from '../moments/kernel';

export interface MaterialChange {
  /** Baseline minus proposal: what the cut takes away. */
  removed: Region;
  /** Proposal minus baseline: what the proposal adds (a plate, a filled hole). */
  added: Region;
  /** Their areas (0 when empty). */
  removedArea: number;
  addedArea: number;
}

function area(r: Region): number {
  return r.length ? Math.abs(regionMoments(r).m00) : 0;
}

/** The exact material removed and added between a baseline region and a proposal region. */
export function materialChange(baseline: Region, proposal: Region): MaterialChange {
  const removed = baseline.length === 0 ? [] : proposal.length === 0 ? baseline : booleanRegions(baseline, [proposal], 'difference');
  const added = proposal.length === 0 ? [] : baseline.length === 0 ? proposal : booleanRegions(proposal, [baseline], 'difference');
  return { removed, added, removedArea: area(removed), addedArea: area(added) };
}
