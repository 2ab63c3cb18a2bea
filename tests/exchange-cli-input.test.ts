/**
 * The command line reads a DXF drawing in place of a section document (issue 4), with --units
 * when the drawing does not state them. Fixtures are hand-written DXF files in
 * tests/fixtures/dxf/; closed forms from Gere & Goodno, Mechanics of Materials, App. E
 * (rectangle, circle, semicircle, quarter-circle spandrel), combined by the composite method.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { DEMO_DOCUMENT, evaluateDocument } from '../src';
import { loadSectionFile } from '../cli/dxf-input';
import { close } from './helpers';

const FIX = join(__dirname, 'fixtures', 'dxf');

function props(path: string, units?: string) {
  const r = loadSectionFile(path, units);
  if (!r.ok) expect.fail(r.messages.join('\n'));
  const ev = evaluateDocument(r.doc);
  expect(ev.props, ev.message ?? '').not.toBeNull();
  return { doc: r.doc, p: ev.props!, warnings: r.warnings };
}

describe('loadSectionFile', () => {
  test('a DXF without units needs --units, and says so', () => {
    const r = loadSectionFile(join(FIX, 'bracket-no-units.dxf'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.messages[0]).toMatch(/does not state its units.*--units/);
  });

  test('with --units the bracket has the composite closed-form area', () => {
    const { doc, p } = props(join(FIX, 'bracket-no-units.dxf'), 'mm');
    expect(doc.units).toBe('mm');
    // Legs 80 × 10 and 10 × 50, plus the inside fillet R6: r² − πr²/4 (Gere & Goodno App. E, spandrel).
    close(p.area, 800 + 500 + (1 - Math.PI / 4) * 36, 1e-13);
  });

  test('a DXF that states mm, asked for in: converted, with a warning (1 in = 25.4 mm, NIST SP 811)', () => {
    const mm = props(join(FIX, 'plate-with-holes.dxf'));
    const inch = props(join(FIX, 'plate-with-holes.dxf'), 'in');
    expect(inch.doc.units).toBe('in');
    expect(inch.warnings.join('\n')).toMatch(/drawing is in mm; it was converted to in/);
    close(inch.p.area * 25.4 ** 2, mm.p.area, 1e-13);
    close(inch.p.Ix * 25.4 ** 4, mm.p.Ix, 1e-13);
    // Plate 200 × 120 less a Ø40 hole and a 40 × 30 slot with R15 ends (composite method).
    close(mm.p.area, 24000 - Math.PI * 400 - (1200 + Math.PI * 225), 1e-13);
  });

  test('bad --units, unreadable files and broken drawings give messages, not exceptions', () => {
    const dir = mkdtempSync(join(tmpdir(), 'kern-dxf-'));
    const bad = loadSectionFile(join(FIX, 'plate-with-holes.dxf'), 'furlong');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.messages[0]).toMatch(/--units must be one of mm, cm, m, in, ft/);
    const missing = loadSectionFile(join(dir, 'nope.dxf'));
    expect(missing.ok).toBe(false);
    if (!missing.ok) expect(missing.messages[0]).toMatch(/cannot read .*ENOENT/);
    writeFileSync(join(dir, 'garbage.dxf'), Buffer.from([0x00, 0xff, 0x13, 0x37, 0x80, 0x0a, 0x00]));
    const garbage = loadSectionFile(join(dir, 'garbage.dxf'), 'mm');
    expect(garbage.ok).toBe(false);
    if (!garbage.ok) expect(garbage.messages[0]).toMatch(/not a text DXF/);
    writeFileSync(join(dir, 'open.dxf'), '0\nSECTION\n2\nENTITIES\n0\nLINE\n5\nF1\n8\nCUT\n10\n0\n20\n0\n11\n5\n21\n0\n0\nENDSEC\n0\nEOF\n');
    const open = loadSectionFile(join(dir, 'open.dxf'), 'mm');
    expect(open.ok).toBe(false);
    if (!open.ok) expect(open.messages.join('\n')).toMatch(/no closed outline[\s\S]*handle F1, layer CUT/);
  });

  test('a section document (.json) is read as before', () => {
    const dir = mkdtempSync(join(tmpdir(), 'kern-json-'));
    writeFileSync(join(dir, 'demo.json'), JSON.stringify(DEMO_DOCUMENT));
    const { p } = props(join(dir, 'demo.json'));
    expect(p.area).toBe(evaluateDocument(DEMO_DOCUMENT).props!.area); // invariant: reading the file does not change the section
  });
});
