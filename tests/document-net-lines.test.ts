/**
 * Net-section lines in the section document (`netLines`, format version 2): read, validated with
 * a path for every problem, converted with the units, and kept on save. The net length along a
 * stored line is checked against a hand calculation: a plate 200 wide with three holes Ø22 on the
 * line loses exactly three diameters (a straight line through a circle's centre crosses it along
 * its diameter: Gere & Goodno, plane areas, circle; elementary geometry, no further source).
 */
import { describe, expect, it } from 'vitest';
import { convertDocumentUnits, evaluateDocument, netSection, parseDocument, serialiseDocumentText, type SectionDocument } from '../src';

const base = {
  format: 'kern-section',
  version: 2,
  units: 'mm',
  shapes: [
    { id: 'plate', type: 'rectangle', at: [0, 0], width: 200, height: 120 },
    { id: 'h1', type: 'circle', center: [40, 60], radius: 11, op: 'subtract' },
    { id: 'h2', type: 'circle', center: [100, 60], radius: 11, op: 'subtract' },
    { id: 'h3', type: 'circle', center: [160, 60], radius: 11, op: 'subtract' },
  ],
};

function errorsOf(extra: Record<string, unknown>): string[] {
  const r = parseDocument(JSON.stringify({ ...base, ...extra }));
  return r.ok ? [] : r.errors.map((e) => `${e.path}: ${e.message}`);
}

describe('netLines in the document', () => {
  it('reads lines with and without a name and keeps them on save', () => {
    const lines = [{ name: 'Row A', from: [-10, 60], to: [210, 60] }, { from: [100, -5], to: [100, 125] }];
    const r = parseDocument(JSON.stringify({ ...base, netLines: lines }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.netLines).toEqual(lines);
    const again = parseDocument(serialiseDocumentText(r.doc));
    expect(again.ok && again.doc.netLines).toEqual(lines);
  });
  it('refuses malformed lines, each with its path', () => {
    expect(errorsOf({ netLines: { from: [0, 0], to: [1, 1] } })).toEqual(['netLines: netLines must be a list of lines like {"from": [x, y], "to": [x, y]}']);
    expect(errorsOf({ netLines: [{ from: [0, 0] }] })).toEqual(['netLines[0].to: a point must be [x, y], got undefined']);
    expect(errorsOf({ netLines: [{ from: [0, 'a'], to: [1, 1] }] })[0]).toMatch(/^netLines\[0\]\.from: both coordinates must be finite numbers/);
    expect(errorsOf({ netLines: [{ from: [5, 5], to: [5, 5] }] })).toEqual(['netLines[0]: the line has no length: from and to are the same point']);
    expect(errorsOf({ netLines: [{ from: [0, 0], to: [1, 1], name: 3 }] })).toEqual(['netLines[0].name: name must be text']);
    expect(errorsOf({ netLines: [{ from: [0, 0], to: [1, 1], colour: 'red' }] })).toEqual(['netLines[0].colour: unknown field; a net-section line has from, to and an optional name']);
    expect(errorsOf({ netLines: [7] })).toEqual(['netLines[0]: a net-section line must be an object {"from": [x, y], "to": [x, y]}']);
  });
  it('converts with the units', () => {
    const doc = { ...base, netLines: [{ from: [-10, 60], to: [210, 60] }] } as unknown as SectionDocument;
    const cm = convertDocumentUnits(doc, 'cm');
    expect(cm.netLines).toEqual([{ from: [-1, 6], to: [21, 6] }]);
    // The input is not changed.
    expect(doc.netLines![0].from).toEqual([-10, 60]);
  });
  it('a stored line through a row of three holes Ø22 gives net = 200 − 3·22 = 134', () => {
    const doc = { ...base, netLines: [{ from: [-10, 60], to: [210, 60] }] } as unknown as SectionDocument;
    const l = doc.netLines![0];
    const r = netSection(evaluateDocument(doc).region, { x: l.from[0], y: l.from[1] }, { x: l.to[0], y: l.to[1] });
    expect(Math.abs(r.grossLength - 200)).toBeLessThanOrEqual(1e-12 * 200);
    expect(Math.abs(r.netLength - 134)).toBeLessThanOrEqual(1e-12 * 200);
    expect(r.gaps.map((g) => g.kind)).toEqual(['hole', 'hole', 'hole']);
    for (const g of r.gaps) expect(Math.abs(g.diameter! - 22)).toBeLessThanOrEqual(1e-12 * 22);
  });
});
