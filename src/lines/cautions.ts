/**
 * The cautions shown with line-group, weld-group and thin-wall results (panel, CLI, report), one
 * wording each, next to the general caution of src/report/caution.ts.
 */

/** With every weld-group result. */
export const WELD_GROUP_CAUTION =
  'Weld forces by the elastic vector method only, with the weld treated as a line of unit throat. ' +
  'Weld strength, throat size, the directional strength rules and the choice of method are for the designer under the applicable code.';

/** With every line-group result. */
export const LINE_GROUP_CAUTION = 'Line properties are per unit thickness (per unit throat for welds): multiply by the thickness or throat to get section values.';

/** With every strip (thin wall from a centreline) result. */
export const THIN_WALL_CAUTION =
  'The thin-wall values multiply the centreline properties by the thickness; the exact values come from the drawn outline. ' +
  'Where the two differ by more than a few per cent the wall is not thin compared with its radii and lengths, and only the exact values apply.';
