/**
 * Line elements on the command line: `props` with line groups (JSON and table), a document of line
 * elements only, and `kern weld`.
 *
 * Sources: Blodgett, Design of Welded Structures (1966), Table 5, C-shaped group (weld on three
 * sides, b = 5 in flanges, d = 10 in web): L = 2b + d, Nx = b²/(2b + d), Jw = (2b + d)³/12 −
 * b²(b + d)²/(2b + d) (from memory); two parallel lines d long at distance b: Jw = d(3b² + d²)/6
 * (from memory). Sect. 7.4: the force per unit length at a point is F/L plus the twisting part
 * T·r/Jw, added as vectors; the 20 kip example below is worked by hand in tests/lines-weld.test.ts.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { close } from './helpers';

function kern(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const b = 5, d = 10;
const Jw = (2 * b + d) ** 3 / 12 - (b * b * (b + d) ** 2) / (2 * b + d);

describe('kern props with line elements', () => {
  it('a document of line elements only: exit 0, the line group, the area properties marked absent', () => {
    const r = kern('props', 'tests/fixtures/weld-three-sides.json', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.area_properties).toBe('absent');
    expect(j.message).toMatch(/line elements only/i);
    expect(j).not.toHaveProperty('area');
    for (const k of ['length', 'centroid', 'Ix', 'Iy', 'Ixy', 'J']) expect(j.lines).toHaveProperty(k);
    close(j.lines.length, 2 * b + d, 1e-15);
    close(j.lines.centroid.x, (b * b) / (2 * b + d), 1e-15); // Blodgett Table 5: Nx = b²/(2b + d)
    close(j.lines.centroid.y, 5, 1e-15);
    close(j.lines.J, Jw, 1e-13); // Blodgett Table 5, C-shape
    close(j.lines.Ix, 2 * b * 25 + d ** 3 / 12, 1e-13); // two flanges at ±d/2 plus the web d³/12
    expect(j.lines.group).toBe('Weld');
    expect(j.line_groups.Weld).toEqual(j.lines);
  });

  it('a section with two line groups: every group by name, the first under "lines", the area results as before', () => {
    const j = JSON.parse(kern('props', 'tests/fixtures/weld-two-groups.json', '--json').out);
    close(j.area, 20000, 1e-15);
    expect(Object.keys(j.line_groups)).toEqual(['Left', 'Right']);
    expect(j.lines.group).toBe('Left');
    // "Left": two parallel lines d = 200 long at distance b = 20 (Blodgett Table 5: Jw = d(3b² + d²)/6).
    close(j.line_groups.Left.J, (200 * (3 * 400 + 200 ** 2)) / 6, 1e-13);
    expect(j.line_groups.Left.elements).toHaveLength(2);
    // "Right": one line, Ix = L³/12 (Blodgett Table 5, single line), Iy = 0.
    close(j.line_groups.Right.Ix, 200 ** 3 / 12, 1e-13);
    expect(j.line_groups.Right.Sy_left).toBeNull();
  });

  it('the table shows each line group with units and the caution', () => {
    const r = kern('props', 'tests/fixtures/weld-three-sides.json');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Area properties: absent/);
    expect(r.out).toMatch(/Line group "Weld" \(1 line element\), per unit thickness:/);
    // Jw = 385.4 in³ to 4 figures.
    expect(r.out).toMatch(/Polar moment, centroidal\s+385\.4 in³/);
    expect(r.out).toMatch(/per unit throat for welds/);
    expect(r.out).toMatch(/checked against the applicable code/);
  });

  it('an empty section is still refused (exit 2): only line elements make a section without area valid', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'kern-lines-')), 'empty.json');
    writeFileSync(file, JSON.stringify({ format: 'kern-section', version: 2, units: 'mm', shapes: [] }));
    const r = kern('props', file, '--json');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/empty/);
  });
});

describe('kern weld', () => {
  const tip = Math.hypot((235 * 5) / Jw, 1 + (235 * 3.75) / Jw); // Blodgett Sect. 7.4, at the flange tips

  it("the document's weld loads: largest force per length at the flange tips, in kip/in", () => {
    const r = kern('weld', 'tests/fixtures/weld-three-sides.json', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.welds).toHaveLength(1);
    const w = j.welds[0];
    expect(w.name).toBe('Bracket load');
    close(w.critical.f, tip, 1e-13);
    close(w.critical.f, 4.4828, 1e-4); // the hand figure
    close(w.moment_about_centroid, -235, 1e-13);
    expect([w.critical.y, w.also_critical[0].y].sort((a: number, c: number) => a - c)).toEqual([0, 10]);
    expect(w.units).toEqual({ force: 'kip', length: 'in', moment: 'kip·in', force_per_length: 'kip/in' });
    expect(j.caution).toMatch(/elastic vector method only/);
  });

  it('one load on the command line: a force through the centroid with its moment is the same load as the eccentric force', () => {
    const r = kern('weld', 'tests/fixtures/weld-three-sides.json', '--at', '1.25,5', '--m', '-235', '--fy', '-20', '--json');
    expect(r.code).toBe(0);
    close(JSON.parse(r.out).welds[0].critical.f, tip, 1e-13);
    const text = kern('weld', 'tests/fixtures/weld-three-sides.json', '--at', '13,5', '--fy', '-20');
    expect(text.out).toMatch(/Largest force per length\s+4\.483 kip\/in/);
    expect(text.out).toMatch(/elastic vector method only/);
  });

  it('refuses what it cannot do, with exit code 2 and a message', () => {
    const nope = kern('weld', 'tests/fixtures/weld-three-sides.json', '--group', 'Top');
    expect(nope.code).toBe(2);
    expect(nope.err).toContain('there is no line group "Top"; the section\'s line groups are "Weld"');
    const two = kern('weld', 'tests/fixtures/weld-two-groups.json', '--at', '0,0', '--fx', '1');
    expect(two.code).toBe(2);
    expect(two.err).toContain('name one with --group');
    const none = kern('weld', 'tests/fixtures/weld-two-groups.json');
    expect(none.code).toBe(2);
    expect(none.err).toContain('the document has no weld loads');
    const noForce = kern('weld', 'tests/fixtures/weld-three-sides.json', '--at', '0,0');
    expect(noForce.code).toBe(2);
    expect(noForce.err).toContain('needs a force or a moment');
    const noLines = kern('weld', 'tests/fixtures/plate-with-bore.json');
    expect(noLines.code).toBe(2);
    expect(noLines.err).toContain('has no line elements');
  });
});
