/**
 * The section that stresses, the kern and the plastic moment are worked on: the evaluated section
 * of several materials when the document has materials, else the whole section taken as one
 * material with n = 1. With one material the transformed section is the geometric one, number for
 * number (mixedSection does the same arithmetic as sectionProperties), so stresses under load work
 * on any section, with or without materials.
 */
import type { SectionDocument } from '../document/types';
import type { Region } from '../geometry/contour';
import type { MaterialsResult } from '../evaluate';
import { MaterialError, type Material } from '../materials/material';
import { mixedSection, type MixedSection } from '../materials/mixed';
import { SectionError, type SectionProperties } from '../properties/section';

/** Id of the one material a section without materials is taken to be made of. */
export const ONE_MATERIAL_ID = 'section';

/**
 * The stand-in material of a section without materials: E = 1 (only ratios matter), no density
 * (no mass and no centre of gravity are claimed), and no strength (so no stress is ever reported
 * as beyond it; the largest finite number stands for "none").
 */
export const ONE_MATERIAL: Material = Object.freeze({ id: ONE_MATERIAL_ID, name: 'Section (one material)', E: 1, density: 0, fy: Number.MAX_VALUE });

export interface StressSection {
  section: MixedSection | null;
  /** True when the document has no materials and the section stands for one material. */
  oneMaterial: boolean;
  /** Why there is no section (empty, no area, a material problem); null when there is one. */
  message: string | null;
}

/** What the evaluation gives that this needs (an Evaluation fits). */
export interface EvaluatedSection {
  region: Region;
  props: SectionProperties | null;
  message: string | null;
  materials: MaterialsResult | null;
}

export function stressSection(doc: Pick<SectionDocument, 'units' | 'materials'>, ev: EvaluatedSection): StressSection {
  if (!ev.props) return { section: null, oneMaterial: !doc.materials?.length, message: ev.message ?? 'The section has no area.' };
  if (doc.materials?.length) {
    const m = ev.materials;
    if (!m) return { section: null, oneMaterial: false, message: 'The materials have not been evaluated.' };
    return { section: m.section, oneMaterial: false, message: m.section ? null : (m.message ?? 'The section of several materials could not be computed.') };
  }
  try {
    return { section: mixedSection([{ material: ONE_MATERIAL, region: ev.region }], ONE_MATERIAL, doc.units), oneMaterial: true, message: null };
  } catch (e) {
    if (!(e instanceof SectionError) && !(e instanceof MaterialError)) throw e;
    return { section: null, oneMaterial: true, message: e.message };
  }
}

/** All the parts' contours as one list: the outline whose convex hull the kern is built on. */
export function sectionContours(section: MixedSection): Region {
  return section.parts.flatMap((p) => p.region);
}
