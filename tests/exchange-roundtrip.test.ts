/**
 * Export → import round trip through DXF: the section that comes back must have the same
 * properties to 1e-9 relative (issue 4), checked on regions with arcs, holes and an island,
 * and against closed forms where one exists (Gere & Goodno App. E; Roark Table A.1).
 */
import { afterAll, describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { exportDxf } from '../src/exchange/dxf-export';
import { importDxf } from '../src/exchange/dxf-import';
import {
  circleContour,
  DEMO_DOCUMENT,
  evaluateDocument,
  PROPERTY_CATALOG,
  reverseContour,
  rotateRegion,
  sectionProperties,
  type Region,
  type SectionDocument,
  type SectionProperties,
  type Shape,
} from '../src';
import { rect, sector } from './helpers';

let worst = 0;
let worstKey = "";
afterAll(() => {
  console.log(`DXF round trip: largest relative property difference ${worst.toExponential(2)} (${worstKey})`);
});

/** Every catalogued property agrees to tol, relative to the property's size (L^power for near-zero ones). */
function agree(a: SectionProperties, b: SectionProperties, tol = 1e-9): void {
  const L = Math.max(a.bounds.xmax - a.bounds.xmin, a.bounds.ymax - a.bounds.ymin);
  for (const info of PROPERTY_CATALOG) {
    const va = info.get(a), vb = info.get(b);
    const scale = info.power === 0 ? 90 : Math.pow(L, info.power) * 1e-6;
    // θ names an axis: θ and θ ± 180° are the same axis (Gere & Goodno, principal axes).
    const diff = info.key === 'theta' ? Math.abs(((((va - vb) % 180) + 270) % 180) - 90) : Math.abs(va - vb);
    const err = diff / Math.max(Math.abs(va), scale);
    if (err > worst) worstKey = info.key;
    worst = Math.max(worst, err);
    expect(err, `${info.key}: ${va} vs ${vb}`).toBeLessThanOrEqual(tol);
  }
}

function doc(shapes: Shape[]): SectionDocument {
  return { format: 'kern-section', version: 2, units: 'mm', shapes };
}

/** Export, import, and evaluate the imported shapes as a document (booleans included). */
function roundTrip(region: Region) {
  const text = exportDxf(region, 'mm');
  const r = importDxf(text);
  if (!r.ok) throw new Error(r.error);
  expect(r.problems).toEqual([]);
  expect(r.units).toBe('mm');
  const ev = evaluateDocument(doc(r.shapes));
  if (!ev.props) throw new Error(ev.message ?? 'no properties');
  return { direct: sectionProperties(r.region), viaDocument: ev.props, shapes: r.shapes };
}

const CASES: [string, () => Region][] = [
  ['demo section (I with fillets, cover plate, web opening)', () => evaluateDocument(DEMO_DOCUMENT).region],
  ['plate with two round holes', () => [rect(0, 0, 200, 120), reverseContour(circleContour(50, 60, 20)), reverseContour(circleContour(140, 60, 25))]],
  ['ring', () => [circleContour(3, -2, 50), reverseContour(circleContour(3, -2, 40))]],
  ['island in a hole', () => [rect(-10, -10, 20, 20), reverseContour(rect(-6, -6, 12, 12)), circleContour(0, 0, 3)]],
  ['sector rotated 33°', () => rotateRegion([sector(1, 2, 30, 1.1)], (33 * Math.PI) / 180, 5, 5)],
  [
    'rotated rectangular tube with corner radii',
    () => evaluateDocument(doc([{ id: 't', type: 'rect-tube', at: [10, 20], width: 120, height: 80, wall: 6, outerRadius: 12, rotation: 27 }])).region,
  ],
];

describe('DXF export → import keeps every property to 1e-9', () => {
  for (const [name, make] of CASES) {
    test(name, () => {
      const region = make();
      const before = sectionProperties(region);
      const { direct, viaDocument } = roundTrip(region);
      agree(before, direct);
      agree(before, viaDocument);
    });
  }

  test('ring against the closed form', () => {
    const { viaDocument: p } = roundTrip([circleContour(0, 0, 50), reverseContour(circleContour(0, 0, 40))]);
    expect(Math.abs(p.area - Math.PI * (50 ** 2 - 40 ** 2)) / p.area).toBeLessThan(1e-12); // π(R² − r²) (Roark Table A.1)
    expect(Math.abs(p.Ix - (Math.PI * (50 ** 4 - 40 ** 4)) / 4) / p.Ix).toBeLessThan(1e-12); // π(R⁴ − r⁴)/4 (Roark Table A.1)
  });

  test('random plates with round holes (fast-check)', () => {
    // Invariant: export then import is the identity on the section (issue 4: 1e-9 relative).
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 500, noNaN: true }),
        fc.double({ min: 20, max: 500, noNaN: true }),
        fc.array(fc.tuple(fc.double({ min: 0.1, max: 0.9, noNaN: true }), fc.double({ min: 0.1, max: 0.9, noNaN: true }), fc.double({ min: 0.01, max: 0.08, noNaN: true })), { maxLength: 4 }),
        fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }),
        (w, h, holes, angle) => {
          const region: Region = [rect(0, 0, w, h)];
          const placed: [number, number, number][] = [];
          for (const [fx, fy, fr] of holes) {
            const r = fr * Math.min(w, h), cx = fx * w, cy = fy * h;
            if (cx - r <= 0 || cx + r >= w || cy - r <= 0 || cy + r >= h) continue;
            if (placed.some(([x, y, q]) => Math.hypot(x - cx, y - cy) <= q + r + 1e-6 * w)) continue;
            placed.push([cx, cy, r]);
          }
          const full = rotateRegion([...region, ...placed.map(([x, y, r]) => reverseContour(circleContour(x, y, r)))], angle, 7, 3);
          const before = sectionProperties(full);
          const { direct, viaDocument } = roundTrip(full);
          agree(before, direct);
          agree(before, viaDocument);
        },
      ),
      { numRuns: 40, seed: 11 },
    );
  });
});

describe('the DXF text', () => {
  test('header states $INSUNITS and every contour is a closed LWPOLYLINE with its bulges', () => {
    const region: Region = [rect(0, 0, 10, 10), reverseContour(circleContour(5, 5, 2))];
    const text = exportDxf(region, 'in');
    const lines = text.split('\n');
    const at = lines.indexOf('$INSUNITS');
    expect(lines.slice(at + 1, at + 3)).toEqual(['70', '1']); // 1 = inches (DXF reference, $INSUNITS)
    expect(lines.filter((l) => l === 'LWPOLYLINE')).toHaveLength(2);
    // The hole runs clockwise: its two half-circle bulges are −1 (DXF: negative bulge = clockwise).
    const bulges = lines.flatMap((l, i) => (l === '42' ? [Number(lines[i + 1])] : []));
    expect(bulges).toEqual([-1, -1]);
    const r = importDxf(text);
    expect(r.ok && r.units).toBe('in');
  });
});
