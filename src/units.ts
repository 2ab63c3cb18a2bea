/** The length units a section document may use, and each one's length in metres. */
export const UNITS = ['mm', 'cm', 'm', 'in', 'ft'] as const;
export type Units = (typeof UNITS)[number];

/** Length of one unit in metres (1 in = 0.0254 m and 1 ft = 0.3048 m exactly, NIST SP 811). */
export const UNIT_IN_METRES: Record<Units, number> = { mm: 1e-3, cm: 1e-2, m: 1, in: 0.0254, ft: 0.3048 };
