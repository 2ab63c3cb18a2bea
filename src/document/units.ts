/** Unit conversion of whole documents: every length is scaled; angles and flags are kept. */
import { UNIT_IN_METRES, type SectionDocument, type Shape, type Units } from './types';

const NOT_LENGTHS = new Set(['rotation']);

function scaleShape(s: Shape, k: number): Shape {
  const pt = (p: [number, number]): [number, number] => [p[0] * k, p[1] * k];
  switch (s.type) {
    case 'polygon':
      return { ...s, points: s.points.map(pt) };
    case 'circle':
      return { ...s, center: pt(s.center), radius: s.radius * k };
    case 'path':
      return { ...s, start: pt(s.start), segments: s.segments.map((g) => (g.via ? { to: pt(g.to), via: pt(g.via) } : { to: pt(g.to) })) };
    default: {
      const out: Record<string, unknown> = { ...s, at: pt(s.at) };
      for (const [key, v] of Object.entries(s)) if (typeof v === 'number' && !NOT_LENGTHS.has(key)) out[key] = v * k;
      return out as unknown as Shape;
    }
  }
}

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
