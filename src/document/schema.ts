/**
 * JSON Schemas (draft 2020-12) of the section document, one per format version, built from the
 * same tables the validator uses (units, operations, shape kinds, profile fields, property keys),
 * so the schema and Kern cannot drift apart unnoticed. They are for editors and other tools:
 * completion, hover text and early red underlines while a document is written by hand. Kern's own
 * validation (validate.ts) stays the authority and says more (a path that does not close, a root
 * radius too large for its flange, an unknown proposal); the schema never refuses what Kern reads,
 * except that it flags fields Kern does not know (Kern ignores them), which catches misspellings.
 *
 * `public/kern-section.schema.json` (version 2) and `public/kern-section.v1.schema.json` are this
 * module's output, written by `npm run -s cli -- schema [--version 1]` (tests/schema.test.ts keeps
 * them equal). Each object below is keyed by the record type's own keys, so adding a field to a
 * record without describing it here fails to compile.
 */
import { comparisonCatalog } from '../compare/critical-fibre';
import { CENTROID_KEY } from '../compare/limit-fields';
import type { Limit } from '../compare/limits';
import type { Material } from '../materials/material';
import type { Loads } from '../materials/stress';
import { FORCE_UNITS, STRESS_UNITS } from '../materials/units';
import { OPS } from '../shapes/base';
import type { CircleShape } from '../shapes/circle';
import type { LineShape } from '../shapes/line';
import type { PathSegment, PathShape } from '../shapes/path';
import type { PolygonShape } from '../shapes/polygon';
import { PROFILE_TYPES } from '../shapes/profile';
import { PROFILE_FIELDS, type ProfileField } from '../shapes/profile/fields';
import type { ProfileType } from '../shapes/profile/types';
import { STRIP_CORNERS, type StripShape } from '../shapes/strip';
import { FORMAT, UNITS, type Revision, type SectionDocument, type TitleBlock, type Variant } from './types';
import type { WeldLoad as WeldLoadCase } from './weld-loads';
import type { NetLine } from './net-lines';
import { TORSION_DENSITIES } from './torsion-settings';

/** A JSON Schema as plain data. */
export type JsonSchema = { [keyword: string]: unknown };

/** The format versions that have a schema. */
export const SCHEMA_VERSIONS = [1, 2] as const;
export type SchemaVersion = (typeof SCHEMA_VERSIONS)[number];

/** File names of the published schemas (in public/). */
export const SCHEMA_FILE: Record<SchemaVersion, string> = { 1: 'kern-section.v1.schema.json', 2: 'kern-section.schema.json' };

const text = (description: string): JsonSchema => ({ type: 'string', description });
const ref = (name: string): JsonSchema => ({ $ref: `#/$defs/${name}` });
const list = (items: JsonSchema, description: string, minItems?: number): JsonSchema => ({ type: 'array', description, items, ...(minItems ? { minItems } : {}) });
const positive = (description: string): JsonSchema => ({ type: 'number', exclusiveMinimum: 0, description });

function object(properties: Record<string, JsonSchema>, required: string[], description?: string): JsonSchema {
  return { type: 'object', ...(description ? { description } : {}), required, properties, additionalProperties: false };
}

/** The fields every shape has; `material` arrived with version 2. */
function base(version: SchemaVersion, opDescription = 'How the shape combines with the section built so far (default add).'): Record<string, JsonSchema> {
  const out: Record<string, JsonSchema> = {
    id: { type: 'string', pattern: '\\S', description: 'Stable id, unique in the document. May be left out: Kern assigns one when it reads the file and keeps it on save.' },
    name: text('Label shown in lists and the report.'),
    op: { enum: [...OPS], description: opDescription },
  };
  if (version >= 2) out.material = { type: 'string', pattern: '\\S', description: 'Id of one of the document’s materials; the reference material when absent.' };
  return out;
}

function shape(version: SchemaVersion, type: string, description: string, fields: Record<string, JsonSchema>, required: string[], baseFields = base(version)): JsonSchema {
  return object({ type: { const: type }, ...baseFields, ...fields }, ['type', ...required], description);
}

function segmentsSchema(description: string): JsonSchema {
  const seg: Record<keyof PathSegment, JsonSchema> = {
    to: { ...ref('point'), description: 'End point of the segment.' },
    via: { ...ref('point'), description: 'A point the arc passes through; absent for a straight line.' },
  };
  return list(object(seg, ['to'], 'A straight line {to}, or the circular arc {to, via} from the current point through via to to.'), description, 1);
}

function polygonSchema(v: SchemaVersion): JsonSchema {
  const f: Omit<Record<keyof PolygonShape, JsonSchema>, 'type' | 'id' | 'name' | 'op' | 'material'> = {
    points: list(ref('point'), 'Corner points in order; the outline closes back to the first. A self-crossing outline is resolved by the even-odd rule.', 3),
  };
  return shape(v, 'polygon', 'A closed polygon given by its corners.', f, ['points']);
}

function circleSchema(v: SchemaVersion): JsonSchema {
  const f: Omit<Record<keyof CircleShape, JsonSchema>, 'type' | 'id' | 'name' | 'op' | 'material'> = {
    center: { ...ref('point'), description: 'Centre [x, y].' },
    radius: positive('Radius (greater than 0).'),
  };
  return shape(v, 'circle', 'A circle by centre and radius.', f, ['center', 'radius']);
}

function pathSchema(v: SchemaVersion): JsonSchema {
  const f: Omit<Record<keyof PathShape, JsonSchema>, 'type' | 'id' | 'name' | 'op' | 'material'> = {
    start: { ...ref('point'), description: 'First point.' },
    segments: segmentsSchema('Lines and three-point arcs; the last segment ends on the start.'),
  };
  return shape(v, 'path', 'A closed outline of straight lines and circular arcs.', f, ['start', 'segments']);
}

function lineSchema(v: SchemaVersion): JsonSchema {
  const f: Omit<Record<keyof LineShape, JsonSchema>, 'type' | 'id' | 'name' | 'op' | 'material'> = {
    start: { ...ref('point'), description: 'First point.' },
    segments: segmentsSchema('Lines and three-point arcs of the open chain.'),
    group: { type: 'string', pattern: '\\S', description: 'The line group it belongs to (a weld group); "Lines" when absent.' },
  };
  const b = { ...base(v), op: { const: 'add', description: 'A line element encloses no area and takes no operation.' } };
  return shape(v, 'line', 'A line element: an open chain of lines and arcs (a weld line per unit throat). It encloses no area.', f, ['start', 'segments'], b);
}

function stripSchema(v: SchemaVersion): JsonSchema {
  const f: Omit<Record<keyof StripShape, JsonSchema>, 'type' | 'id' | 'name' | 'op' | 'material'> = {
    start: { ...ref('point'), description: 'First point of the centreline.' },
    segments: segmentsSchema('Lines and three-point arcs of the centreline (open).'),
    thickness: positive('Wall thickness, centred on the centreline.'),
    corners: { enum: [...STRIP_CORNERS], description: 'How outside corners close: mitre (default) or round.' },
  };
  return shape(v, 'strip', 'A thin wall drawn by its centreline and a thickness.', f, ['start', 'segments', 'thickness']);
}

const PROFILE_DESCRIPTION: Record<ProfileType, string> = {
  rectangle: 'Rectangle; local origin at the bottom-left corner.',
  'i-beam': 'Doubly symmetric I section; local origin at the bottom-left of its bounding box.',
  channel: 'Channel, web on the left; local origin at the bottom-left.',
  angle: 'Angle, vertical leg on the left, horizontal leg at the bottom; local origin at the heel.',
  tee: 'Tee, flange on top; local origin at the bottom-left of its bounding box.',
  'rect-tube': 'Rectangular hollow section; inside corner radius = max(outside radius − wall, 0).',
  'round-tube': 'Circular hollow section; local origin at the centre.',
  'bent-plate': 'Plate bent through 90°, legs measured to the outside faces; local origin where the outside faces meet.',
};

function profileSchema(v: SchemaVersion, type: ProfileType): JsonSchema {
  const fields = PROFILE_FIELDS[type] as readonly ProfileField<ProfileType>[];
  const dims: Record<string, JsonSchema> = {};
  for (const f of fields) {
    dims[f.key] = f.allowZero
      ? { type: 'number', minimum: 0, description: `${f.label} (0 for a sharp corner).` }
      : positive(`${f.label} (greater than 0).`);
  }
  const placement: Record<string, JsonSchema> = {
    at: { ...ref('point'), description: 'Where the local origin is placed.' },
    rotation: { type: 'number', description: 'Turn in degrees, counter-clockwise about the local origin.' },
    mirror: { type: 'boolean', description: 'Mirrored about the local y axis before turning.' },
  };
  return shape(v, type, PROFILE_DESCRIPTION[type], { ...dims, ...placement }, ['at', ...fields.filter((f) => !f.optional).map((f) => f.key)]);
}

function shapeKinds(v: SchemaVersion): Record<string, JsonSchema> {
  const kinds: Record<string, JsonSchema> = { polygon: polygonSchema(v), circle: circleSchema(v), path: pathSchema(v) };
  for (const t of PROFILE_TYPES) kinds[t] = profileSchema(v, t);
  if (v >= 2) {
    kinds.strip = stripSchema(v);
    kinds.line = lineSchema(v);
  }
  return kinds;
}

function titleSchema(): JsonSchema {
  const f: Record<keyof TitleBlock, JsonSchema> = {
    project: text('Project.'),
    section: text('What the section is (member, location).'),
    author: text('Who drew it.'),
    checker: text('Who checks it.'),
    date: text('Date, as written on the drawing.'),
    revision: text('Revision mark.'),
  };
  return { type: 'object', description: 'The report’s title block. Every field is text; other text fields are kept too.', properties: f, additionalProperties: { type: 'string' } };
}

function v2Defs(): Record<string, JsonSchema> {
  const variant: Record<keyof Variant, JsonSchema> = {
    name: { type: 'string', pattern: '\\S', description: 'Name of the proposal, unique in the document.' },
    shapes: list({ oneOf: [{ type: 'string', pattern: '\\S', description: 'Id of a baseline shape, kept as it is.' }, ref('shape')] }, 'The whole section of the proposal in order: baseline ids, and new or edited shapes in full.'),
    note: text('What the proposal is (a fabricator’s request, a cope, extra holes).'),
  };
  const limit: Record<keyof Limit, JsonSchema> = {
    property: { enum: [...comparisonCatalog().map((p) => p.key), CENTROID_KEY], description: 'A property key as in `props --json`, or "centroid".' },
    maxLossPercent: { type: 'number', minimum: 0, maximum: 100, description: 'Largest allowed loss, in per cent of the baseline value.' },
    maxGainPercent: { type: 'number', minimum: 0, description: 'Largest allowed gain, in per cent of the baseline value.' },
    maxShift: { type: 'number', minimum: 0, description: 'Largest allowed shift of the centroid or a coordinate, in the document’s length unit.' },
    maxRotation: { type: 'number', minimum: 0, maximum: 90, description: 'Largest allowed turn of the principal axes, in degrees.' },
  };
  const material: Record<keyof Material, JsonSchema> = {
    id: { type: 'string', pattern: '\\S', description: 'Key that shapes name in `material` and the document in `reference`.' },
    name: text('Label shown in the panel and the report.'),
    E: positive('Modulus of elasticity, in the document’s stress unit.'),
    density: { type: 'number', minimum: 0, description: 'Mass density in kg/m³.' },
    fy: positive('Strength for the plastic moment, in the document’s stress unit.'),
    nu: { type: 'number', minimum: 0, exclusiveMaximum: 0.5, description: 'Poisson’s ratio (for information).' },
  };
  const loads: Record<keyof Loads, JsonSchema> = {
    N: { type: 'number', description: 'Axial force, tension positive, in the force unit.' },
    Mx: { type: 'number', description: 'Moment about the centroidal x axis, in force × moment length.' },
    My: { type: 'number', description: 'Moment about the centroidal y axis, in force × moment length.' },
    V: { type: 'number', description: 'Shear force for the cut, in the force unit.' },
  };
  const weldLoad: Record<keyof WeldLoadCase, JsonSchema> = {
    group: { type: 'string', pattern: '\\S', description: 'The line group the force acts on.' },
    at: { ...ref('point'), description: 'Where the force acts.' },
    Fx: { type: 'number', description: 'Force along x, in the force unit.' },
    Fy: { type: 'number', description: 'Force along y, in the force unit.' },
    M: { type: 'number', description: 'Added moment, counter-clockwise positive, in force × moment length.' },
    name: text('What the load is.'),
  };
  const netLine: Record<keyof NetLine, JsonSchema> = {
    from: { ...ref('point'), description: 'One end of the line.' },
    to: { ...ref('point'), description: 'The other end.' },
    name: text('A label, e.g. "Row A".'),
  };
  const revision: Record<keyof Revision, JsonSchema> = {
    revision: text('Revision mark.'),
    date: text('Date.'),
    description: text('What changed.'),
    by: text('Who changed it.'),
  };
  return {
    variant: object(variant, ['name', 'shapes'], 'A proposal: a named variant of the section.'),
    limit: { ...object(limit, ['property'], 'An allowed change from the baseline to a proposal.'), minProperties: 2 },
    material: object(material, ['id', 'name', 'E', 'density', 'fy'], 'A material.'),
    loads: object(loads, [], 'Loads on the section; units are set by forceUnit and momentLength.'),
    revision: object(revision, ['revision', 'date', 'description', 'by'], 'One line of the revision history.'),
    checked: object({ by: text('Who checked the section.'), date: text('When.') }, ['by', 'date'], 'The checker’s sign-off.'),
    weldLoad: object(weldLoad, ['group', 'at', 'Fx', 'Fy'], 'A force on a line group (a weld group), for the elastic weld-group method.'),
    netLine: object(netLine, ['from', 'to'], 'A straight line across the section for the net length.'),
  };
}

type DocumentKeys = Record<keyof SectionDocument | '$schema', JsonSchema>;

function documentProperties(v: SchemaVersion): Partial<DocumentKeys> {
  const common: Partial<DocumentKeys> = {
    $schema: text('The schema this file follows (for editors); Kern does not need it.'),
    format: { const: FORMAT },
    version: { const: v },
    units: { enum: [...UNITS], description: 'Length unit of every coordinate and dimension.' },
    shapes: list(ref('shape'), 'The baseline section: shapes applied in order to an empty region.'),
    name: text('The section’s name.'),
    title: ref('titleBlock'),
  };
  if (v === 1) return common;
  const all: DocumentKeys = {
    ...(common as Pick<DocumentKeys, '$schema' | 'format' | 'version' | 'units' | 'shapes' | 'name' | 'title'>),
    variants: list(ref('variant'), 'Proposals to compare with the baseline.'),
    activeVariant: { type: 'string', description: 'Name of the proposal being edited; the baseline when absent.' },
    limits: list(ref('limit'), 'Allowed changes from the baseline to a proposal.'),
    holeRules: { enum: ['en1993', 'aisc360'], description: 'Hole spacing and edge-distance rules for the cautions.' },
    materials: list(ref('material'), 'Materials; a shape names one by `material`, or takes the reference material.'),
    reference: { type: 'string', pattern: '\\S', description: 'Id of the reference material (n = 1) of the transformed section.' },
    stressUnit: { enum: [...STRESS_UNITS], description: 'Unit of E, fy and every stress (MPa when absent).' },
    forceUnit: { enum: [...FORCE_UNITS], description: 'Unit of N and V (kN when absent).' },
    momentLength: { enum: [...UNITS], description: 'Length unit of the moments Mx and My; the document’s unit when absent.' },
    loads: ref('loads'),
    revisions: list(ref('revision'), 'The revision history.'),
    notes: text('Notes for the checker.'),
    checked: ref('checked'),
    weldLoads: list(ref('weldLoad'), 'Forces on line groups (weld groups).'),
    netLines: list(ref('netLine'), 'Straight lines across the section for the net length through holes (tension checks).'),
    torsion: {
      type: 'object',
      description: 'When present, the results include J, the shear centre and Cw by finite elements, with these settings.',
      properties: {
        density: { enum: [...TORSION_DENSITIES], description: 'Mesh density; normal when absent.' },
        poisson: { type: 'number', minimum: 0, exclusiveMaximum: 0.5, description: 'Poisson’s ratio for the elastic shear centre; the reference material’s, else 0.3, when absent.' },
      },
      additionalProperties: false,
    },
  };
  return all;
}

/** The JSON Schema of one format version of the section document. */
export function sectionDocumentSchema(version: SchemaVersion = 2): JsonSchema {
  const kinds = shapeKinds(version);
  const defs: Record<string, JsonSchema> = {
    point: { type: 'array', description: 'A point [x, y] in the document’s units.', items: { type: 'number' }, minItems: 2, maxItems: 2 },
    shape: { description: 'One shape; `type` says which kind.', oneOf: Object.keys(kinds).map((k) => ref(`shape-${k}`)) },
    ...Object.fromEntries(Object.entries(kinds).map(([k, s]) => [`shape-${k}`, s])),
    titleBlock: titleSchema(),
    ...(version >= 2 ? v2Defs() : {}),
  };
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    $id: SCHEMA_FILE[version],
    title: `Kern section document, version ${version}`,
    description:
      version === 2
        ? 'A cross-section as Kern saves it: units, shapes applied in order, and optionally proposals, limits, materials, loads and the checker’s fields. Kern reads version 1 files too.'
        : 'A cross-section in the first version of the format: units and shapes applied in order. Kern reads it and saves it as version 2.',
    type: 'object',
    required: ['format', 'version', 'units', 'shapes'],
    properties: documentProperties(version),
    additionalProperties: false,
    $defs: defs,
  };
}

/** The schema as the published file holds it: two-space JSON and a final newline. */
export function sectionDocumentSchemaText(version: SchemaVersion = 2): string {
  return JSON.stringify(sectionDocumentSchema(version), null, 2) + '\n';
}
