/**
 * Torsion of a section document (src/section-torsion/): pieces by material with their shear
 * moduli, the settings a run uses, the rows and JSON every view prints, and the CLI
 * (`props --torsion`, `report --torsion`). Values against closed forms, each named beside it.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { computeSectionTorsion, evaluateDocument, resolveTorsionSettings, sectionPieces, shearModulus, torsionRows, type SectionDocument, type Shape } from '../src';

const dir = mkdtempSync(join(tmpdir(), 'kern-torsion-'));
function file(name: string, doc: object): string {
  const p = join(dir, name);
  writeFileSync(p, JSON.stringify(doc));
  return p;
}
function kern(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'cli/main.ts', ...args], { encoding: 'utf8' });
  return { code: r.status, out: r.stdout, err: r.stderr };
}
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const doc = (shapes: Shape[], extra: Partial<SectionDocument> = {}): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes, ...extra });
const square = (id: string, x: number, a: number, material?: string): Shape => ({ id, type: 'rectangle', at: [x, 0], width: a, height: a, ...(material ? { material } : {}) }) as Shape;

const STEEL = { id: 'steel', name: 'Steel', E: 210000, density: 7850, fy: 355, nu: 0.3 };
const ALU = { id: 'alu', name: 'Aluminium', E: 70000, density: 2700, fy: 160, nu: 0.33 };

describe('section pieces by material', () => {
  it('weights each material by G = E / (2(1 + ν)), in the reference material', () => {
    const d = doc([square('a', 0, 20, 'steel'), square('b', 40, 20, 'alu')], { materials: [STEEL, ALU], reference: 'steel' });
    const ev = evaluateDocument(d);
    const p = sectionPieces(ev, d);
    expect(p.pieces.map((x) => x.G)).toEqual([210000 / 2.6, 70000 / 2.66]);
    expect(p.referenceG).toBe(shearModulus(STEEL));
    const t = computeSectionTorsion(d, ev, { density: 'coarse' });
    expect(t.ok).toBe(true);
    if (!t.ok) return;
    // Two separate squares twist independently: J = Σ (G_i/G_ref) J_i, with J_i = 0.1406 a⁴
    // (Timoshenko & Goodier, Theory of Elasticity, §109, β for b/t = 1).
    const expected = 0.1406 * 20 ** 4 * (1 + shearModulus(ALU) / shearModulus(STEEL));
    expect(rel(t.result.J, expected)).toBeLessThan(0.005);
    expect(t.basis.reference?.id).toBe('steel');
    expect(t.cautions.some((c) => /weighted by the shear modulus/.test(c))).toBe(true);
    expect(t.cautions.at(-1)).toMatch(/licensed engineer/);
  });

  it('takes one material without materials, and refuses an empty section with its reason', () => {
    const d = doc([square('a', 0, 10)]);
    expect(sectionPieces(evaluateDocument(d), d).referenceG).toBe(1);
    const empty = computeSectionTorsion(doc([]), evaluateDocument(doc([])));
    expect(empty.ok).toBe(false);
    if (!empty.ok) expect(empty.message).toMatch(/no area/);
  });

  it("resolves Poisson's ratio: the setting, else the reference material's, else 0.3", () => {
    expect(resolveTorsionSettings(doc([]))).toEqual({ density: 'normal', poisson: 0.3, poissonFrom: 'default' });
    expect(resolveTorsionSettings(doc([], { materials: [ALU], reference: 'alu' }))).toEqual({ density: 'normal', poisson: 0.33, poissonFrom: 'reference material' });
    expect(resolveTorsionSettings(doc([], { materials: [ALU], reference: 'alu', torsion: { poisson: 0.2, density: 'fine' } }))).toEqual({ density: 'fine', poisson: 0.2, poissonFrom: 'setting' });
    expect(resolveTorsionSettings(doc([], { torsion: { density: 'fine' } }), { density: 'coarse', poisson: 0.1 }).density).toBe('coarse');
  });

  it('prints round-off as 0: the shear centre of a doubly symmetric section sits on its centroid', () => {
    const d = doc([{ id: 'i', type: 'i-beam', at: [-50, -100], depth: 200, flangeWidth: 100, flangeThickness: 8.5, webThickness: 5.6, rootRadius: 12 } as Shape]);
    const ev = evaluateDocument(d);
    const t = computeSectionTorsion(d, ev, { density: 'coarse' });
    if (!t.ok) throw new Error(t.message);
    const rows = torsionRows(t.result, 'mm', 200, ev.props!.centroid);
    const shown = Object.fromEntries(rows.map((r) => [r.key, r.text]));
    expect(shown['torsion.shearCentre.x']).toBe('0');
    expect(shown['torsion.shearCentre.dy']).toBe('0');
  });
});

describe('kern props --torsion', () => {
  // Round tube R = 50, t = 5: J = π(R⁴ − r⁴)/2 (Roark, Formulas for Stress and Strain, Table 10.1, hollow circle; from memory).
  const tube = file('tube.json', doc([{ id: 't', type: 'round-tube', at: [0, 0], outerDiameter: 100, wall: 5 } as Shape]));
  // Channel h = 200, b = 80, t_f = 10, t_w = 6, no fillets.
  const channel = file('channel.json', doc([{ id: 'c', type: 'channel', at: [0, 0], depth: 200, flangeWidth: 80, flangeThickness: 10, webThickness: 6, rootRadius: 0 } as Shape]));

  it('adds J, shear_center, Cw, mesh and the convergence estimate to --json', () => {
    const r = kern('props', tube, '--torsion', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(rel(j.J, (Math.PI * (50 ** 4 - 45 ** 4)) / 2)).toBeLessThan(0.005);
    expect(Math.hypot(j.shear_center.x, j.shear_center.y)).toBeLessThan(1e-6 * 100);
    expect(j.Cw).toBeLessThan(1e-6 * j.J * 100 ** 2); // a circular tube does not warp
    expect(j.mesh.nodes).toBeGreaterThan(100);
    expect(j.mesh.elements).toBeGreaterThan(10);
    expect(j.convergence.estimated_error).toBeGreaterThanOrEqual(0);
    expect(j.torsion.density).toBe('normal');
    expect(j.area).toBeGreaterThan(0); // the section properties are still there
  });

  it("puts a channel's shear centre where the thin-wall formula does", () => {
    const r = kern('props', channel, '--torsion', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    // Gere & Goodno, Mechanics of Materials, shear centre of a thin-walled channel:
    // e = 3b²t_f / (6b·t_f + h·t_w) from the web's mid-line, b and h between wall mid-lines.
    const b = 80 - 3, h = 200 - 10, e = (3 * b * b * 10) / (6 * b * 10 + h * 6);
    expect(rel(3 - j.shear_center.x, e)).toBeLessThan(0.03);
    expect(Math.abs(j.shear_center.y - 100)).toBeLessThan(1e-6 * 200);
    expect(j.torsion.poisson).toBe(0.3);
  });

  it('prints the torsion rows with the settings and cautions in the table', () => {
    const r = kern('props', channel, '--torsion', '--density', 'coarse', '--poisson', '0.25');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Torsion by finite elements \(coarse density, ν = 0.25 \(set for this section\)\)/);
    expect(r.out).toMatch(/Torsion constant\s+6\d(\.\d+)? × 10³ mm⁴/);
    expect(r.out).toMatch(/Warping constant\s+1\d(\.\d+)? × 10⁹ mm⁶/);
    expect(r.out).toMatch(/torsion: .*licensed engineer/);
  });

  it('refuses bad options with exit 2 and a message', () => {
    for (const [args, msg] of [
      [['--torsion', '--density', 'medium'], /--density must be one of coarse, normal, fine/],
      [['--torsion', '--poisson', '0.5'], /at least 0 and below 0.5/],
      [['--torsion', '--poisson', 'x'], /Poisson's ratio/],
      [['--density', 'fine'], /go with --torsion/],
      [['--torsion=fine'], /takes no value/],
      [['--torsion', '--poisson'], /needs a value/],
    ] as [string[], RegExp][]) {
      const r = kern('props', channel, ...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.err).toMatch(msg);
    }
  });

  it('exits 2 with the reason when the section cannot be meshed', () => {
    const empty = file('empty.json', doc([]));
    const r = kern('props', empty, '--torsion');
    expect(r.code).toBe(2);
  });
});

describe('kern report with torsion', () => {
  it('runs torsion when the document asks for it, states the density and marks S in the figure', () => {
    const f = file('bracket.json', doc([{ id: 'c', type: 'channel', at: [0, 0], depth: 120, flangeWidth: 50, flangeThickness: 8, webThickness: 6, rootRadius: 6 } as Shape], { torsion: { density: 'coarse' } }));
    const out = join(dir, 'r.html');
    const r = kern('report', f, '--out', out);
    expect(r.code).toBe(0);
    const html = readFileSync(out, 'utf8');
    expect(html).toContain('data-torsion="ok"');
    expect(html).toMatch(/Computed when this report was made: coarse mesh density/);
    expect(html).toContain('class="shear-centre"');
    expect(html).toContain('data-prop="torsion.Cw"');
    const plain = join(dir, 'p.html');
    expect(kern('report', file('plain.json', doc([square('a', 0, 10)])), '--out', plain).code).toBe(0);
    expect(readFileSync(plain, 'utf8')).not.toContain('data-torsion');
    expect(kern('report', f, '--out', plain, '--density', 'huge').code).toBe(2);
  });
});
