/**
 * The plastic neutral axes and plastic moments of a section of several materials, each at its own
 * fy (src/materials/plastic.ts), with the moments brought to the unit loads are entered in
 * (force × moment length, e.g. kN·m), so they read beside Mx and My.
 */
import { MaterialError } from '../materials/material';
import type { MixedSection } from '../materials/mixed';
import { compositePlastic, PLASTIC_CAUTION } from '../materials/plastic';
import { momentUnitText, resistanceMomentFactor, type LoadUnits } from '../materials/units';
import { SectionError } from '../properties/section';

export interface PlasticResult {
  /** Bending about a horizontal axis: the axis at y = at, Mp in force × moment length. */
  x: { at: number; Mp: number };
  /** Bending about a vertical axis: the axis at x = at. */
  y: { at: number; Mp: number };
  /** Unit of Mp, e.g. 'kN·m'. */
  unit: string;
  caution: string;
}

export function plasticOfSection(section: MixedSection, units: LoadUnits): { plastic: PlasticResult; message: null } | { plastic: null; message: string } {
  try {
    const p = compositePlastic(section.parts.map((q) => ({ material: q.material, region: q.region })));
    const k = resistanceMomentFactor(units);
    return { plastic: { x: { at: p.x.at, Mp: p.x.Mp * k }, y: { at: p.y.at, Mp: p.y.Mp * k }, unit: momentUnitText(units), caution: PLASTIC_CAUTION }, message: null };
  } catch (e) {
    if (!(e instanceof SectionError) && !(e instanceof MaterialError)) throw e;
    return { plastic: null, message: e.message };
  }
}
