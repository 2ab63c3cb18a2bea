/**
 * The standing cautions that go with every cutout check (panel, report, CLI), beside the general
 * caution of src/report/caution.ts: one wording, shared.
 */

/** The verdict and the cautions screen the geometry; they are not a design check. */
export const CUTOUT_CAUTION_TEXT =
  'The comparison, the limits and the cautions are a geometric screen, not a design check. ' +
  'Whether the cutout is acceptable depends on the loads, the material, the connections and the applicable code, ' +
  'and must be decided by a qualified engineer.';

/** The same for a section on its own (no proposal to compare). */
export const SECTION_CAUTION_TEXT =
  'The cautions are a geometric screen of the section as drawn, not a design check: ' +
  'corners, joints, holes and ligaments are flagged for a qualified engineer to judge.';

/** Hole distances are checked as geometry only. */
export const HOLE_CHECK_NOTE =
  'Hole edge distances and spacings are geometry checks only: the bolt, the load direction, the plate thickness, ' +
  'the maximum distances and the bearing rules are not checked.';
