/**
 * The records every structural caution shares, so that the panel, the canvas markers, the report
 * and the CLI show the same thing: what kind, how serious, a message that names the shape and the
 * place, and the point where the canvas draws its marker.
 */
import type { Region } from '../geometry/contour';

export type CautionKind =
  | 're-entrant-corner'
  | 'radiused-corner'
  | 'joint'
  | 'separate-parts'
  | 'hole-edge-distance'
  | 'hole-spacing'
  | 'thin-ligament'
  | 'ligament';

/** warning: a checker should look at it; note: information that helps the check (a radius found). */
export type CautionSeverity = 'warning' | 'note';

export interface ShapeRef {
  id: string;
  name?: string;
}

export interface Caution {
  kind: CautionKind;
  severity: CautionSeverity;
  message: string;
  /** Where the canvas draws the marker, in document coordinates. */
  at: { x: number; y: number };
  /** The shape that made the feature, when the input shapes were given. */
  shape: ShapeRef | null;
  /** The published rule behind the numbers, when there is one. */
  source?: string;
  /** The measured and required numbers, by name (document units, degrees for angles). */
  values?: Record<string, number>;
}

/** One input shape as evaluated: its own exact region and how it combined. */
export interface InputShape {
  id: string;
  name?: string;
  op: 'add' | 'subtract' | 'intersect';
  region: Region;
}

/** Everything the cautions look at. Only `result` is required (the plain mode for one section). */
export interface CautionInput {
  /** The section being checked (the proposal, or the one section). */
  result: Region;
  /** The baseline: when given, only features that are new in `result` are flagged. */
  baseline?: Region;
  /** The input shapes of `result`, so that each caution names the shape that made it. */
  shapes?: readonly InputShape[];
}

export interface CautionOptions {
  /** Rule set for hole edge distances and spacing (default EN 1993-1-8). */
  rules?: 'en1993' | 'aisc360';
  /** Length of one document unit in metres (1e-3 for mm); AISC's tables are by bolt size. */
  unitInMetres?: number;
  /** Unit text for messages ('mm'); empty by default. */
  units?: string;
  /** Smallest turn (degrees) of the boundary at a vertex that counts as a sharp corner (default 10). */
  minCornerTurn?: number;
  /** A ligament is thin when narrower than this fraction of the cutout's size (default 0.5). */
  ligamentRatio?: number;
}
