/**
 * The wording of each caution: one function per kind, each naming the shape and the place and
 * giving the numbers with their source. The analysis (analyse.ts) finds the features; this file
 * only words them, so the panel, the report and the CLI read the same sentences.
 */
import type { SharpCorner, RadiusedCorner } from './corners';
import type { HoleCheck } from './hole-checks';
import type { HoleRuleSet } from './hole-rules';
import type { Ligament } from './ligaments';
import type { PartGap, SectionPart } from './parts';
import { lengthText, pointText, shapeText } from './place';
import type { Caution, ShapeRef } from './types';

export interface Wording {
  units: string;
  /** Coordinates smaller than scale·1e-12 print as 0. */
  scale: number;
}

const of = (s: ShapeRef | null) => (s ? ` of ${shapeText(s)}` : '');
const deg = (v: number) => `${+v.toFixed(1)}°`;

/** Fabrication practice for inside corners of cuts. */
export const REENTRANT_SOURCE = 'AISC 360-16, Section M2.2: re-entrant corners of cuts are formed with a curved transition (from memory)';

export function sharpCornerCaution(c: SharpCorner, shape: ShapeRef | null, w: Wording): Caution {
  return {
    kind: 're-entrant-corner',
    severity: 'warning',
    message:
      `Sharp inside corner at ${pointText(c.x, c.y, w.scale)}${of(shape)}: no radius (material angle ${deg(c.materialAngle)}). ` +
      'A sharp re-entrant corner concentrates stress and starts cracks; fabrication practice asks for a radius there.',
    at: { x: c.x, y: c.y },
    shape,
    source: REENTRANT_SOURCE,
    values: { materialAngle: c.materialAngle },
  };
}

/** Built-up sections: the parts act as one only through their connection. */
export const JOINT_SOURCE = 'Gere & Goodno, Mechanics of Materials, built-up beams and shear flow f = VQ/I (from memory)';

/**
 * An inside corner where two added shapes meet is a joint between parts (a weld or a contact),
 * not a cut: the corner rule for cuts does not apply, but the properties hold only when the parts
 * are connected to act together. One note per pair of parts, at the first corner they share.
 */
export function jointCaution(c: SharpCorner, a: ShapeRef, b: ShapeRef, w: Wording): Caution {
  return {
    kind: 'joint',
    severity: 'note',
    message:
      `${shapeText(a)} and ${shapeText(b)} meet at ${pointText(c.x, c.y, w.scale)} and are taken as one piece: ` +
      'the properties hold only when the joint between them (welds or fasteners) carries the shear flow along it.',
    at: { x: c.x, y: c.y },
    shape: a,
    source: JOINT_SOURCE,
  };
}

export function radiusedCornerCaution(c: RadiusedCorner, shape: ShapeRef | null, w: Wording): Caution {
  return {
    kind: 'radiused-corner',
    severity: 'note',
    message: `Inside corner at ${pointText(c.x, c.y, w.scale)}${of(shape)} is radiused: r = ${lengthText(c.radius, w.units)}.`,
    at: { x: c.x, y: c.y },
    shape,
    source: REENTRANT_SOURCE,
    values: { radius: c.radius },
  };
}

export function separatePartsCaution(parts: readonly SectionPart[], gap: PartGap, shape: ShapeRef | null, w: Wording, baselineParts: number | null): Caution {
  const a = parts[gap.a], b = parts[gap.b];
  const was = baselineParts === null ? '' : ` (the baseline has ${baselineParts})`;
  const where = shape ? `, where ${shapeText(shape)} cuts through` : '';
  return {
    kind: 'separate-parts',
    severity: 'warning',
    message:
      `The section falls into ${parts.length} separate parts${was}. Parts of area ${lengthText(a.area, w.units ? `${w.units}²` : '')} and ` +
      `${lengthText(b.area, w.units ? `${w.units}²` : '')} come closest at ${pointText(gap.at.x, gap.at.y, w.scale)}${where} ` +
      `(gap ${lengthText(gap.pair.d, w.units)}). They act as one section only if they are tied together elsewhere along the member; ` +
      'the properties shown assume they act together.',
    at: gap.at,
    shape,
    values: { parts: parts.length, gap: gap.pair.d },
  };
}

export function holeEdgeCaution(h: HoleCheck, rules: HoleRuleSet, shape: ShapeRef | null, w: Wording): Caution | null {
  const e = h.edge;
  if (!e || e.ok) return null;
  return {
    kind: 'hole-edge-distance',
    severity: 'warning',
    message:
      `Hole Ø${lengthText(h.d0, w.units)}${of(shape)} at ${pointText(h.centre.x, h.centre.y, w.scale)}: centre ${lengthText(e.centreDistance, w.units)} ` +
      `(${+(e.centreDistance / h.d0).toFixed(3)} d0) from the nearest free edge, clear ${lengthText(e.clearDistance, w.units)}; ` +
      `${rules.name} asks for at least ${lengthText(e.required.value, w.units)} (${e.required.basis}; ${e.required.clause}). Geometry check only.`,
    at: { x: (h.centre.x + e.nearest.x) / 2, y: (h.centre.y + e.nearest.y) / 2 },
    shape,
    source: e.required.clause,
    values: { d0: h.d0, centreDistance: e.centreDistance, clearDistance: e.clearDistance, required: e.required.value },
  };
}

export function holeSpacingCaution(h: HoleCheck, rules: HoleRuleSet, shape: ShapeRef | null, w: Wording): Caution | null {
  const s = h.spacing;
  if (!s || (s.ok && s.ok2)) return null;
  const second = s.other2 ? `; ${s.other2.basis}: ${lengthText(s.other2.value, w.units)} (${s.other2.clause})` : '';
  const what = s.ok
    ? `meets ${s.required.basis} (${lengthText(s.required.value, w.units)}) but not the other spacing${second}`
    : `${rules.name} asks for at least ${lengthText(s.required.value, w.units)} (${s.required.basis}; ${s.required.clause})${second}`;
  return {
    kind: 'hole-spacing',
    severity: s.ok ? 'note' : 'warning',
    message:
      `Hole Ø${lengthText(h.d0, w.units)}${of(shape)} at ${pointText(h.centre.x, h.centre.y, w.scale)}: centres ${lengthText(s.centreDistance, w.units)} ` +
      `from the hole at ${pointText(s.other.x, s.other.y, w.scale)}, clear ${lengthText(s.clearDistance, w.units)}; ${what}. Geometry check only.`,
    at: { x: (h.centre.x + s.other.x) / 2, y: (h.centre.y + s.other.y) / 2 },
    shape,
    source: s.required.clause,
    values: { d0: h.d0, centreDistance: s.centreDistance, clearDistance: s.clearDistance, required: s.required.value },
  };
}

export function ligamentCaution(l: Ligament, size: number, ratio: number, thin: boolean, shape: ShapeRef | null, w: Wording): Caution {
  const next = shape ? shapeText(shape) : 'the cutout';
  const where = `between ${pointText(l.from.x, l.from.y, w.scale)} and ${pointText(l.to.x, l.to.y, w.scale)}`;
  const rule = `${ratio} × the cutout's size ${lengthText(size, w.units)} (Kern's screening ratio, no published source)`;
  return {
    kind: thin ? 'thin-ligament' : 'ligament',
    severity: thin ? 'warning' : 'note',
    message: thin
      ? `Thin ligament next to ${next}: only ${lengthText(l.width, w.units)} of material remains ${where}, less than ${rule}.`
      : `Narrowest material next to ${next}: ${lengthText(l.width, w.units)} ${where} (not less than ${rule}).`,
    at: l.at,
    shape,
    values: { width: l.width, size, ratio },
  };
}
