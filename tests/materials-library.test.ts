/**
 * The material records: the built-in library and its sources, the checks with their paths, and the
 * unit model.
 *
 * Sources (clause numbers from memory): EN 1993-1-1 §3.2.6 (steel E = 210 000 MPa, ν = 0.3),
 * Table 3.1 (S355, fy = 355 MPa); EN 1999-1-1 §3.2.5 (aluminium E = 70 000 MPa, 2700 kg/m³);
 * EN 338 (C24: E0,mean = 11 000 MPa, ρmean = 420 kg/m³, fm,k = 24 MPa); EN 1992-1-1 Table 3.1
 * (C30/37: Ecm = 33 GPa, fck = 30 MPa); EN 572-1 (glass: E = 70 GPa, 2500 kg/m³, 45 MPa);
 * NIST SP 811, App. B (1 lbf = 4.4482216152605 N, 1 in = 0.0254 m exactly, 1 psi =
 * 6894.757 Pa, 1 ksi = 6.894757 MPa).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { close, worst } from './helpers';
import { MATERIAL_LIBRARY, libraryMaterial, materialInStressUnit } from '../src/materials/library';
import { materialIssues, materialListIssues, materialReferenceIssues, findMaterial, type Material } from '../src/materials/material';
import { convertStress, massPerLength, momentFactor, resistanceMomentFactor, stressFactor, STRESS_UNIT_IN_PASCALS } from '../src/materials/units';

describe('built-in library', () => {
  it('holds the seven families, each valid and with a named source', () => {
    const ids = MATERIAL_LIBRARY.map((m) => m.id);
    expect(ids).toEqual(['steel-s355', 'stainless-1.4301', 'aluminium-6082-t6', 'softwood-c24', 'hardwood-d40', 'concrete-c30', 'glass-float']);
    for (const m of MATERIAL_LIBRARY) {
      expect(materialIssues(m, 'm')).toEqual([]);
      expect(m.source).toMatch(/EN \d/);
    }
  });

  it('gives the standards\' values (from memory)', () => {
    const by = (id: string) => libraryMaterial(id);
    expect(by('steel-s355')).toEqual({ id: 'steel-s355', name: 'Structural steel S355', E: 210000, density: 7850, fy: 355, nu: 0.3 }); // EN 1993-1-1
    expect(by('aluminium-6082-t6').E).toBe(70000); // EN 1999-1-1 §3.2.5
    expect(by('aluminium-6082-t6').density).toBe(2700);
    expect(by('softwood-c24')).toMatchObject({ E: 11000, density: 420, fy: 24 }); // EN 338, C24
    expect(by('concrete-c30')).toMatchObject({ E: 33000, fy: 30, nu: 0.2 }); // EN 1992-1-1 Table 3.1
    expect(by('glass-float')).toMatchObject({ E: 70000, density: 2500, fy: 45 }); // EN 572-1
    expect(() => libraryMaterial('unobtainium')).toThrow(/no library material "unobtainium"/);
  });

  it('converts to the document\'s stress unit: 210 000 MPa = 30 458 ksi', () => {
    // 1 ksi = 6.894757293168361 MPa (NIST SP 811): 210000 / 6.894757… = 30 457.9 ksi.
    const s = libraryMaterial('steel-s355', 'ksi');
    close(s.E, 210000 / 6.894757293168361, 1e-14);
    close(s.fy, 355 / 6.894757293168361, 1e-14);
    expect(s.density).toBe(7850);
    close(materialInStressUnit(s, 'ksi', 'MPa').E, 210000, 1e-14);
  });
});

describe('checks with paths', () => {
  it('every problem of a record, each at its path', () => {
    expect(materialIssues({ id: '', name: 3, E: -1, density: -5, fy: 'x', nu: 0.7 }, 'materials[2]')).toEqual([
      { path: 'materials[2].id', message: 'must be a non-empty string, got ""' },
      { path: 'materials[2].name', message: 'must be a string, got 3' },
      { path: 'materials[2].E', message: 'the modulus of elasticity must be a finite number greater than 0, got -1' },
      { path: 'materials[2].fy', message: 'the strength must be a finite number greater than 0, got "x"' },
      { path: 'materials[2].density', message: 'the density (kg/m³) must be a finite number of at least 0, got -5' },
      { path: 'materials[2].nu', message: "Poisson's ratio must lie in (−1, 0.5], got 0.7" },
    ]);
    expect(materialIssues(null, 'materials[0]')[0].path).toBe('materials[0]');
  });

  it('a list: duplicate ids', () => {
    const m: Material = { id: 'a', name: 'A', E: 1, density: 0, fy: 1 };
    expect(materialListIssues([m, { ...m }])).toEqual([{ path: 'materials[1].id', message: 'the id "a" is already used by materials[0]' }]);
    expect(materialListIssues({})).toEqual([{ path: 'materials', message: 'expected a list of materials, got {}' }]);
  });

  it('an unknown material id and a missing reference', () => {
    const list: Material[] = [
      { id: 'steel', name: 'S', E: 210000, density: 7850, fy: 355 },
      { id: 'c24', name: 'T', E: 11000, density: 420, fy: 24 },
    ];
    expect(materialReferenceIssues(list, undefined, [undefined, 'steel'])).toEqual([{ path: 'reference', message: 'missing: name the reference material (the one with n = 1); known materials: "steel", "c24"' }]);
    expect(materialReferenceIssues(list, 'alu', [])).toEqual([{ path: 'reference', message: 'unknown material "alu"; known materials: "steel", "c24"' }]);
    expect(materialReferenceIssues(list, 'steel', [undefined, 'c16', 'c24'])).toEqual([{ path: 'shapes[1].material', message: 'unknown material "c16"; known materials: "steel", "c24"' }]);
    // A version-1 document (no materials, no shape naming one) has nothing to report.
    expect(materialReferenceIssues([], undefined, [undefined, undefined])).toEqual([]);
    expect(materialReferenceIssues([], undefined, ['steel'])[0].path).toBe('reference');
    expect(() => findMaterial(list, 'x')).toThrow(/unknown material "x"; known materials: "steel", "c24"/);
  });
});

describe('unit model', () => {
  it('stress factors: 1 kN/mm² = 1000 MPa, 1 kip/in² = 1 ksi, 1 N/mm² = 1 MPa, 1 lbf/in² = 1 psi', () => {
    close(stressFactor({ length: 'mm', force: 'kN', stress: 'MPa' }), 1000, 1e-15);
    close(stressFactor({ length: 'in', force: 'kip', stress: 'ksi' }), 1, 1e-15);
    close(stressFactor({ length: 'mm', force: 'N', stress: 'MPa' }), 1, 1e-15);
    close(stressFactor({ length: 'in', force: 'lbf', stress: 'psi' }), 1, 1e-15);
    close(stressFactor({ length: 'm', force: 'kN', stress: 'kPa' }), 1, 1e-15);
    close(STRESS_UNIT_IN_PASCALS.psi, 6894.757293168361, 1e-15); // NIST SP 811
    close(convertStress(1, 'ksi', 'MPa'), 6.894757293168361, 1e-15);
  });

  it('moments in kN·m on a mm drawing, and resistance moments back in kN·m', () => {
    const u = { length: 'mm', force: 'kN', stress: 'MPa', momentLength: 'm' } as const;
    close(momentFactor(u), 1000, 1e-15);
    // fy · Z = 355 MPa · 1e6 mm³ = 355 kN·m.
    close(355 * 1e6 * resistanceMomentFactor(u), 355, 1e-14);
  });

  it('mass per length in kg/m from any unit: a 100 × 10 mm steel flat is 7.85 kg/m', () => {
    // EN 10058 (from memory): flat 100 × 10, 7.85 kg/m at 7850 kg/m³.
    close(massPerLength(1000, 7850, 'mm'), 7.85, 1e-14);
    close(massPerLength(10, 7850, 'cm'), 7.85, 1e-14);
    close(massPerLength(1000 / 645.16, 7850, 'in'), 7.85, 1e-14);
  });
});

afterAll(() => {
  console.log(`materials-library: largest relative error ${worst.value.toExponential(2)}`);
});
