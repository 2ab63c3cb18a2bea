/** The report's list of input shapes: kind, operation, dimensions and placement, as plain text. */
import type { Shape } from '../document/types';
import { formatNumber } from '../properties/catalog';
import { kindOf } from '../shapes/registry';

const OP_TEXT = { add: 'add', subtract: 'subtract', intersect: 'intersect' } as const;

export function shapeKind(s: Shape): string {
  return kindOf(s).label;
}

export function shapeOperation(s: Shape): string {
  return OP_TEXT[s.op ?? 'add'] ?? String(s.op);
}

/** Dimensions and placement of one shape, in document units (the caller states the units). */
export function shapeDimensions(s: Shape): string {
  return kindOf(s).describe(s, (v) => formatNumber(v));
}
