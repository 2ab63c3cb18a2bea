/**
 * HE B (HEB): European wide-flange H sections, standard series, dimensions per EN 10365:2017.
 *
 * Values from memory, not copied from a table: the nominal dimensions of EN 10365 and the
 * section properties as European section tables print them (A in cm², I in cm⁴, computed with
 * the root fillets). tests/catalogue.test.ts recomputes A, Ix and Iy from the dimensions and
 * refuses any size that differs by more than 1 %, which catches a mistyped dimension.
 */
import { sizesFromRows, type CatalogueSeries, type SizeRow } from './types';

// designation, h, b, tw, tf, r (mm); A (cm²), Ix strong axis (cm⁴, "Iy" in the tables), Iy weak axis (cm⁴, "Iz")
const ROWS: readonly SizeRow[] = [
  ['HE 100 B', 100, 100, 6, 10, 12, 26.04, 449.5, 167.3],
  ['HE 120 B', 120, 120, 6.5, 11, 12, 34.01, 864.4, 317.5],
  ['HE 140 B', 140, 140, 7, 12, 12, 42.96, 1509, 549.7],
  ['HE 160 B', 160, 160, 8, 13, 15, 54.25, 2492, 889.2],
  ['HE 180 B', 180, 180, 8.5, 14, 15, 65.25, 3831, 1363],
  ['HE 200 B', 200, 200, 9, 15, 18, 78.08, 5696, 2003],
  ['HE 220 B', 220, 220, 9.5, 16, 18, 91.04, 8091, 2843],
  ['HE 240 B', 240, 240, 10, 17, 21, 106.0, 11260, 3923],
  ['HE 260 B', 260, 260, 10, 17.5, 24, 118.4, 14920, 5135],
  ['HE 280 B', 280, 280, 10.5, 18, 24, 131.4, 19270, 6595],
  ['HE 300 B', 300, 300, 11, 19, 27, 149.1, 25170, 8563],
  ['HE 320 B', 320, 300, 11.5, 20.5, 27, 161.3, 30820, 9239],
  ['HE 340 B', 340, 300, 12, 21.5, 27, 170.9, 36660, 9690],
  ['HE 360 B', 360, 300, 12.5, 22.5, 27, 180.6, 43190, 10140],
  ['HE 400 B', 400, 300, 13.5, 24, 27, 197.8, 57680, 10820],
  ['HE 450 B', 450, 300, 14, 26, 27, 218.0, 79890, 11720],
  ['HE 500 B', 500, 300, 14.5, 28, 27, 238.6, 107200, 12620],
  ['HE 600 B', 600, 300, 15.5, 30, 27, 270.0, 171000, 13530],
];

export const HEB: CatalogueSeries = {
  id: 'HEB',
  name: 'HE B (European wide flange)',
  standard: 'EN 10365:2017',
  source: 'Dimensions of EN 10365 and tabulated properties, from memory; checked against each other within 1 %.',
  units: 'mm',
  tableUnits: 'cm',
  sizes: sizesFromRows(ROWS),
};
