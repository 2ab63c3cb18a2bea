/**
 * `kern cut` as a table for people: the same values as `cut --json`, through the one formatter
 * (significant figures, engineering form, zero within the section's size), and, where an edge
 * lies on the cut line, b just above and just below with the side Q/b uses, worded as the panel
 * and the report word it.
 */
import { cutWithSides, formatQuantity, sectionSize, unitText, type Region, type SectionProperties, type Units } from '../src';

/** The rows [label, value, unit] of a cut, for the CLI's table. */
export function cutRows(region: Region, props: SectionProperties, axis: 'x' | 'y', at: number, units: Units): [string, string, string][] {
  const size = sectionSize(props.bounds);
  const c = cutWithSides(region, axis, at, props);
  const q = (v: number, power: number) => formatQuantity(v, power, size);
  const [plus, minus] = axis === 'y' ? ['just above', 'just below'] : ['just right of', 'just left of'];
  const rows: [string, string, string][] = [];
  const jump = c.onEdge && c.widthAbove !== c.widthBelow;
  if (jump) {
    rows.push([`Cut width b ${plus} the cut`, q(c.widthAbove, 1), units]);
    rows.push([`Cut width b ${minus} the cut`, q(c.widthBelow, 1), units]);
  } else rows.push(['Cut width b', q(c.widthAbove, 1), units]);
  rows.push(['Area beyond the cut', q(c.area, 2), unitText(units, 2)]);
  rows.push(['Centroid of that part', c.centroid ? `(${q(c.centroid.x, 1)}, ${q(c.centroid.y, 1)})` : '—', units]);
  rows.push(['First moment Q about the centroidal axis', q(c.Q, 3), unitText(units, 3)]);
  const used = c.qbSide === 'above' ? plus : minus;
  rows.push([jump ? `Q/b, with b ${used} the cut (the smaller width)` : 'Q/b', ...(Number.isFinite(c.qOverB) ? [q(c.qOverB, 2), unitText(units, 2)] as const : ['— (b = 0)', ''] as const)]);
  return rows;
}
