/**
 * The profile catalogue: standard rolled I sections by their nominal dimensions, as `i-beam`
 * profile records the editor, the CLI and the report already understand.
 *
 * Look-up forgives spacing, case and the usual ways of writing a size ("IPE300", "HEA 300" for
 * "HE 300 A", "W12x26" for "W12×26"). Dimensions are converted to the units asked for.
 */
import { UNIT_IN_METRES, type IShape, type Point, type Units } from '../document/types';
import { HEA } from './hea';
import { HEB } from './heb';
import { IPE } from './ipe';
import type { CatalogueSeries, CatalogueSize } from './types';
import { W } from './w';

export type { CatalogueSeries, CatalogueSize } from './types';

const SERIES: readonly CatalogueSeries[] = [IPE, HEA, HEB, W];

/** Thrown by catalogueProfile for a series or size the catalogue does not hold. */
export class CatalogueError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CatalogueError';
  }
}

/** Every series, in menu order (IPE, HE A, HE B, W). */
export function catalogueSeries(): readonly CatalogueSeries[] {
  return SERIES;
}

/** "HE 300 A", "hea300", "HEA 300" -> "HE300A"; "W12×26", "w12x26" -> "W12X26". */
function key(designation: string): string {
  const k = designation.toUpperCase().replace(/[\s×*]/g, (c) => (c === '×' || c === '*' ? 'X' : ''));
  const he = /^HE([AB])(\d+)$/.exec(k);
  return he ? `HE${he[2]}${he[1]}` : k;
}

function findSeries(series: string): CatalogueSeries | undefined {
  // "HE A", "he-a" and "HEA" all name the HE A series.
  const s = series.toUpperCase().replace(/[^A-Z0-9]/g, '');
  return SERIES.find((x) => x.id === s);
}

/** The size record in the series' own units, or undefined when the catalogue does not hold it. */
export function catalogueSize(series: string, designation: string): CatalogueSize | undefined {
  const s = findSeries(series);
  if (!s) return undefined;
  // Within a series the bare size is enough: "300" in HEA is "HE 300 A", "12x26" in W is "W12×26".
  const bare = s.id === 'HEA' || s.id === 'HEB' ? `HE${designation}${s.id[2]}` : `${s.id}${designation}`;
  const wanted = [key(designation), key(bare)];
  return s.sizes.find((z) => wanted.includes(key(z.designation)));
}

export interface CatalogueOptions {
  /** Units of the returned dimensions (default: the series' own units). */
  units?: Units;
  /** Placement of the local origin, the bottom-left corner of the bounding box (default [0, 0]). */
  at?: Point;
}

/** An `i-beam` profile record (without an id) for one catalogue size, named by its designation. */
export function catalogueProfile(series: string, designation: string, options: CatalogueOptions = {}): Omit<IShape, 'id'> {
  const s = findSeries(series);
  if (!s) throw new CatalogueError(`The catalogue has no series "${series}": it holds ${SERIES.map((x) => x.id).join(', ')}.`);
  const z = catalogueSize(s.id, designation);
  if (!z) {
    const all = s.sizes.map((x) => x.designation);
    throw new CatalogueError(`The ${s.id} series holds no size "${designation}": it runs from ${all[0]} to ${all[all.length - 1]} (${all.join(', ')}).`);
  }
  const k = UNIT_IN_METRES[s.units] / UNIT_IN_METRES[options.units ?? s.units];
  // Twelve figures: removes the binary noise of the conversion, keeps every printed digit.
  const L = (v: number) => Number((v * k).toPrecision(12));
  return {
    type: 'i-beam',
    name: z.designation,
    at: options.at ? [options.at[0], options.at[1]] : [0, 0],
    depth: L(z.depth),
    flangeWidth: L(z.flangeWidth),
    flangeThickness: L(z.flangeThickness),
    webThickness: L(z.webThickness),
    rootRadius: L(z.rootRadius),
  };
}
