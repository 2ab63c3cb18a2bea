/**
 * Whole documents with booleans (clipper-lib topology, exact geometry) against closed forms.
 * The quality bar: properties within 1e-9 relative of the closed form, booleans included.
 */
import { afterAll, describe, it } from 'vitest';
import { evaluateDocument, type SectionDocument, type Shape } from '../src';
import { close, worst } from './helpers';

const PI = Math.PI;
const TOL = 1e-9;
const doc = (shapes: Shape[]): SectionDocument => ({ format: 'kern-section', version: 2, units: 'mm', shapes });
const evalProps = (shapes: Shape[]) => {
  const ev = evaluateDocument(doc(shapes));
  if (!ev.props) throw new Error(ev.message ?? 'no properties');
  return ev.props;
};
const rectPts = (x: number, y: number, w: number, h: number): [number, number][] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]];

/** Circular segment of half-angle α (Roark, Table A.1; Gere & Goodno, plane areas, segment). */
function segmentProps(r: number, alpha: number) {
  const s = Math.sin(alpha), c = Math.cos(alpha);
  const A = r * r * (alpha - s * c);
  const d = (2 * r * s ** 3) / (3 * (alpha - s * c)); // centroid from the centre
  const Ichord = (r ** 4 * (alpha - s * c + 2 * s ** 3 * c)) / 4; // about the centre's axis parallel to the chord
  const Isym = (r ** 4 * (3 * alpha - 3 * s * c - 2 * s ** 3 * c)) / 12; // about the symmetry axis
  return { A, d, Ichord, Isym };
}

describe('booleans in documents', () => {
  it('circle ∩ half-plane = circular segment', () => {
    // Circle r = 10 at the origin, keep y ≥ 4: a segment with cos α = 4/10 about the +y axis.
    const r = 10, h = 4, alpha = Math.acos(h / r);
    const p = evalProps([
      { id: 'c', type: 'circle', center: [0, 0], radius: r },
      { id: 'k', type: 'polygon', points: rectPts(-20, h, 40, 30), op: 'intersect' },
    ]);
    const sg = segmentProps(r, alpha);
    close(p.area, sg.A, TOL);
    close(p.centroid.y, sg.d, TOL);
    close(p.centroid.x, 0, TOL, r);
    close(p.Ix, sg.Ichord - sg.A * sg.d * sg.d, TOL);
    close(p.Iy, sg.Isym, TOL);
    close(p.bounds.ymax, r, TOL);
    close(p.bounds.xmax, Math.sqrt(r * r - h * h), TOL);
  });

  it('circle − lower half = semicircle', () => {
    // Gere & Goodno, plane areas, semicircle: ȳ = 4r/3π, Ix = (9π² − 64) r⁴/72π, Iy = πr⁴/8.
    const r = 7;
    const p = evalProps([
      { id: 'c', type: 'circle', center: [3, -2], radius: r },
      { id: 'k', type: 'polygon', points: rectPts(-10, -20, 30, 18), op: 'subtract' },
    ]);
    close(p.area, (PI * r * r) / 2, TOL);
    close(p.centroid.y, -2 + (4 * r) / (3 * PI), TOL);
    close(p.Ix, ((9 * PI * PI - 64) * r ** 4) / (72 * PI), TOL);
    close(p.Iy, (PI * r ** 4) / 8, TOL);
    // About the vertical symmetry axis the plastic modulus is twice a quarter circle's first moment:
    // Zy = 2 · (πr²/4)(4r/3π) = 2r³/3 (Gere & Goodno, Sec. 6.10 method; plane areas, quarter circle).
    close(p.Zy, (2 * r ** 3) / 3, TOL);
  });

  it('union of two overlapping circles = two circles − lens', () => {
    // Lens = two circular segments with cos α = d / 2r (Roark, Table A.1, segment).
    const r = 5, d = 6, alpha = Math.acos(d / (2 * r));
    const p = evalProps([
      { id: 'a', type: 'circle', center: [0, 0], radius: r },
      { id: 'b', type: 'circle', center: [d, 0], radius: r },
    ]);
    const sg = segmentProps(r, alpha);
    const A = 2 * PI * r * r - 2 * sg.A;
    close(p.area, A, TOL);
    close(p.centroid.x, d / 2, TOL);
    // Iy about x = d/2: each full circle πr⁴/4 + πr²(d/2)²; the lens is two segments whose chords
    // lie on x = d/2: each segment's moment about its chord = Ichord − 2 (area · offset of chord).
    const chordOffset = d / 2; // distance from each centre to the common chord
    const segAboutChord = sg.Ichord - 2 * chordOffset * sg.A * sg.d + sg.A * chordOffset ** 2;
    const Iy = 2 * ((PI * r ** 4) / 4 + PI * r * r * chordOffset ** 2) - 2 * segAboutChord;
    close(p.Iy, Iy, TOL);
    // Ix: circles πr⁴/4 each about their centre line; each segment Isym about the same line.
    close(p.Ix, 2 * ((PI * r ** 4) / 4) - 2 * sg.Isym, TOL);
    close(p.perimeter, 2 * (2 * PI * r - 2 * alpha * r), TOL);
  });

  it('plate with an off-centre bore, by the composite method', () => {
    // Hibbeler, Statics, Sec. 9.3 (composite bodies); parallel axes, Gere & Goodno, Sec. 12.5.
    const b = 200, h = 100, r = 20, hx = 140, hy = 35;
    const p = evalProps([
      { id: 'plate', type: 'polygon', points: rectPts(0, 0, b, h) },
      { id: 'bore', type: 'circle', center: [hx, hy], radius: r, op: 'subtract' },
    ]);
    const A1 = b * h, A2 = PI * r * r, A = A1 - A2;
    const xb = (A1 * (b / 2) - A2 * hx) / A, yb = (A1 * (h / 2) - A2 * hy) / A;
    close(p.area, A, TOL);
    close(p.Ix, (b * h ** 3) / 12 + A1 * (h / 2 - yb) ** 2 - ((PI * r ** 4) / 4 + A2 * (hy - yb) ** 2), TOL);
    close(p.Iy, (h * b ** 3) / 12 + A1 * (b / 2 - xb) ** 2 - ((PI * r ** 4) / 4 + A2 * (hx - xb) ** 2), TOL);
    close(p.Ixy, A1 * (b / 2 - xb) * (h / 2 - yb) - A2 * (hx - xb) * (hy - yb), TOL, p.J0);
  });

  it('I-shape with a round web opening wider than the web', () => {
    // Composite: I from three plates (Gere & Goodno, Sec. 5.8) minus the part of a circle inside
    // the web strip |x| ≤ tw/2, i.e. the circle minus its two side segments (Roark, Table A.1).
    const d = 300, bf = 150, tf = 12, tw = 8, R = 20, yc = 150;
    const I = [
      [-bf / 2, 0], [bf / 2, 0], [bf / 2, tf], [tw / 2, tf], [tw / 2, d - tf], [bf / 2, d - tf], [bf / 2, d],
      [-bf / 2, d], [-bf / 2, d - tf], [-tw / 2, d - tf], [-tw / 2, tf], [-bf / 2, tf],
    ] as [number, number][];
    const p = evalProps([
      { id: 'I', type: 'polygon', points: I },
      { id: 'hole', type: 'circle', center: [0, yc], radius: R, op: 'subtract' },
    ]);
    const alpha = Math.acos(tw / 2 / R); // each side segment beyond |x| = tw/2
    const sg = segmentProps(R, alpha);
    const Aweb = PI * R * R - 2 * sg.A; // circle ∩ web strip
    const AI = 2 * bf * tf + tw * (d - 2 * tf);
    close(p.area, AI - Aweb, TOL);
    const IxI = (bf * d ** 3 - (bf - tw) * (d - 2 * tf) ** 3) / 12;
    // Moment of circle ∩ strip about the horizontal axis through the centre: circle πR⁴/4 minus the
    // two segments' moments about their symmetry axis (the horizontal centre line).
    const IxWeb = (PI * R ** 4) / 4 - 2 * sg.Isym;
    close(p.Ix, IxI - IxWeb, TOL); // hole centred at mid-depth: no transfer term
    const IyI = (2 * tf * bf ** 3 + (d - 2 * tf) * tw ** 3) / 12;
    // Iy of circle ∩ strip: ∫x² over the circle minus the two segments' ∫x² about the centre,
    // where each segment's ∫x² about the centre is its Ichord (axis through the centre ∥ chord).
    close(p.Iy, IyI - ((PI * R ** 4) / 4 - 2 * sg.Ichord), TOL);
  });
});

afterAll(() => {
  console.log(`document booleans: largest relative error ${worst.value.toExponential(2)}`);
});
