/**
 * Unit conversion of whole documents: every length is scaled (the baseline's and the proposals'
 * shapes, length limits, moments given per document length); angles, flags, material values and
 * forces are kept.
 */
import { scaleShape } from '../shapes/ops';
import { UNIT_IN_METRES, type SectionDocument, type Units } from './types';
import { scaleNetLines } from './net-lines';

/** Factor that converts a length in `from` units to `to` units. */
export function unitFactor(from: Units, to: Units): number {
  return from === to ? 1 : UNIT_IN_METRES[from] / UNIT_IN_METRES[to];
}

/** The same section expressed in other units (a new document; the input is not changed). */
export function convertDocumentUnits(doc: SectionDocument, units: Units): SectionDocument {
  const k = unitFactor(doc.units, units);
  if (k === 1) return { ...doc, units };
  const out: SectionDocument = { ...doc, units, shapes: doc.shapes.map((s) => scaleShape(s, k)) };
  if (doc.variants) out.variants = doc.variants.map((v) => ({ ...v, shapes: v.shapes.map((e) => (typeof e === 'string' ? e : scaleShape(e, k))) }));
  if (doc.netLines) out.netLines = scaleNetLines(doc.netLines, k);
  if (doc.limits) out.limits = doc.limits.map((l) => (l.maxShift === undefined ? l : { ...l, maxShift: l.maxShift * k }));
  // Moments in force × document length follow the length unit; with `momentLength` set they keep theirs.
  if (doc.loads && doc.momentLength === undefined && (doc.loads.Mx !== undefined || doc.loads.My !== undefined)) {
    const { Mx, My } = doc.loads;
    out.loads = { ...doc.loads, ...(Mx !== undefined ? { Mx: Mx * k } : {}), ...(My !== undefined ? { My: My * k } : {}) };
  }
  // Weld loads: the point where the force acts is a length; the moment follows as the loads' do.
  if (doc.weldLoads) {
    const mk = doc.momentLength === undefined ? k : 1;
    out.weldLoads = doc.weldLoads.map((w) => ({ ...w, at: [w.at[0] * k, w.at[1] * k], ...(w.M !== undefined ? { M: w.M * mk } : {}) }));
  }
  return out;
}
