/**
 * The built-in material library: one common grade of each material family, values in MPa and
 * kg/m³, each with the source it comes from. The clause and table numbers were recalled without the
 * standards at hand ("from memory"); the values are the ones those clauses are known for.
 *
 * These are starting points for a sketch, not design values: a design takes its values from the
 * product standard and the design code that apply, which the report says.
 */
import type { Material } from './material';
import { convertStress, type StressUnit } from './units';

/** Library entries carry their sources, for the panel's tooltip and the report. */
export interface LibraryMaterial extends Material {
  source: string;
}

export const MATERIAL_LIBRARY: readonly LibraryMaterial[] = Object.freeze([
  {
    id: 'steel-s355',
    name: 'Structural steel S355',
    // E = 210 000 MPa, ν = 0.3: EN 1993-1-1, §3.2.6(1) (from memory).
    E: 210000,
    nu: 0.3,
    // 7850 kg/m³: the density with which EN 10365 section tables give mass per metre; EN 1991-1-1
    // Annex A, Table A.4 gives steel as 77.0 to 78.5 kN/m³ (from memory).
    density: 7850,
    // fy = 355 MPa for t ≤ 40 mm: EN 1993-1-1, Table 3.1, S355 to EN 10025-2 (from memory).
    fy: 355,
    source: 'EN 1993-1-1 §3.2.6 (E, ν), Table 3.1 (fy, t ≤ 40 mm); density 7850 kg/m³ as in EN 10365 tables (from memory)',
  },
  {
    id: 'stainless-1.4301',
    name: 'Stainless steel 1.4301 (austenitic)',
    // E = 200 000 MPa, ν = 0.3: EN 1993-1-4, §2.1.3 for the usual austenitic grades (from memory).
    E: 200000,
    nu: 0.3,
    // 7900 kg/m³: EN 10088-1, Annex, grade 1.4301 (from memory).
    density: 7900,
    // 0.2 % proof strength 210 MPa, hot-rolled plate: EN 1993-1-4, Table 2.1 (from memory).
    fy: 210,
    source: 'EN 1993-1-4 §2.1.3 (E, ν), Table 2.1 (0.2 % proof strength, plate); density EN 10088-1 (from memory)',
  },
  {
    id: 'aluminium-6082-t6',
    name: 'Aluminium alloy EN AW-6082 T6 (extrusion)',
    // E = 70 000 MPa, ν = 0.3, ρ = 2700 kg/m³: EN 1999-1-1, §3.2.5 (from memory).
    E: 70000,
    nu: 0.3,
    density: 2700,
    // f0 = 250 MPa for extruded profiles t ≤ 5 mm: EN 1999-1-1, Table 3.2b (from memory).
    fy: 250,
    source: 'EN 1999-1-1 §3.2.5 (E, ν, density), Table 3.2b (f0, extrusion t ≤ 5 mm) (from memory)',
  },
  {
    id: 'softwood-c24',
    name: 'Softwood C24',
    // E0,mean = 11 000 MPa, ρmean = 420 kg/m³, fm,k = 24 MPa: EN 338, Table 1, class C24 (from memory).
    // Timber is orthotropic; ν is not given.
    E: 11000,
    density: 420,
    fy: 24,
    source: 'EN 338 Table 1, C24: E0,mean, ρmean, fm,k (bending strength used as fy) (from memory)',
  },
  {
    id: 'hardwood-d40',
    name: 'Hardwood D40',
    // E0,mean = 13 000 MPa, ρmean = 660 kg/m³, fm,k = 40 MPa: EN 338, Table 2, class D40 (from memory).
    E: 13000,
    density: 660,
    fy: 40,
    source: 'EN 338 Table 2, D40: E0,mean, ρmean, fm,k (bending strength used as fy) (from memory)',
  },
  {
    id: 'concrete-c30',
    name: 'Concrete C30/37',
    // Ecm = 33 000 MPa, fck = 30 MPa: EN 1992-1-1, Table 3.1; ν = 0.2: §3.1.3(4) (from memory).
    E: 33000,
    nu: 0.2,
    // 2400 kg/m³: normal-weight plain concrete, 24 kN/m³ in EN 1991-1-1 Annex A, Table A.1
    // (from memory), taken as the usual round mass density.
    density: 2400,
    fy: 30,
    source: 'EN 1992-1-1 Table 3.1 (Ecm, fck used as fy), §3.1.3 (ν); EN 1991-1-1 Table A.1 (24 kN/m³) (from memory)',
  },
  {
    id: 'glass-float',
    name: 'Glass, annealed soda-lime float',
    // E = 70 000 MPa, ν = 0.2, ρ = 2500 kg/m³, characteristic bending strength 45 MPa: EN 572-1,
    // clause 4 (from memory).
    E: 70000,
    nu: 0.2,
    density: 2500,
    fy: 45,
    source: 'EN 572-1 (E, ν, density, characteristic bending strength used as fy) (from memory)',
  },
]);

/** A library entry as a document material (no source field), in the document's stress unit. */
export function libraryMaterial(id: string, stress: StressUnit = 'MPa'): Material {
  const m = MATERIAL_LIBRARY.find((x) => x.id === id);
  if (!m) throw new Error(`no library material "${id}"; the library has ${MATERIAL_LIBRARY.map((x) => `"${x.id}"`).join(', ')}`);
  return materialInStressUnit({ id: m.id, name: m.name, E: m.E, density: m.density, fy: m.fy, ...(m.nu !== undefined ? { nu: m.nu } : {}) }, 'MPa', stress);
}

/** The same material with E and fy expressed in another stress unit. */
export function materialInStressUnit(m: Material, from: StressUnit, to: StressUnit): Material {
  if (from === to) return { ...m };
  return { ...m, E: convertStress(m.E, from, to), fy: convertStress(m.fy, from, to) };
}
