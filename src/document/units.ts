/** Unit conversion of whole documents: every length is scaled; angles and flags are kept. */
import { scaleShape } from '../shapes/ops';
import { UNIT_IN_METRES, type SectionDocument, type Units } from './types';

/** Factor that converts a length in `from` units to `to` units. */
export function unitFactor(from: Units, to: Units): number {
  return from === to ? 1 : UNIT_IN_METRES[from] / UNIT_IN_METRES[to];
}

/** The same section expressed in other units (a new document; the input is not changed). */
export function convertDocumentUnits(doc: SectionDocument, units: Units): SectionDocument {
  const k = unitFactor(doc.units, units);
  if (k === 1) return { ...doc, units };
  return { ...doc, units, shapes: doc.shapes.map((s) => scaleShape(s, k)) };
}
