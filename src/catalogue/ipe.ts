/**
 * IPE: European parallel-flange I beams, dimensions per EN 10365:2017 (hot rolled steel
 * channels, I and H sections: dimensions and masses).
 *
 * Values from memory, not copied from a table: the nominal dimensions of EN 10365 and the
 * section properties as European section tables print them (A in cm², I in cm⁴, computed with
 * the root fillets). tests/catalogue.test.ts recomputes A, Ix and Iy from the dimensions and
 * refuses any size that differs by more than 1 %, which catches a mistyped dimension.
 */
import { sizesFromRows, type CatalogueSeries, type SizeRow } from './types';

// designation, h, b, tw, tf, r (mm); A (cm²), Ix strong axis (cm⁴, "Iy" in the tables), Iy weak axis (cm⁴, "Iz")
const ROWS: readonly SizeRow[] = [
  ['IPE 80', 80, 46, 3.8, 5.2, 5, 7.64, 80.14, 8.49],
  ['IPE 100', 100, 55, 4.1, 5.7, 7, 10.32, 171.0, 15.92],
  ['IPE 120', 120, 64, 4.4, 6.3, 7, 13.21, 317.8, 27.67],
  ['IPE 140', 140, 73, 4.7, 6.9, 7, 16.43, 541.2, 44.92],
  ['IPE 160', 160, 82, 5.0, 7.4, 9, 20.09, 869.3, 68.31],
  ['IPE 180', 180, 91, 5.3, 8.0, 9, 23.95, 1317, 100.9],
  ['IPE 200', 200, 100, 5.6, 8.5, 12, 28.48, 1943, 142.4],
  ['IPE 220', 220, 110, 5.9, 9.2, 12, 33.37, 2772, 204.9],
  ['IPE 240', 240, 120, 6.2, 9.8, 15, 39.12, 3892, 283.6],
  ['IPE 270', 270, 135, 6.6, 10.2, 15, 45.95, 5790, 419.9],
  ['IPE 300', 300, 150, 7.1, 10.7, 15, 53.81, 8356, 603.8],
  ['IPE 330', 330, 160, 7.5, 11.5, 18, 62.61, 11770, 788.1],
  ['IPE 360', 360, 170, 8.0, 12.7, 18, 72.73, 16270, 1043],
  ['IPE 400', 400, 180, 8.6, 13.5, 21, 84.46, 23130, 1318],
  ['IPE 450', 450, 190, 9.4, 14.6, 21, 98.82, 33740, 1676],
  ['IPE 500', 500, 200, 10.2, 16.0, 21, 115.5, 48200, 2142],
  ['IPE 550', 550, 210, 11.1, 17.2, 24, 134.4, 67120, 2668],
  ['IPE 600', 600, 220, 12.0, 19.0, 24, 156.0, 92080, 3387],
];

export const IPE: CatalogueSeries = {
  id: 'IPE',
  name: 'IPE (European I beams)',
  standard: 'EN 10365:2017',
  source: 'Dimensions of EN 10365 and tabulated properties, from memory; checked against each other within 1 %.',
  units: 'mm',
  tableUnits: 'cm',
  sizes: sizesFromRows(ROWS),
};
