/** The command line, run as a user runs it (`npm run -s cli -- ...` is `tsx cli/main.ts ...`). */
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { jsonValueAt, PROPERTY_CATALOG } from '../src';
import { close } from './helpers';

function kern(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const KEYS = ['units', 'area', 'centroid', 'Qx', 'Qy', 'Ix', 'Iy', 'Ixy', 'J0', 'I1', 'I2', 'theta', 'rx', 'ry', 'r1', 'r2', 'Sx_top', 'Sx_bottom', 'Sy_left', 'Sy_right', 'Zx', 'Zy', 'bounds', 'perimeter', 'warnings'];

describe('kern props', () => {
  it('prints one JSON object with the documented keys and correct values', () => {
    const r = kern('props', 'tests/fixtures/plate-with-bore.json', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of KEYS) expect(j).toHaveProperty(k);
    // Composite method (Hibbeler, Statics, Sec. 9.3): plate 200 × 100 minus a Ø40 bore at (140, 35).
    const A1 = 20000, A2 = Math.PI * 400, A = A1 - A2;
    close(j.area, A, 1e-9);
    close(j.centroid.x, (A1 * 100 - A2 * 140) / A, 1e-9);
    close(j.centroid.y, (A1 * 50 - A2 * 35) / A, 1e-9);
    const yb = (A1 * 50 - A2 * 35) / A;
    close(j.Ix, (200 * 100 ** 3) / 12 + A1 * (50 - yb) ** 2 - ((Math.PI * 20 ** 4) / 4 + A2 * (35 - yb) ** 2), 1e-9);
    expect(j.units).toBe('mm');
    expect(j.bounds).toEqual({ xmin: 0, xmax: 200, ymin: 0, ymax: 100 });
  });

  it('carries every property of the catalogue, at full precision (the JSON is built from it)', () => {
    const j = JSON.parse(kern('props', 'tests/fixtures/plate-with-bore.json', '--json').out);
    for (const info of PROPERTY_CATALOG) expect(typeof jsonValueAt(j, info.key), info.key).toBe('number');
    // Full precision, not the shown digits: the area has more than 6 significant figures.
    close(j.area, 20000 - Math.PI * 400, 1e-15);
  });

  it('reports the baseline of a file with proposals, and a proposal with --variant', () => {
    const file = 'tests/fixtures/plate-proposals.json';
    const base = JSON.parse(kern('props', file, '--json').out);
    const cope = JSON.parse(kern('props', file, '--variant', 'Corner cope', '--json').out);
    // Composite method (Hibbeler, Statics, Sec. 9.3): plate 200 × 100 less the Ø40 bore; the cope
    // takes a further 30 × 20 corner.
    close(base.area, 20000 - Math.PI * 400, 1e-12);
    close(cope.area, 20000 - Math.PI * 400 - 600, 1e-12);
    const bad = kern('props', file, '--variant', 'Nope');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('there is no proposal named "Nope"; the document has "Corner cope"');
  });

  it('prints a table with units and the caution', () => {
    const r = kern('props', 'tests/fixtures/plate-with-bore.json');
    expect(r.code).toBe(0);
    // A = 20000 − 400π = 18743.4 mm², shown to 4 figures in engineering form (src/properties/catalog.ts).
    expect(r.out).toMatch(/Area\s+18\.74 × 10³ mm²/);
    expect(r.out).toMatch(/checked against the applicable code/);
  });

  it('refuses an invalid file with exit code 2 and the validation messages, no stack trace', () => {
    const r = kern('props', 'tests/fixtures/open-path.json', '--json');
    expect(r.code).toBe(2);
    expect(r.err).toContain('shapes[0].segments[1].via: arc points are collinear');
    expect(r.err).toContain('shapes[1].radius: radius must be greater than 0, got 0');
    expect(r.err).not.toMatch(/\bat .*\.ts:\d+/);
    const missing = kern('props', 'tests/fixtures/nope.json');
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/cannot read .*nope\.json: ENOENT/);
  });
});

describe('kern cut', () => {
  it('gives b, area, centroid and Q of the part above a horizontal cut', () => {
    // Rectangle above y = 60 of a 200 × 100 plate: the bore lies wholly below (y ≤ 55).
    const r = kern('cut', 'tests/fixtures/plate-with-bore.json', '--y', '60', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    const A1 = 20000, A2 = Math.PI * 400, A = A1 - A2, yb = (A1 * 50 - A2 * 35) / A;
    close(j.width, 200, 1e-12);
    close(j.area, 200 * 40, 1e-12);
    close(j.centroid.y, 80, 1e-12);
    // Q = A' (ȳ' − ȳ) (Gere & Goodno, Sec. 5.8, first moment of the area beyond the cut).
    close(j.Q, 8000 * (80 - yb), 1e-12);
    expect(Object.keys(j).sort()).toEqual(['Q', 'area', 'at', 'centroid', 'width', 'width_above', 'width_below']);
    // No edge on y = 60: the one-sided widths are the width.
    expect(j.width_above).toBe(j.width);
    expect(j.width_below).toBe(j.width);
  });

  it('cuts vertically with --x through the bore', () => {
    const r = kern('cut', 'tests/fixtures/plate-with-bore.json', '--x', '140', '--json');
    const j = JSON.parse(r.out);
    close(j.width, 100 - 40, 1e-12);
    close(j.area, 60 * 100 - (Math.PI * 400) / 2, 1e-12);
  });

  it('refuses bad usage with exit code 2', () => {
    expect(kern('cut', 'tests/fixtures/plate-with-bore.json', '--y', 'abc').code).toBe(2);
    expect(kern('cut', 'tests/fixtures/plate-with-bore.json').code).toBe(2);
    expect(kern('frobnicate').code).toBe(2);
  });
});

describe('kern inertia', () => {
  it('transfers to a given axis', () => {
    // Base edge of the plate: I = bh³/3 for the plate minus the bore's πr⁴/4 + A d²
    // (Gere & Goodno, Sec. 12.5, parallel-axis theorem).
    const r = kern('inertia', 'tests/fixtures/plate-with-bore.json', '--through', '0,0', '--angle', '0', '--json');
    expect(r.code).toBe(0);
    close(JSON.parse(r.out).I, (200 * 100 ** 3) / 3 - ((Math.PI * 20 ** 4) / 4 + Math.PI * 400 * 35 ** 2), 1e-12);
    expect(kern('inertia', 'tests/fixtures/plate-with-bore.json', '--through', '1').code).toBe(2);
  });
});
