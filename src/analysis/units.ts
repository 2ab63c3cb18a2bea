/**
 * The units of a document's materials and loads, read from the document once (src/materials/
 * units.ts holds the model): lengths in the document's unit, E, fy and stresses in `stressUnit`
 * (MPa when absent), N and V in `forceUnit` (kN when absent), moments in force × `momentLength`
 * (the document's length unit when absent).
 */
import type { SectionDocument } from '../document/types';
import { DEFAULT_FORCE_UNIT, DEFAULT_STRESS_UNIT, momentUnitText, type LoadUnits } from '../materials/units';

export type UnitFields = Pick<SectionDocument, 'units' | 'stressUnit' | 'forceUnit' | 'momentLength'>;

export function documentLoadUnits(doc: UnitFields): LoadUnits {
  return {
    length: doc.units,
    force: doc.forceUnit ?? DEFAULT_FORCE_UNIT,
    stress: doc.stressUnit ?? DEFAULT_STRESS_UNIT,
    ...(doc.momentLength !== undefined ? { momentLength: doc.momentLength } : {}),
  };
}

/** The texts shown beside each quantity: 'MPa', 'kN', 'kN·m'. */
export function loadUnitTexts(doc: UnitFields): { stress: string; force: string; moment: string } {
  const u = documentLoadUnits(doc);
  return { stress: u.stress, force: u.force, moment: momentUnitText(u) };
}
