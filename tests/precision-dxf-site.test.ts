/**
 * A drawing at site coordinates: the plate of tests/fixtures/dxf/plate-with-holes.dxf moved by
 * (503 217.25, 4 012 684.5) mm, as plant and site drawings place their parts
 * (tests/fixtures/dxf/site-plate-with-holes.dxf, the same entities with every 10/20 coordinate
 * shifted). Imported as it is, it must give the properties of the same part at the origin.
 *
 * Checks: the composite closed form for the plate (200 × 120 less a Ø40 hole and a 40 × 30 slot
 * with R15 ends; Gere & Goodno App. E rectangle and circle, Hibbeler composite areas), and the
 * exact identities of translation (centroidal moments, moduli and cuts unchanged, the centroid
 * moved by the offset).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { importDxf } from '../src/exchange/dxf-import';
import { cutSection, evaluateDocument, type SectionDocument } from '../src';
import { close, worst } from './helpers';

const FIX = join(__dirname, 'fixtures', 'dxf');
const DX = 503217.25, DY = 4012684.5;
const TOL = 1e-9;

function load(name: string) {
  const r = importDxf(readFileSync(join(FIX, name), 'utf8'));
  if (!r.ok) expect.fail(`import failed: ${r.error}`);
  const doc: SectionDocument = { format: 'kern-section', version: 2, units: r.units ?? 'mm', shapes: r.shapes };
  const ev = evaluateDocument(doc);
  expect(ev.props, ev.message ?? '').not.toBeNull();
  return { region: ev.region, p: ev.props! };
}

describe('a DXF drawing at site coordinates', () => {
  it('has the properties of the same part at the origin', () => {
    const at0 = load('plate-with-holes.dxf');
    const site = load('site-plate-with-holes.dxf');
    const p0 = at0.p, p1 = site.p;
    // Composite closed form of the plate (Gere & Goodno App. E; Hibbeler, composite areas).
    const A = 24000 - Math.PI * 400 - (1200 + Math.PI * 225);
    close(p0.area, A, 1e-13);
    close(p1.area, A, TOL);
    for (const k of ['Ix', 'Iy', 'I1', 'I2', 'J0', 'Zx', 'Zy', 'Sx_top', 'Sx_bottom', 'Sy_left', 'Sy_right', 'rx', 'ry'] as const) {
      close(p1[k], p0[k], TOL);
    }
    close(p1.Ixy, p0.Ixy, TOL, p0.J0);
    // The centroid moves by the offset (to the last digits a coordinate near 4e6 holds).
    expect(Math.abs(p1.centroid.x - DX - p0.centroid.x)).toBeLessThan(1e-9 * 200);
    expect(Math.abs(p1.centroid.y - DY - p0.centroid.y)).toBeLessThan(1e-9 * 200);
    close(p1.plasticAxis.y - DY, p0.plasticAxis.y, 1e-12, 120);
    // Cuts through the hole's centre line and through the slot: b and Q agree.
    for (const y of [60, 47.5, 100]) {
      const c0 = cutSection(at0.region, 'y', y, p0), c1 = cutSection(site.region, 'y', y + DY, p1);
      close(c1.width, c0.width, TOL, 200);
      close(c1.Q, c0.Q, TOL, p0.area * 60);
    }
    for (const x of [50, 140, 180]) {
      const c0 = cutSection(at0.region, 'x', x, p0), c1 = cutSection(site.region, 'x', x + DX, p1);
      close(c1.width, c0.width, TOL, 120);
      close(c1.Q, c0.Q, TOL, p0.area * 100);
    }
  });
});

afterAll(() => {
  console.log(`precision-dxf-site: largest relative error ${worst.value.toExponential(2)}`);
});
