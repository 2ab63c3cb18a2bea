/**
 * The plastic neutral axes and plastic moments of a section of several materials, each at its own
 * fy (src/materials/plastic.ts), with the moments brought to the unit loads are entered in
 * (force × moment length, e.g. kN·m), so they read beside Mx and My.
 */
import { MaterialError } from '../materials/material';
import type { MixedSection } from '../materials/mixed';
import { compositePlastic, PLASTIC_CAUTION, type CompositePlastic } from '../materials/plastic';
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

export type PlasticOutcome = { plastic: PlasticResult; message: null } | { plastic: null; message: string };

/** The engine's plastic moments (stress unit × length³), or why there are none. */
export function rawPlastic(section: MixedSection): CompositePlastic | { message: string } {
  try {
    return compositePlastic(section.parts.map((q) => ({ material: q.material, region: q.region })));
  } catch (e) {
    if (!(e instanceof SectionError) && !(e instanceof MaterialError)) throw e;
    return { message: e.message };
  }
}

/** Raw plastic moments in the unit loads are entered in. */
export function plasticInLoadUnits(raw: CompositePlastic | { message: string }, units: LoadUnits): PlasticOutcome {
  if ('message' in raw) return { plastic: null, message: raw.message };
  const k = resistanceMomentFactor(units);
  return { plastic: { x: { at: raw.x.at, Mp: raw.x.Mp * k }, y: { at: raw.y.at, Mp: raw.y.Mp * k }, unit: momentUnitText(units), caution: PLASTIC_CAUTION }, message: null };
}

export function plasticOfSection(section: MixedSection, units: LoadUnits): PlasticOutcome {
  return plasticInLoadUnits(rawPlastic(section), units);
}
