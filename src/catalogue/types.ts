/**
 * The profile catalogue's records: standard rolled I sections given by their nominal
 * dimensions, with the section properties their published tables print beside them.
 *
 * Dimensions are those of the existing `i-beam` profile kind (src/document/profiles.ts), so a
 * catalogue size becomes an ordinary parametric profile that the user can still edit. The
 * tabulated A, Ix and Iy are kept only to check the dimensions (tests/catalogue.test.ts): the
 * numbers Kern reports are always computed from the outline.
 */
import type { Units } from '../document/types';

export interface CatalogueSize {
  /** The designation as the standard writes it, e.g. "IPE 300", "HE 300 A", "W12×26". */
  designation: string;
  /** Overall depth h (d), in the series' units. */
  depth: number;
  /** Flange width b (bf). */
  flangeWidth: number;
  /** Flange thickness tf. */
  flangeThickness: number;
  /** Web thickness tw (s). */
  webThickness: number;
  /** Radius of the root fillet between web and flange (r). */
  rootRadius: number;
  /**
   * Tabulated properties in the series' table units: area A (unit²), second moment about the
   * strong axis Ix (unit⁴; European tables call it Iy) and about the weak axis Iy (unit⁴; Iz).
   */
  A: number;
  Ix: number;
  Iy: number;
}

export interface CatalogueSeries {
  /** Short key used for look-up: "IPE", "HEA", "HEB", "W". */
  id: string;
  /** Plain name for a menu. */
  name: string;
  /** The standard that fixes the dimensions. */
  standard: string;
  /** Where the numbers come from, in plain words (all of them are recalled, not copied). */
  source: string;
  /** Units of the dimensions. */
  units: Units;
  /** Length unit of the tabulated A (unit²) and I (unit⁴), as the tables print them. */
  tableUnits: Units;
  sizes: readonly CatalogueSize[];
}

/** A row as written in the series files: designation, h, b, tw, tf, r, A, Ix, Iy. */
export type SizeRow = readonly [string, number, number, number, number, number, number, number, number];

export function sizesFromRows(rows: readonly SizeRow[]): CatalogueSize[] {
  return rows.map(([designation, depth, flangeWidth, webThickness, flangeThickness, rootRadius, A, Ix, Iy]) => ({
    designation,
    depth,
    flangeWidth,
    flangeThickness,
    webThickness,
    rootRadius,
    A,
    Ix,
    Iy,
  }));
}
