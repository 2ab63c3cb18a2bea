/**
 * The flitch-beam example (public/examples/flitch-beam.json): its headline values against a
 * transformed-section hand calculation.
 *
 * Sources:
 * - Gere & Goodno, Mechanics of Materials, composite beams, the transformed-section method
 *   (Sec. 6.3): n = E_steel / E_timber, the steel counts n times its area; second moments about the
 *   transformed centroid by the parallel-axis theorem; σ = n M (y − ȳ) / I_t in each material.
 * - Gere & Goodno, shear formula τ = VQ/(Ib) (Sec. 5.8), with the transformed Q and I and the
 *   actual width b (the composite-beam shear flow q = VQ/I).
 * - Hibbeler, Statics, composite bodies: the centroid Σ A ȳ / Σ A and the centre of gravity
 *   Σ ρ A ȳ / Σ ρ A.
 * - The kern of a section whose convex hull is a rectangle and whose Ixy = 0: the vertex for the
 *   edge at distance c from the centroid lies I/(A c) on the other side (Timoshenko, Strength of
 *   Materials, Part I, core of a section; from memory).
 */
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { analyseLoadCase, documentLoadUnits, evaluateDocument, kernOfSection, parseDocument, stressSection, type SectionDocument } from '../src';
import { close, worst } from './helpers';

const r = parseDocument(readFileSync('public/examples/flitch-beam.json', 'utf8'));
if (!r.ok) throw new Error(r.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
const doc: SectionDocument = r.doc;

// Hand calculation (mm, N, MPa). Two C24 leaves 63 × 225 at x 0..63 and 73..136; an S355 plate
// 10 × 180 at x 63..73, y 10..190.
const n = 210000 / 11000;
const At = 28350 + n * 1800;
const yt = (28350 * 112.5 + n * 1800 * 100) / At;
const Ix = 2 * ((63 * 225 ** 3) / 12) + 28350 * (112.5 - yt) ** 2 + n * ((10 * 180 ** 3) / 12 + 1800 * (100 - yt) ** 2);
const Iy = 2 * ((225 * 63 ** 3) / 12 + 14175 * 36.5 ** 2) + n * ((180 * 10 ** 3) / 12);
const M = -14e6; // N·mm: 14 kN·m sagging (Mx < 0 compresses the top)
const sigma = (y: number, nn: number) => (nn * M * (y - yt)) / Ix;

describe('flitch beam FB-2 (example)', () => {
  const ev = evaluateDocument(doc);
  const s = stressSection(doc, ev).section!;

  it('is a valid two-material document with its loads in kN and kN·m', () => {
    expect(doc.materials!.map((m) => m.id)).toEqual(['softwood-c24', 'steel-s355']);
    expect(documentLoadUnits(doc)).toEqual({ length: 'mm', force: 'kN', stress: 'MPa', momentLength: 'm' });
    expect(s.parts.map((p) => p.material.id)).toEqual(['softwood-c24', 'steel-s355']);
  });

  it('centroid of the area, centre of gravity and mass per length (Hibbeler, composite bodies)', () => {
    close(s.area, 30150, 1e-14);
    close(s.centroid.x, 68, 1e-14);
    close(s.centroid.y, (28350 * 112.5 + 1800 * 100) / 30150, 1e-14);
    const w = 420 * 28350 + 7850 * 1800;
    close(s.cg!.y, (420 * 28350 * 112.5 + 7850 * 1800 * 100) / w, 1e-14);
    close(s.cg!.x, 68, 1e-14);
    // kg/m: ρ A with A in m² (1 mm² = 1e-6 m²).
    close(s.massPerLength, w * 1e-6, 1e-14);
    // The two points differ by 6 mm: the steel is heavy and sits low.
    expect(s.centroid.y - s.cg!.y).toBeGreaterThan(6);
  });

  it('transformed section to the timber (Gere & Goodno, transformed-section method)', () => {
    const t = s.transformed;
    expect(t.reference).toBe('softwood-c24');
    close(t.area, At, 1e-14);
    close(t.centroid.x, 68, 1e-14);
    close(t.centroid.y, yt, 1e-14);
    close(t.Ix, Ix, 1e-13);
    close(t.Iy, Iy, 1e-13);
    close(t.Ixy, 0, 1e-12, Ix);
    const steel = s.parts[1];
    close(steel.stiffnessShare.x, (n * ((10 * 180 ** 3) / 12 + 1800 * (100 - yt) ** 2)) / Ix, 1e-13);
  });

  it('stresses at the extreme fibres of both materials under Mx = −14 kN·m, and τ at the neutral axis', () => {
    const cut = { axis: 'y' as const, at: yt };
    const lc = analyseLoadCase(s, doc.loads, documentLoadUnits(doc), cut);
    const by = Object.fromEntries(lc.extremes.byMaterial.map((e) => [e.material, e]));
    close(by['steel-s355'].max.value, sigma(10, n), 1e-13);
    close(by['steel-s355'].min.value, sigma(190, n), 1e-13);
    close(by['softwood-c24'].max.value, sigma(0, 1), 1e-13);
    close(by['softwood-c24'].min.value, sigma(225, 1), 1e-13);
    expect(by['steel-s355'].max.y).toBe(10);
    expect(by['softwood-c24'].min.y).toBe(225);
    expect(lc.extremes.maxTension!.material).toBe('steel-s355');
    // Headline values, as printed to 4 figures: steel 119.0 / −104.9 MPa, timber 6.886 / −7.778 MPa.
    expect(Math.round(lc.extremes.maxTension!.value * 10) / 10).toBe(119);
    expect(Math.round(lc.extremes.maxCompression!.value * 10) / 10).toBe(-104.9);
    // Under pure bending the neutral axis is the transformed centroidal axis.
    close(lc.axis!.point.y, yt, 1e-13);
    close(Math.abs(lc.axis!.direction.x), 1, 1e-15);
    // τ at y = ȳt: Q (transformed) of the part above; b = 63 + 10 + 63.
    const Q = 63 * (225 - yt) ** 2 + (n * 10 * (190 - yt) ** 2) / 2;
    close(lc.shear!.width, 136, 1e-14);
    close(lc.shear!.Q, Q, 1e-12);
    close(lc.shear!.tau!, (18e3 * Q) / (Ix * 136), 1e-12);
    // Neither material passes its fy: no caution of a stress beyond fy.
    expect(lc.cautions.some((c) => /beyond fy/.test(c))).toBe(false);
  });

  it('kern of the transformed section: the rhombus of its 136 × 225 hull', () => {
    const k = kernOfSection(s).points!;
    expect(k.length).toBe(4);
    const xs = k.map((p) => p[0]), ys = k.map((p) => p[1]);
    close(Math.min(...ys), yt - Ix / (At * (225 - yt)), 1e-13);
    close(Math.max(...ys), yt + Ix / (At * yt), 1e-13);
    close(Math.max(...xs), 68 + Iy / (At * 68), 1e-13);
    close(Math.min(...xs), 68 - Iy / (At * 68), 1e-13);
  });
});

afterAll(() => {
  console.log(`example-flitch-beam: largest relative error ${worst.value.toExponential(2)}`);
});
