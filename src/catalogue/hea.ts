/**
 * HE A (HEA): European wide-flange H sections, light series, dimensions per EN 10365:2017.
 *
 * Values from memory, not copied from a table: the nominal dimensions of EN 10365 and the
 * section properties as European section tables print them (A in cm², I in cm⁴, computed with
 * the root fillets). tests/catalogue.test.ts recomputes A, Ix and Iy from the dimensions and
 * refuses any size that differs by more than 1 %, which catches a mistyped dimension.
 */
import { sizesFromRows, type CatalogueSeries, type SizeRow } from './types';

// designation, h, b, tw, tf, r (mm); A (cm²), Ix strong axis (cm⁴, "Iy" in the tables), Iy weak axis (cm⁴, "Iz")
const ROWS: readonly SizeRow[] = [
  ['HE 100 A', 96, 100, 5, 8, 12, 21.24, 349.2, 133.8],
  ['HE 120 A', 114, 120, 5, 8, 12, 25.34, 606.2, 230.9],
  ['HE 140 A', 133, 140, 5.5, 8.5, 12, 31.42, 1033, 389.3],
  ['HE 160 A', 152, 160, 6, 9, 15, 38.77, 1673, 615.6],
  ['HE 180 A', 171, 180, 6, 9.5, 15, 45.25, 2510, 924.6],
  ['HE 200 A', 190, 200, 6.5, 10, 18, 53.83, 3692, 1336],
  ['HE 220 A', 210, 220, 7, 11, 18, 64.34, 5410, 1955],
  ['HE 240 A', 230, 240, 7.5, 12, 21, 76.84, 7763, 2769],
  ['HE 260 A', 250, 260, 7.5, 12.5, 24, 86.82, 10450, 3668],
  ['HE 280 A', 270, 280, 8, 13, 24, 97.26, 13670, 4763],
  ['HE 300 A', 290, 300, 8.5, 14, 27, 112.5, 18260, 6310],
  ['HE 320 A', 310, 300, 9, 15.5, 27, 124.4, 22930, 6985],
  ['HE 340 A', 330, 300, 9.5, 16.5, 27, 133.5, 27690, 7436],
  ['HE 360 A', 350, 300, 10, 17.5, 27, 142.8, 33090, 7887],
  ['HE 400 A', 390, 300, 11, 19, 27, 159.0, 45070, 8564],
  ['HE 450 A', 440, 300, 11.5, 21, 27, 178.0, 63720, 9465],
  ['HE 500 A', 490, 300, 12, 23, 27, 197.5, 86970, 10370],
  ['HE 600 A', 590, 300, 13, 25, 27, 226.5, 141200, 11270],
];

export const HEA: CatalogueSeries = {
  id: 'HEA',
  name: 'HE A (European wide flange, light)',
  standard: 'EN 10365:2017',
  source: 'Dimensions of EN 10365 and tabulated properties, from memory; checked against each other within 1 %.',
  units: 'mm',
  tableUnits: 'cm',
  sizes: sizesFromRows(ROWS),
};
