/** The report's list of input shapes: kind, operation, dimensions and placement, as plain text. */
import type { Shape, Units } from '../document/types';
import { PROFILE_FIELDS, type ProfileType } from '../document/profiles';
import { formatNumber } from '../properties/catalog';
import { SHAPE_KIND_LABEL } from '../document/labels';


const OP_TEXT = { add: 'add', subtract: 'subtract', intersect: 'intersect' } as const;

const n = (v: unknown) => (typeof v === 'number' ? formatNumber(v) : '?');
const pt = (p: unknown) => (Array.isArray(p) ? `(${n(p[0])}, ${n(p[1])})` : '?');

export function shapeKind(s: Shape): string {
  return SHAPE_KIND_LABEL[s.type] ?? String(s.type);
}

export function shapeOperation(s: Shape): string {
  return OP_TEXT[s.op ?? 'add'] ?? String(s.op);
}

/** Dimensions and placement of one shape, in document units (the caller states the units). */
export function shapeDimensions(s: Shape, _units: Units): string {
  switch (s.type) {
    case 'polygon': {
      const pts = s.points.map(pt);
      return `${s.points.length} corners: ${pts.length > 8 ? `${pts.slice(0, 6).join(', ')}, …` : pts.join(', ')}`;
    }
    case 'circle':
      return `centre ${pt(s.center)}, radius ${n(s.radius)}`;
    case 'path': {
      const arcs = s.segments.filter((g) => g.via).length;
      return `start ${pt(s.start)}, ${s.segments.length} segments (${s.segments.length - arcs} lines, ${arcs} arcs)`;
    }
    default: {
      const fields = PROFILE_FIELDS[s.type as ProfileType] as readonly { key: string; label: string }[];
      const rec = s as unknown as Record<string, unknown>;
      const dims = fields.filter((fl) => rec[fl.key] !== undefined).map((fl) => `${fl.label.toLowerCase()} ${n(rec[fl.key])}`);
      const place = [`at ${pt(s.at)}`];
      if (s.rotation) place.push(`rotated ${n(s.rotation)}°`);
      if (s.mirror) place.push('mirrored');
      return `${dims.join(', ')}; ${place.join(', ')}`;
    }
  }
}
