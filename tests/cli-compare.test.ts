/**
 * The compare and netsection commands, run as a user runs them (`npm run -s cli -- ...` is
 * `tsx cli/main.ts ...`): JSON shape, values against hand calculations, exit codes.
 *
 * Hand values: composite method (Hibbeler, Statics, Sec. 9.3): a 200 × 100 plate (A = 20000) with
 * a 60 × 30 corner notch (A = 1800 at (170, 85)) has A = 18200 and x̄ = 1694000/18200,
 * ȳ = 847000/18200; net width through three Ø22 holes = 200 − 3·22 (AISC 360-16, Section B4.3b,
 * from memory).
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { main } from '../cli/main';
import { close } from './helpers';

/** A separate process, exactly as a user runs it (used where the exit status itself is tested). */
function spawned(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

/** The same entry point in this process, with stdout and stderr captured (fast). */
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

let dir = '';
const file = (name: string) => join(dir, name);
const plate = { id: 'plate', name: 'Plate 200 × 100', type: 'rectangle', at: [0, 0], width: 200, height: 100 };
const sectionDoc = (shapes: unknown[], units = 'mm') => JSON.stringify({ format: 'kern-section', version: 1, units, shapes });

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'kern-compare-'));
  writeFileSync(file('base.json'), sectionDoc([plate]));
  writeFileSync(file('notched.json'), sectionDoc([plate, { id: 'notch', name: 'Notch 60 × 30', type: 'rectangle', at: [140, 70], width: 60, height: 30, op: 'subtract' }]));
  // The same notched plate in cm: the comparison converts it to the baseline's mm.
  writeFileSync(file('notched-cm.json'), sectionDoc([{ ...plate, width: 20, height: 10 }, { id: 'notch', type: 'rectangle', at: [14, 7], width: 6, height: 3, op: 'subtract' }], 'cm'));
  writeFileSync(file('holes.json'), sectionDoc([
    { id: 'bar', type: 'rectangle', at: [0, 0], width: 100, height: 200 },
    ...[40, 100, 160].map((y, k) => ({ id: `h${k}`, type: 'circle', center: [50, y], radius: 11, op: 'subtract' })),
  ]));
  writeFileSync(file('edge-hole.json'), sectionDoc([plate, { id: 'hole', type: 'circle', center: [22, 50], radius: 11, op: 'subtract' }]));
  writeFileSync(file('loose.json'), JSON.stringify({ limits: [{ property: 'area', maxLossPercent: 10 }, { property: 'centroid', maxShift: 10 }] }));
  writeFileSync(file('tight.json'), JSON.stringify([{ property: 'area', maxLossPercent: 8.99 }]));
  writeFileSync(file('bad-limits.json'), JSON.stringify([{ property: 'Iz', maxLossPercent: 10 }, { property: 'Ix', maxShift: 2 }]));
  writeFileSync(file('broken.json'), '{ "format": "kern-section", ');
  writeFileSync(
    file('proposals.json'),
    JSON.stringify({
      format: 'kern-section',
      version: 2,
      units: 'mm',
      shapes: [plate],
      variants: [{ name: 'Notch', shapes: ['plate', { id: 'notch', type: 'rectangle', at: [140, 70], width: 60, height: 30, op: 'subtract' }] }],
    }),
  );
});

describe('kern compare', () => {
  it('prints the documented JSON: property keys as in props --json, change.centroid {x, y}', async () => {
    const r = spawned('compare', file('base.json'), file('notched.json'), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of ['baseline', 'proposal', 'change', 'change_percent', 'limits', 'verdict', 'cautions']) expect(j).toHaveProperty(k);
    const props = JSON.parse((await kern('props', file('base.json'), '--json')).out);
    for (const k of Object.keys(props)) {
      // The kern is a region, not a property the comparison takes.
      if (k === 'units' || k === 'warnings' || k === 'kern') continue;
      expect(j.baseline).toHaveProperty(k);
      expect(j.change).toHaveProperty(k);
      // Same nesting as props --json (centroid {x, y}, bounds {...}, plasticAxis {...}).
      if (typeof props[k] === 'object') expect(Object.keys(j.baseline[k]).sort()).toEqual(Object.keys(props[k]).sort());
      else close(j.baseline[k], props[k], 1e-12, 1);
    }
    expect(j.baseline).toHaveProperty('Sx_min');
    expect(Object.keys(j.change.centroid).sort()).toEqual(['x', 'y']);
    // Hand: A = 18200, change −1800 = −9 %; x̄ = 1694000/18200, ȳ = 847000/18200.
    close(j.proposal.area, 18200, 1e-12);
    close(j.change.area, -1800, 1e-12);
    close(j.change_percent.area, -9, 1e-12);
    close(j.change.centroid.x, 1694000 / 18200 - 100, 1e-12);
    close(j.change.centroid.y, 847000 / 18200 - 50, 1e-12);
    close(j.centroid_shift.length, Math.hypot(1694000 / 18200 - 100, 847000 / 18200 - 50), 1e-12);
    expect(j.change_percent.Ixy).toBeNull();
    expect(j.change_percent.centroid).toEqual({ x: null, y: null });
    expect(j.notes.Ixy).toMatch(/symmetric/);
    // No limits given: the example limits, labelled as examples.
    expect(j.limits_source).toBe('examples');
    expect(j.limits_note).toMatch(/not values from a design code/);
    expect(j.limits.map((l: { property: string }) => l.property)).toEqual(['Ix', 'Sx_min', 'area', 'centroid', 'theta']);
    expect(['within', 'beyond']).toContain(j.verdict);
    expect(j.verdict).toBe(j.limits.some((l: { status: string }) => l.status === 'beyond') ? 'beyond' : 'within');
    // The notch's inside corner, with a marker point and the shape named.
    const corner = j.cautions.find((c: { kind: string }) => c.kind === 're-entrant-corner');
    expect(corner).toMatchObject({ severity: 'warning', at: { x: 140, y: 70 }, shape: { id: 'notch', name: 'Notch 60 × 30' } });
    expect(j.caution).toMatch(/geometric screen, not a design check/);
  });

  it('takes limits from a file: within exits 0, beyond exits 0 too', async () => {
    const loose = JSON.parse((await kern('compare', file('base.json'), file('notched.json'), '--json', '--limits', file('loose.json'))).out);
    expect(loose.limits_source).toBe('file');
    expect(loose.verdict).toBe('within');
    const tight = await kern('compare', file('base.json'), file('notched.json'), '--json', '--limits', file('tight.json'));
    expect(tight.code).toBe(0);
    const t = JSON.parse(tight.out);
    expect(t.verdict).toBe('beyond');
    expect(t.limits[0]).toMatchObject({ property: 'area', field: 'maxLossPercent', allowed: 8.99, status: 'beyond' });
    close(t.limits[0].margin, 8.99 - 9, 1e-9);
  });

  it('prints a table with the verdict, the limits and the cautions', async () => {
    const r = await kern('compare', file('base.json'), file('notched.json'));
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Area\s+20000\s+18200\s+-1800\s+-9 %\s+mm²/);
    expect(r.out).toMatch(/Verdict: (WITHIN|BEYOND)/);
    expect(r.out).toMatch(/Example limits to start from/);
    expect(r.out).toMatch(/Sharp inside corner at \(140, 70\)/);
    expect(r.out).toMatch(/checked against the applicable code/);
  });

  it('converts a proposal in other units to the baseline units', async () => {
    const j = JSON.parse((await kern('compare', file('base.json'), file('notched-cm.json'), '--json')).out);
    expect(j.units).toBe('mm');
    close(j.proposal.area, 18200, 1e-12);
    expect(j.warnings.join(' ')).toMatch(/converted/);
  });

  it('chooses the hole rules with --rules', async () => {
    const en = JSON.parse((await kern('compare', file('base.json'), file('edge-hole.json'), '--json')).out);
    const aisc = JSON.parse((await kern('compare', file('base.json'), file('edge-hole.json'), '--json', '--rules', 'aisc360')).out);
    const edge = (j: { cautions: { kind: string; source?: string; values?: { required: number } }[] }) => j.cautions.find((c) => c.kind === 'hole-edge-distance')!;
    expect(edge(en).source).toMatch(/EN 1993-1-8/);
    close(edge(en).values!.required, 26.4, 1e-12);
    expect(edge(aisc).source).toMatch(/AISC 360-16, Section J3.4/);
    close(edge(aisc).values!.required, 26, 1e-12);
  });

  it('exits 2 for invalid input, with a clear message', async () => {
    const bad = spawned('compare', file('base.json'), 'tests/fixtures/open-path.json', '--json');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('shapes[0].segments[1].via: arc points are collinear');
    expect(bad.err).not.toMatch(/\bat .*\.ts:\d+/);
    expect((await kern('compare', file('base.json'), file('nope.json'))).code).toBe(2);
    expect((await kern('compare', file('base.json'), file('broken.json'))).err).toMatch(/not valid JSON/);
    const limits = await kern('compare', file('base.json'), file('notched.json'), '--limits', file('bad-limits.json'));
    expect(limits.code).toBe(2);
    expect(limits.err).toContain('limits[0].property: unknown property "Iz"');
    expect(limits.err).toContain('limits[1].maxShift: maxShift does not apply to Ix');
    expect((await kern('compare', file('base.json'), file('notched.json'), '--rules', 'xyz')).code).toBe(2);
    expect((await kern('compare', file('base.json'))).code).toBe(2);
    const variant = await kern('compare', file('base.json'), '--variant', 'Proposal A');
    expect(variant.code).toBe(2);
    expect(variant.err).toMatch(/this file has no proposals/);
    const unknown = await kern('compare', file('proposals.json'), '--variant', 'Proposal Z');
    expect(unknown.code).toBe(2);
    expect(unknown.err).toMatch(/there is no proposal named "Proposal Z"; the document has "Notch"/);
  });

  it('compares the baseline of one file with its named proposal, as two files would', async () => {
    const one = JSON.parse((await kern('compare', file('proposals.json'), '--variant', 'Notch', '--json')).out);
    const two = JSON.parse((await kern('compare', file('base.json'), file('notched.json'), '--json')).out);
    // Composite method (Hibbeler, Statics, Sec. 9.3): the notch takes 1800 of 20000.
    close(one.proposal.area, 18200, 1e-12);
    expect(one.change_percent.area).toBe(two.change_percent.area);
    expect(one.verdict).toBe(two.verdict);
  });
});

describe('kern netsection', () => {
  it('prints gross length, net length and the gaps (hand: 200 and 200 − 3·22)', async () => {
    const r = spawned('netsection', file('holes.json'), '--from', '50,-10', '--to', '50,210', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of ['gross_length', 'net_length', 'gaps']) expect(j).toHaveProperty(k);
    close(j.gross_length, 200, 1e-12);
    close(j.net_length, 134, 1e-12);
    expect(j.gaps).toHaveLength(3);
    expect(j.gaps[0]).toMatchObject({ kind: 'hole' });
    close(j.gaps[0].from, 39, 1e-12);
    close(j.gaps[0].to, 61, 1e-12);
    close(j.gaps[0].diameter, 22, 1e-12);
    expect(j.caution).toMatch(/staggered holes/);
    const t = await kern('netsection', file('holes.json'), '--from', '50,-10', '--to', '50,210');
    expect(t.out).toMatch(/Net length \(material only\)\s+134 mm/);
    expect(t.out).toMatch(/hole Ø22 from 39 to 61 \(22\) mm/);
  });

  it('exits 2 for bad points or a line of no length', async () => {
    expect((await kern('netsection', file('holes.json'), '--from', '50', '--to', '50,210')).code).toBe(2);
    expect((await kern('netsection', file('holes.json'), '--to', '50,210')).code).toBe(2);
    const zero = await kern('netsection', file('holes.json'), '--from', '5,5', '--to', '5,5');
    expect(zero.code).toBe(2);
    expect(zero.err).toMatch(/no length/);
  });
});
