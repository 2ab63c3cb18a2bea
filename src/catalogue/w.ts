/**
 * W shapes: American wide-flange sections, ASTM A6/A6M shapes, as tabulated in the AISC Steel
 * Construction Manual, Table 1-1 (W shapes, dimensions and properties).
 *
 * Values from memory, not copied from the table: depth d, flange width bf, web thickness tw,
 * flange thickness tf and the design k-dimension kdes (in), with A (in²), Ix and Iy (in⁴) as the
 * Manual prints them. The Manual gives no fillet radius; it is taken as r = kdes − tf, the
 * distance from the flange's inner face to the end of the fillet. tests/catalogue.test.ts
 * recomputes A, Ix and Iy from the dimensions and refuses any size that differs by more than 1 %.
 * The Manual rounds d and bf to three figures, which alone moves Ix or Iy by up to about 0.9 %
 * for some sizes; sizes where that rounding exceeds 1 % are left out.
 */
import type { CatalogueSeries, CatalogueSize } from './types';

// designation, d, bf, tw, tf, kdes (in); A (in²), Ix (in⁴), Iy (in⁴)
type WRow = readonly [string, number, number, number, number, number, number, number, number];
const ROWS: readonly WRow[] = [
  ['W8×10', 7.89, 3.94, 0.17, 0.205, 0.505, 2.96, 30.8, 2.09],
  ['W8×18', 8.14, 5.25, 0.23, 0.33, 0.63, 5.26, 61.9, 7.97],
  ['W8×31', 8.0, 8.0, 0.285, 0.435, 0.829, 9.13, 110, 37.1],
  ['W10×12', 9.87, 3.96, 0.19, 0.21, 0.51, 3.54, 53.8, 2.18],
  ['W10×22', 10.2, 5.75, 0.24, 0.36, 0.66, 6.49, 118, 11.4],
  ['W10×33', 9.73, 7.96, 0.29, 0.435, 0.935, 9.71, 171, 36.6],
  ['W10×49', 10.0, 10.0, 0.34, 0.56, 1.06, 14.4, 272, 93.4],
  ['W12×14', 11.9, 3.97, 0.2, 0.225, 0.525, 4.16, 88.6, 2.36],
  ['W12×26', 12.2, 6.49, 0.23, 0.38, 0.68, 7.65, 204, 17.3],
  ['W12×40', 11.9, 8.01, 0.295, 0.515, 1.02, 11.7, 307, 44.1],
  ['W12×50', 12.2, 8.08, 0.37, 0.64, 1.14, 14.6, 391, 56.3],
  ['W12×65', 12.1, 12.0, 0.39, 0.605, 1.2, 19.1, 533, 174],
  ['W14×22', 13.7, 5.0, 0.23, 0.335, 0.735, 6.49, 199, 7.0],
  ['W14×30', 13.8, 6.73, 0.27, 0.385, 0.785, 8.85, 291, 19.6],
  ['W14×48', 13.8, 8.03, 0.34, 0.595, 1.19, 14.1, 484, 51.4],
  ['W14×90', 14.0, 14.5, 0.44, 0.71, 1.31, 26.5, 999, 362],
  ['W16×26', 15.7, 5.5, 0.25, 0.345, 0.747, 7.68, 301, 9.59],
  ['W16×40', 16.0, 7.0, 0.305, 0.505, 0.907, 11.8, 518, 28.9],
  ['W18×35', 17.7, 6.0, 0.3, 0.425, 0.827, 10.3, 510, 15.3],
  ['W18×50', 18.0, 7.5, 0.355, 0.57, 0.972, 14.7, 800, 40.1],
  ['W21×44', 20.7, 6.5, 0.35, 0.45, 0.95, 13.0, 843, 20.7],
  ['W21×62', 21.0, 8.24, 0.4, 0.615, 1.12, 18.3, 1330, 57.5],
  ['W24×55', 23.6, 7.01, 0.395, 0.505, 1.01, 16.2, 1350, 29.1],
  ['W24×68', 23.7, 8.97, 0.415, 0.585, 1.09, 20.1, 1830, 70.4],
  ['W27×84', 26.7, 10.0, 0.46, 0.64, 1.24, 24.8, 2850, 106],
  ['W33×118', 32.9, 11.5, 0.55, 0.74, 1.32, 34.7, 5900, 187],
  ['W36×150', 35.9, 12.0, 0.625, 0.94, 1.69, 44.3, 9040, 270],
];

const sizes: CatalogueSize[] = ROWS.map(([designation, d, bf, tw, tf, kdes, A, Ix, Iy]) => ({
  designation,
  depth: d,
  flangeWidth: bf,
  flangeThickness: tf,
  webThickness: tw,
  // r = kdes − tf, rounded to the thousandths the table is written in.
  rootRadius: Number((kdes - tf).toFixed(3)),
  A,
  Ix,
  Iy,
}));

export const W: CatalogueSeries = {
  id: 'W',
  name: 'W (American wide flange)',
  standard: 'ASTM A6/A6M; AISC Steel Construction Manual, Table 1-1',
  source: 'Dimensions, kdes and tabulated properties from memory; root radius taken as kdes − tf; checked against each other within 1 %.',
  units: 'in',
  tableUnits: 'in',
  sizes,
};
