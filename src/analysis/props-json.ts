/**
 * What `props --json` adds to the geometric properties: the kern of every section, and for a
 * document with materials the centre of gravity, the mass per length, the transformed section,
 * the results per material, the plastic moments (in force × moment length) and the cautions.
 * The geometric keys are untouched, so a document with one material gives today's numbers.
 */
import type { SectionDocument } from '../document/types';
import type { KernPoint } from '../kern/kern';
import { mixedPropsJson, type MixedPropsJson } from '../materials/json';
import { kernOfSection } from './kern';
import { plasticOfSection } from './plastic';
import { stressSection, type EvaluatedSection } from './stress-section';
import { documentLoadUnits } from './units';

export interface SectionExtrasJson {
  /** The kern boundary, CCW, as [x, y] points; null when the section has none. */
  kern: KernPoint[] | null;
  /** With materials: the units of E, fy and the transformed E. */
  stress_unit?: string;
  cg?: MixedPropsJson['cg'];
  mass_per_length?: number;
  transformed?: MixedPropsJson['transformed'];
  by_material?: MixedPropsJson['by_material'];
  plastic?: { unit: string; x: { axis_y: number; Mp: number }; y: { axis_x: number; Mp: number } } | null;
  cautions?: string[];
  /** With materials, when the section of several materials cannot be computed: why. */
  materials_message?: string;
}

export function sectionExtrasJson(doc: SectionDocument, ev: EvaluatedSection): SectionExtrasJson {
  const s = stressSection(doc, ev);
  const kern = s.section ? kernOfSection(s.section).points : null;
  if (s.oneMaterial) return { kern };
  if (!s.section) return { kern, materials_message: s.message ?? 'The section of several materials could not be computed.' };
  const units = documentLoadUnits(doc);
  const pl = plasticOfSection(s.section, units).plastic;
  const j = mixedPropsJson(s.section);
  return {
    kern,
    stress_unit: units.stress,
    cg: j.cg,
    mass_per_length: j.mass_per_length,
    transformed: j.transformed,
    by_material: j.by_material,
    plastic: pl && { unit: pl.unit, x: { axis_y: pl.x.at, Mp: pl.x.Mp }, y: { axis_x: pl.y.at, Mp: pl.y.Mp } },
    cautions: j.cautions,
  };
}
