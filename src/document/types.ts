/**
 * Section document, version 2: the JSON a user saves and other tools write (version 1 files are
 * read and migrated). Version 2 adds only optional fields to version 1: proposals (variants) and
 * their limits, materials and loads, and the checker's fields. A shape's id may be left out of a
 * file written by hand; it is assigned when the file is read and kept on save.
 */
export const FORMAT = 'kern-section';
export const CURRENT_VERSION = 2;

export { UNITS, UNIT_IN_METRES, type Units } from '../units';
import type { Units } from '../units';

export { OPS, type Op, type Point } from '../shapes/base';
export type { PolygonShape } from '../shapes/polygon';
export type { CircleShape } from '../shapes/circle';
export type { PathShape, PathSegment } from '../shapes/path';
export type { StripShape, StripCornerKind } from '../shapes/strip';
export type { LineShape } from '../shapes/line';
export type {
  ProfileShape,
  RectangleShape,
  IShape,
  ChannelShape,
  AngleShape,
  TeeShape,
  RectTubeShape,
  RoundTubeShape,
  BentPlateShape,
} from '../shapes/profile/types';
export type { Shape, ShapeType } from '../shapes/shape';
import type { Shape } from '../shapes/shape';

export interface TitleBlock {
  project?: string;
  section?: string;
  author?: string;
  checker?: string;
  date?: string;
  revision?: string;
}

/** One line of the revision history, as a checker reads it. */
export interface Revision {
  revision: string;
  date: string;
  description: string;
  by: string;
}

/**
 * A proposal: a named variant of the section. Its `shapes` list is the whole section in order;
 * a string names a baseline shape (unchanged, by its id), an object is a new shape or an edited
 * copy of a baseline shape (same id). A baseline shape the list does not mention is removed.
 */
export interface Variant {
  name: string;
  shapes: (string | Shape)[];
  /** Optional: what the proposal is (a fabricator's request, a cope, extra holes). */
  note?: string;
}

/**
 * An allowed change from the baseline to a proposal (see src/compare/limits.ts): `property` is a
 * property key as in `props --json` with `maxLossPercent`/`maxGainPercent` (of the baseline
 * value), `centroid` or a coordinate with `maxShift` (a length), or `theta` with `maxRotation`
 * (degrees).
 */
export type { Limit } from '../compare/limits';
import type { Limit } from '../compare/limits';

/** A material (src/materials/material.ts): E and fy in the document's stress unit, density in kg/m³. */
export type { Material } from '../materials/material';
/** Loads on the section (src/materials/stress.ts): N (+ tension) in the force unit, moments in force × `momentLength`. */
export type { Loads } from '../materials/stress';
import type { Material } from '../materials/material';
import type { Loads } from '../materials/stress';

export { STRESS_UNITS, FORCE_UNITS, type StressUnit, type ForceUnit } from '../materials/units';

/** A force on a line group (a weld group) for the elastic weld-group method (src/document/weld-loads.ts). */
export type { WeldLoad as WeldLoadCase } from './weld-loads';
import type { WeldLoad as WeldLoadCase } from './weld-loads';
import type { ForceUnit, StressUnit } from '../materials/units';

/** A straight line across the section for its net section (src/document/net-lines.ts). */
export type { NetLine } from './net-lines';
import type { NetLine } from './net-lines';
/** Torsion by finite elements in the results, with its mesh density and Poisson's ratio (src/document/torsion-settings.ts). */
export { TORSION_DENSITIES, type TorsionSettings, type TorsionDensitySetting } from './torsion-settings';
import type { TorsionSettings } from './torsion-settings';

export interface SectionDocument {
  format: typeof FORMAT;
  version: typeof CURRENT_VERSION;
  units: Units;
  /** The baseline section: shapes applied in order to an empty region. */
  shapes: Shape[];
  /** Optional: the section's name and the report's title block. */
  name?: string;
  title?: TitleBlock;
  /** Proposals to compare with the baseline, and the one being edited (none: the baseline). */
  variants?: Variant[];
  activeVariant?: string;
  /** Allowed changes from the baseline to a proposal. */
  limits?: Limit[];
  /** Hole spacing and edge-distance rules for the cautions. */
  holeRules?: 'en1993' | 'aisc360';
  /** Lines across the section whose net section the panel and the report give. */
  netLines?: NetLine[];
  /** Materials; a shape names one by `material`, or takes the reference material. */
  materials?: Material[];
  reference?: string;
  /** Unit of E, fy and every stress shown (MPa when absent). */
  stressUnit?: StressUnit;
  /** Unit of N and V (kN when absent). */
  forceUnit?: ForceUnit;
  /** Length unit of the moments Mx and My (force × this); the document's unit when absent. */
  momentLength?: Units;
  loads?: Loads;
  /** Forces on line groups (weld groups): force in `forceUnit`, moment in force × `momentLength`. */
  weldLoads?: WeldLoadCase[];
  /** When present, the results include J, the shear centre and Cw by finite elements, with these settings. */
  torsion?: TorsionSettings;
  /** The checker's fields. */
  revisions?: Revision[];
  notes?: string;
  checked?: { by: string; date: string };
}
