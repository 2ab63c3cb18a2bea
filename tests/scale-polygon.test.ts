/**
 * A 200 000-vertex regular polygon, drawn as one polygon shape, from the document to its
 * properties: every vertex kept, and the closed forms of the regular polygon.
 *
 * Source: Roark's Formulas for Stress and Strain (Young & Budynas, 7th ed.), Table A.1, regular
 * polygon with n sides (from memory): with circumradius R and side a = 2R sin(π/n),
 * A = n R² sin(2π/n) / 2 and, about any centroidal axis, I = A(6R² − a²)/24, so the polar moment
 * is J = A(6R² − a²)/12.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDocument, type SectionDocument } from '../src';
import { close, worst } from './helpers';

describe('a 200 000-vertex regular polygon', () => {
  it('keeps every vertex and has the closed-form area and polar moment', () => {
    const n = 200000, R = 250;
    const points: [number, number][] = [];
    for (let i = 0; i < n; i++) points.push([R * Math.cos((2 * Math.PI * i) / n), R * Math.sin((2 * Math.PI * i) / n)]);
    const doc: SectionDocument = { format: 'kern-section', version: 2, units: 'mm', shapes: [{ id: 'dense', type: 'polygon', points }] };
    const ev = evaluateDocument(doc);
    expect(ev.warnings).toEqual([]);
    expect(ev.region.length).toBe(1);
    expect(ev.region[0].xy.length / 2).toBe(n);
    const p = ev.props!;
    const A = (n * R * R * Math.sin((2 * Math.PI) / n)) / 2;
    const a = 2 * R * Math.sin(Math.PI / n);
    close(p.area, A, 1e-12);
    close(p.J0, (A * (6 * R * R - a * a)) / 12, 1e-12);
    close(p.Ix, (A * (6 * R * R - a * a)) / 24, 1e-12);
    close(p.Iy, (A * (6 * R * R - a * a)) / 24, 1e-12);
    close(p.Ixy, 0, 1e-12, p.J0);
    close(p.centroid.x, 0, 1e-12, R);
    close(p.centroid.y, 0, 1e-12, R);
  });
});

afterAll(() => {
  console.log(`scale-polygon: largest relative error ${worst.value.toExponential(2)}`);
});
