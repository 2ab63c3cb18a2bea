/**
 * `kern stress` and the material keys of `kern props --json`, run as a user runs them: JSON shape,
 * values against hand calculations, unit flags, repeated --at, exit codes.
 *
 * Sources: the flitch beam (public/examples/flitch-beam.json) by the transformed-section method
 * (Gere & Goodno, Mechanics of Materials, composite beams, Sec. 6.3): n = 210000/11000, σ = n M
 * (y − ȳ)/I_t; the flexure formula σ = M c / I for a rectangle (Gere & Goodno, Sec. 5.5);
 * NIST SP 811, App. B for 1 ksi = 6.894757 MPa.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { main } from '../cli/main';
import { close } from './helpers';

const FLITCH = 'public/examples/flitch-beam.json';

function spawned(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

async function kern(...args: string[]) {
  let out = '', err = '';
  const o = vi.spyOn(process.stdout, 'write').mockImplementation((s) => ((out += String(s)), true));
  const e = vi.spyOn(process.stderr, 'write').mockImplementation((s) => ((err += String(s)), true));
  try {
    const code = await main(args);
    return { code, out, err };
  } finally {
    o.mockRestore();
    e.mockRestore();
  }
}

// Hand calculation of the flitch beam (see tests/example-flitch-beam.test.ts).
const n = 210000 / 11000;
const At = 28350 + n * 1800;
const yt = (28350 * 112.5 + n * 1800 * 100) / At;
const Ix = 2 * ((63 * 225 ** 3) / 12) + 28350 * (112.5 - yt) ** 2 + n * ((10 * 180 ** 3) / 12 + 1800 * (100 - yt) ** 2);
const sigma = (M: number, y: number, nn: number) => (nn * M * (y - yt)) / Ix;

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'kern-stress-'));
  writeFileSync(file('plate.json'), JSON.stringify({ format: 'kern-section', version: 2, units: 'mm', shapes: [{ type: 'rectangle', at: [0, 0], width: 100, height: 200 }] }));
  writeFileSync(file('empty.json'), JSON.stringify({ format: 'kern-section', version: 2, units: 'mm', shapes: [] }));
});

describe('kern stress', () => {
  it('prints the documented JSON with the document\'s loads (hand calculation, transformed section)', () => {
    const r = spawned('stress', FLITCH, '--json', '--at', '68,10', '--at', '68,225');
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of ['max_tension', 'max_compression', 'neutral_axis', 'at', 'sign_convention', 'units', 'loads', 'by_material', 'cautions']) expect(j).toHaveProperty(k);
    expect(Object.keys(j.max_tension).sort()).toEqual(['material', 'value', 'x', 'y']);
    expect(j.units).toEqual({ length: 'mm', stress: 'MPa', force: 'kN', moment: 'kN·m' });
    close(j.max_tension.value, sigma(-14e6, 10, n), 1e-13);
    expect(j.max_tension).toMatchObject({ x: 63, y: 10, material: 'steel-s355' });
    close(j.max_compression.value, sigma(-14e6, 190, n), 1e-13);
    close(j.neutral_axis.point.y, yt, 1e-13);
    close(j.by_material['softwood-c24'].min.value, sigma(-14e6, 225, 1), 1e-13);
    // --at repeated: a point in the plate, and one in the gap above it (outside).
    expect(j.at).toHaveLength(2);
    close(j.at[0].stresses[0].value, sigma(-14e6, 10, n), 1e-13);
    expect(j.at[1]).toMatchObject({ x: 68, y: 225, inside: false, stresses: [] });
    expect(j.one_material).toBe(false);
  });

  it('flags override the document\'s loads; unit flags give the same stresses in other units', async () => {
    const base = JSON.parse((await kern('stress', FLITCH, '--Mx', '-28', '--json')).out);
    close(base.max_tension.value, sigma(-28e6, 10, n), 1e-13);
    // The same moment in N·mm.
    const nmm = JSON.parse((await kern('stress', FLITCH, '--force', 'N', '--moment-length', 'mm', '--Mx', '-28000000', '--json')).out);
    close(nmm.max_tension.value, base.max_tension.value, 1e-13);
    expect(nmm.units.moment).toBe('N·mm');
    // Stresses in ksi: 1 ksi = 6.894757293168361 MPa (NIST SP 811, App. B).
    const ksi = JSON.parse((await kern('stress', FLITCH, '--Mx', '-28', '--stress', 'ksi', '--json')).out);
    close(ksi.max_tension.value, base.max_tension.value / 6.894757293168361, 1e-13);
    // The document's loads converted to the flags' units: −14 kN·m = −14 000 000 N·mm.
    const conv = JSON.parse((await kern('stress', FLITCH, '--force', 'N', '--moment-length', 'mm', '--json')).out);
    expect(conv.loads.Mx).toBeCloseTo(-14e6, 6);
    close(conv.max_tension.value, sigma(-14e6, 10, n), 1e-13);
  });

  it('τ at a cut with --V and --cut; the text output names the units and the sign convention', async () => {
    const j = JSON.parse((await kern('stress', FLITCH, '--V', '18', '--cut', `y=${yt}`, '--json')).out);
    const Q = 63 * (225 - yt) ** 2 + (n * 10 * (190 - yt) ** 2) / 2;
    close(j.shear.tau, (18e3 * Q) / (Ix * 136), 1e-12);
    const t = await kern('stress', FLITCH);
    expect(t.code).toBe(0);
    expect(t.out).toMatch(/σ in MPa, tension \+; N, V in kN; Mx, My in kN·m/);
    expect(t.out).toMatch(/Largest tension\s+σ = 119 MPa at \(63, 10\) mm in Structural steel S355/);
    expect(t.out).toMatch(/the fibres below it are in tension/);
    expect(t.out).toMatch(/Sign convention: Tension is positive/);
    expect(t.out).toMatch(/licensed engineer/);
  });

  it('a section without materials is one material (flexure formula σ = M c / I)', async () => {
    const j = JSON.parse((await kern('stress', file('plate.json'), '--Mx', '10', '--moment-length', 'm', '--json')).out);
    expect(j.one_material).toBe(true);
    // 10 kN·m on 100 × 200: σ = 10e6 · 100 / (100 · 200³ / 12) = 15 MPa.
    close(j.max_tension.value, 15, 1e-13);
    close(j.max_compression.value, -15, 1e-13);
  });

  it('exits 2 for invalid input, with a clear message', async () => {
    expect((await kern('stress', FLITCH, '--Mx', 'abc')).err).toMatch(/--Mx needs a finite number, got "abc"/);
    expect((await kern('stress', FLITCH, '--Mx', 'abc')).code).toBe(2);
    expect((await kern('stress', FLITCH, '--at', '1')).err).toMatch(/--at needs two numbers X,Y, got "1"/);
    expect((await kern('stress', FLITCH, '--force', 'stone')).err).toMatch(/--force must be one of N, kN, MN, lbf, kip/);
    expect((await kern('stress', FLITCH, '--V', '10')).err).toMatch(/--V needs a cut line/);
    expect((await kern('stress', FLITCH, '--cut', 'z=3')).code).toBe(2);
    expect((await kern('stress', FLITCH, '--bogus', '1')).err).toMatch(/unknown option --bogus/);
    expect((await kern('stress', file('nope.json'))).code).toBe(2);
    const empty = await kern('stress', file('empty.json'));
    expect(empty.code).toBe(2);
    expect(empty.err).toMatch(/empty/);
    expect((await kern('stress')).code).toBe(2);
    expect(spawned('stress', FLITCH, '--My', 'x').code).toBe(2);
  });
});

describe('kern props with materials', () => {
  it('--json gains cg, mass_per_length, transformed, by_material and kern; the geometric keys are today\'s', async () => {
    const j = JSON.parse((await kern('props', FLITCH, '--json')).out);
    close(j.cg.y, (420 * 28350 * 112.5 + 7850 * 1800 * 100) / (420 * 28350 + 7850 * 1800), 1e-14);
    close(j.mass_per_length, (420 * 28350 + 7850 * 1800) * 1e-6, 1e-14);
    expect(Object.keys(j.transformed)).toEqual(expect.arrayContaining(['reference', 'area', 'centroid', 'Ix', 'Iy', 'Ixy']));
    close(j.transformed.Ix, Ix, 1e-13);
    close(j.transformed.centroid.y, yt, 1e-14);
    expect(j.by_material['steel-s355']).toMatchObject({ area: 1800, centroid: { x: 68, y: 100 } });
    expect(j.kern.every((p: unknown) => Array.isArray(p) && p.length === 2)).toBe(true);
    // The geometric area and centroid (every material once): Hibbeler, composite bodies.
    close(j.area, 30150, 1e-14);
    close(j.centroid.y, (28350 * 112.5 + 1800 * 100) / 30150, 1e-14);
    const t = await kern('props', FLITCH);
    expect(t.out).toMatch(/Centre of gravity G\s+\(68, 105\.7\) mm/);
    expect(t.out).toMatch(/Mass per length\s+26\.04 kg\/m/);
    expect(t.out).toMatch(/full composite action/);
  });
});
